/**
 * A Vite plugin that ships JetBrains Mono to the browser as TrueType, for jsPDF. The app's
 * content security policy forbids evaluating strings as code, which the woff2 decompressor
 * (compiled with Emscripten's embind) needs, so the woff2 files from @fontsource/jetbrains-mono
 * are decompressed here, at build time, by the same code the command line uses. The client
 * imports `virtual:mono-font-ttf` for the two file URLs.
 */
import type { Plugin } from 'vite';
import { monoFontsNode } from '../../src/export/fontsNode.ts';

const ID = 'virtual:mono-font-ttf';
const RESOLVED_ID = `\0${ID}`;
/** Where the dev server answers for the fonts; the build emits them as hashed assets instead. */
const DEV_PREFIX = '/@casewright-fonts/';
const FILES = { regular: 'JetBrainsMono-Regular.ttf', bold: 'JetBrainsMono-Bold.ttf' } as const;

export function monoFontTtf(): Plugin {
  let serving = false;
  return {
    name: 'casewright-mono-font-ttf',
    configResolved(config) {
      serving = config.command === 'serve';
    },
    resolveId(id) {
      return id === ID ? RESOLVED_ID : undefined;
    },
    async load(id) {
      if (id !== RESOLVED_ID) return undefined;
      if (serving) return `export const regularUrl = ${JSON.stringify(DEV_PREFIX + FILES.regular)};\nexport const boldUrl = ${JSON.stringify(DEV_PREFIX + FILES.bold)};\n`;
      const fonts = await monoFontsNode();
      const regular = this.emitFile({ type: 'asset', name: FILES.regular, source: fonts.regular });
      const bold = this.emitFile({ type: 'asset', name: FILES.bold, source: fonts.bold });
      return `export const regularUrl = import.meta.ROLLUP_FILE_URL_${regular};\nexport const boldUrl = import.meta.ROLLUP_FILE_URL_${bold};\n`;
    },
    configureServer(server) {
      server.middlewares.use((req, res, next) => {
        const name = req.url?.startsWith(DEV_PREFIX) ? req.url.slice(DEV_PREFIX.length) : null;
        if (name !== FILES.regular && name !== FILES.bold) return next();
        monoFontsNode().then((fonts) => {
          res.setHeader('Content-Type', 'font/ttf');
          res.end(name === FILES.regular ? fonts.regular : fonts.bold);
        }, next);
      });
    },
  };
}
