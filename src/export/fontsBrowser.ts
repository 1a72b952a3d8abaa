/**
 * JetBrains Mono for PDFs in the browser: the TrueType files the build decompressed from the
 * woff2 the app already ships (scripts/vite/monoFontTtf.ts; the decompressor cannot run under
 * the app's content security policy), fetched only when a plan set is exported.
 */
import { boldUrl, regularUrl } from 'virtual:mono-font-ttf';
import type { MonoFonts } from './planSetPdf.ts';

let cached: Promise<MonoFonts> | null = null;

async function fetchBytes(url: string): Promise<Uint8Array> {
  const response = await fetch(url);
  if (!response.ok) throw new Error(`could not load the dimension font (${response.status})`);
  return new Uint8Array(await response.arrayBuffer());
}

async function load(): Promise<MonoFonts> {
  const [regular, bold] = await Promise.all([fetchBytes(regularUrl), fetchBytes(boldUrl)]);
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
