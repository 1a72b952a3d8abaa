import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { monoFontTtf } from './scripts/vite/monoFontTtf.ts';

const apiPort = process.env.API_PORT ?? '5181';

export default defineConfig({
  plugins: [react(), tailwindcss(), monoFontTtf()],
  server: {
    proxy: { '/api': { target: `http://127.0.0.1:${apiPort}`, changeOrigin: false } },
  },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    chunkSizeWarningLimit: 1200,
  },
});
