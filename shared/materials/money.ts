/**
 * Money in whole cents, so sums of prices never carry binary fractions. Prices are read as
 * decimal text (`8.75`, `$8.75`) and written back with two decimals.
 */

/** Cents from decimal text such as `8.75` or `$1,250.00`; null when it is not a price. */
export function centsFromText(text: string): number | null {
  const match = /^\s*\$?\s*(\d{1,3}(?:,\d{3})+|\d+)(?:\.(\d{1,2}))?\s*$/.exec(text);
  if (!match) return null;
  const whole = Number((match[1] ?? '0').replace(/,/g, ''));
  const fraction = Number((match[2] ?? '0').padEnd(2, '0'));
  return whole * 100 + fraction;
}

/** `cents` as decimal text with two places, e.g. `1250.00`. */
export function centsText(cents: number): string {
  const sign = cents < 0 ? '-' : '';
  const abs = Math.abs(Math.round(cents));
  return `${sign}${Math.floor(abs / 100)}.${String(abs % 100).padStart(2, '0')}`;
}

/** The cost of `quantity` units at `unitCents` each, rounded to the cent (half away from zero). */
export function costCents(quantity: number, unitCents: number): number {
  // 12 significant digits first, so 2.675 × 100 rounds as the decimal it stands for.
  return Math.round(Number((quantity * unitCents).toPrecision(12)));
}
