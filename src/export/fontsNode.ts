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
  const woff2 = await readFile(path);
  // Copy at once, before anything else can run the decompressor.
  return (await decompress(woff2)).slice();
}

async function load(): Promise<MonoFonts> {
  // One at a time: the decompressor returns a view into its own memory, which the next call reuses.
  const regular = await ttf(400);
  const bold = await ttf(700);
  return { regular, bold };
}

/** Regular and bold JetBrains Mono as TrueType, loaded once per process. */
export function monoFontsNode(): Promise<MonoFonts> {
  cached ??= load();
  return cached;
}
