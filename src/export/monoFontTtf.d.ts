/** URLs of JetBrains Mono as TrueType, from the build's font plugin (scripts/vite/monoFontTtf.ts). */
declare module 'virtual:mono-font-ttf' {
  export const regularUrl: string;
  export const boldUrl: string;
}
