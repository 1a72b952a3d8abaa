/** Types for wawoff2's decompressor, which ships none: woff2 bytes in, TrueType bytes out. */
declare module 'wawoff2/decompress.js' {
  export default function decompress(woff2: Uint8Array): Promise<Uint8Array>;
}
