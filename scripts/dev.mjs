// `npm run dev`: the same bootstrap as `npm start`, then Vite's dev server with the API behind its proxy.
process.argv.push('--dev');
await import('./start.mjs');
