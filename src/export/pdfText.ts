/**
 * jsPDF's standard Helvetica covers only the WinAnsi character set; a few characters the plan
 * set writes in words fall outside it and are spelled the nearest way it can show. An arrow
 * becomes the word `to`: neither Helvetica's WinAnsi nor the embedded JetBrains Mono (its latin
 * subset has ↑ and ↓ but not →) can draw one, and `->` reads as code, not as a drawing's words.
 */
const REPLACEMENTS: readonly [RegExp, string][] = [
  [/\s*→\s*/g, ' to '],
  [/−/g, '-'],
  [/≥/g, '>='],
  [/≤/g, '<='],
  [/≈/g, '~'],
];

/** `text` with characters outside WinAnsi replaced, for the standard Helvetica. */
export function winAnsi(text: string): string {
  return REPLACEMENTS.reduce((t, [re, to]) => t.replace(re, to), text);
}
