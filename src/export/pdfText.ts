/**
 * jsPDF's standard Helvetica covers only the WinAnsi character set; a few characters the plan
 * set writes in words fall outside it and are spelled the nearest way it can show.
 */
const REPLACEMENTS: readonly [RegExp, string][] = [
  [/→/g, '->'],
  [/−/g, '-'],
  [/≥/g, '>='],
  [/≤/g, '<='],
  [/≈/g, '~'],
];

/** `text` with characters outside WinAnsi replaced, for the standard Helvetica. */
export function winAnsi(text: string): string {
  return REPLACEMENTS.reduce((t, [re, to]) => t.replace(re, to), text);
}
