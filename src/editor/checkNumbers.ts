/**
 * The numbers behind a check, named by the engine with their unit as a suffix (`shortfallMm`,
 * `buildMcPercent`, `torqueNm`), turned into a label and a value a maker reads.
 */

const SUFFIXES: readonly { suffix: string; format: (n: number, length: (mm: number) => string) => string }[] = [
  { suffix: 'Mm', format: (n, length) => nonZeroLength(n, length) },
  { suffix: 'Percent', format: (n) => `${round(n, 2)} %` },
  { suffix: 'Nm', format: (n) => `${round(n, 2)} N·m` },
  { suffix: 'Kg', format: (n) => `${round(n, 2)} kg` },
  { suffix: 'N', format: (n) => `${round(n, 1)} N` },
  { suffix: 'Deg', format: (n) => `${round(n, 1)}°` },
  { suffix: 'M2', format: (n) => `${round(n, 3)} m²` },
];

/** A label (`shortfall`) and a value (`1/16"`) for one named number of a check. */
export function checkNumber(key: string, value: number, length: (mm: number) => string): { label: string; text: string } {
  for (const { suffix, format } of SUFFIXES) {
    if (key.endsWith(suffix) && key.length > suffix.length) return { label: words(key.slice(0, -suffix.length)), text: format(value, length) };
  }
  return { label: words(key), text: String(round(value, 3)) };
}

/**
 * A length in the maker's unit, except that one too small to show at their precision (a 0.4 mm
 * shortfall at 1/16 in) is given in tenths of a millimetre rather than as a misleading zero.
 */
function nonZeroLength(mm: number, length: (mm: number) => string): string {
  const text = length(mm);
  if (mm === 0 || /[1-9]/.test(text)) return text;
  return `${mm < 0 ? '−' : ''}${round(Math.abs(mm), 1) || 0.1} mm`;
}

function words(camel: string): string {
  return camel.replace(/([a-z0-9])([A-Z])/g, '$1 $2').toLowerCase();
}

function round(n: number, decimals: number): number {
  const f = 10 ** decimals;
  return Math.round(n * f) / f;
}
