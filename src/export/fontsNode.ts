/**
 * JetBrains Mono for PDFs under Node (command line, tests, benchmarks): the woff2 files shipped
 * by @fontsource/jetbrains-mono, decompressed to TrueType in memory with wawoff2, because jsPDF
 * embeds TrueType only.
 */
import { readFile } from 'node:fs/promises';
import { createRequire } from 'node:module';
import decompress from 'wawoff2/decompress.js';
import type { MonoFonts } from './planSetPdf.ts';

const require = createRequire(import.meta.url);
let cached: Promise<MonoFonts> | null = null;

async function ttf(weight: 400 | 700): Promise<Uint8Array> {
  const path = require.resolve(`@fontsource/jetbrains-mono/files/jetbrains-mono-latin-${weight}-normal.woff2`);
  return new Uint8Array(await decompress(await readFile(path)));
}

/** Regular and bold JetBrains Mono as TrueType, loaded once per process. */
export function monoFontsNode(): Promise<MonoFonts> {
  cached ??= Promise.all([ttf(400), ttf(700)]).then(([regular, bold]) => ({ regular, bold }));
  return cached;
}
