/**
 * JetBrains Mono for PDFs in the browser: the woff2 files the app already ships (through
 * @fontsource/jetbrains-mono), fetched and decompressed to TrueType with wawoff2, both loaded
 * only when a plan set is exported.
 */
import regularUrl from '@fontsource/jetbrains-mono/files/jetbrains-mono-latin-400-normal.woff2?url';
import boldUrl from '@fontsource/jetbrains-mono/files/jetbrains-mono-latin-700-normal.woff2?url';
import type { MonoFonts } from './planSetPdf.ts';

let cached: Promise<MonoFonts> | null = null;

async function load(): Promise<MonoFonts> {
  const { default: decompress } = await import('wawoff2/decompress.js');
  const fetchBytes = async (url: string): Promise<Uint8Array> => {
    const response = await fetch(url);
    if (!response.ok) throw new Error(`could not load the dimension font (${response.status})`);
    return new Uint8Array(await response.arrayBuffer());
  };
  // One at a time, copying at once: the decompressor's result is a view into memory it reuses.
  const regular = (await decompress(await fetchBytes(regularUrl))).slice();
  const bold = (await decompress(await fetchBytes(boldUrl))).slice();
  return { regular, bold };
}

/** Regular and bold JetBrains Mono as TrueType, loaded once per page. */
export function monoFontsBrowser(): Promise<MonoFonts> {
  cached ??= load().catch((error: unknown) => {
    cached = null;
    throw error;
  });
  return cached;
}
