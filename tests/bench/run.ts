/**
 * `npm run bench`: every benchmark, printed as figures. Nothing here asserts speed; the
 * numbers go into the README by hand.
 */
import { existsSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

type BenchRow = { name: string; medianMs: number; p95Ms: number; cpuMedianMs?: number; runs: number };
type Bench = { file: string; exportName: string; title: string };

const here = dirname(fileURLToPath(import.meta.url));

const benches: Bench[] = [
  { file: 'chest.bench.ts', exportName: 'benchChest', title: 'Piece engine: chest build' },
  { file: 'pieces.bench.ts', exportName: 'benchPieces', title: 'Piece engine: dresser and cabinet builds' },
  { file: 'editor.bench.ts', exportName: 'benchEditor', title: 'Editor: parameter change to 3D view and tables' },
  { file: 'layout.bench.ts', exportName: 'benchLayout', title: 'Materials: sheet and board layout' },
  { file: 'planSet.bench.ts', exportName: 'benchPlanSet', title: 'Plan set export' },
  { file: 'api.bench.ts', exportName: 'benchApi', title: 'API under load (autocannon, loopback)' },
];

function printRows(rows: BenchRow[]) {
  const width = Math.max(...rows.map((r) => r.name.length), 10);
  // The processor-time column only for benches that measure it (the engine's).
  const cpu = rows.some((r) => r.cpuMedianMs !== undefined);
  const cpuHead = cpu ? `  ${'cpu median ms'.padStart(13)}` : '';
  console.log(`  ${'case'.padEnd(width)}  ${'median ms'.padStart(10)}  ${'p95 ms'.padStart(10)}${cpuHead}  ${'runs'.padStart(7)}`);
  for (const r of rows) {
    const cpuCell = cpu ? `  ${(r.cpuMedianMs?.toFixed(4) ?? '-').padStart(13)}` : '';
    console.log(`  ${r.name.padEnd(width)}  ${r.medianMs.toFixed(4).padStart(10)}  ${r.p95Ms.toFixed(4).padStart(10)}${cpuCell}  ${String(r.runs).padStart(7)}`);
  }
}

const only = process.argv.slice(2);
for (const bench of benches) {
  if (only.length && !only.some((o) => bench.file.startsWith(o))) continue;
  const path = join(here, bench.file);
  if (!existsSync(path)) continue;
  console.log(`\n== ${bench.title} (${bench.file})`);
  const mod = (await import(pathToFileURL(path).href)) as Record<string, () => Promise<BenchRow[] | string>>;
  const run = mod[bench.exportName];
  if (typeof run !== 'function') throw new Error(`${bench.file} does not export ${bench.exportName}`);
  const out = await run();
  if (typeof out === 'string') console.log(out);
  else printRows(out);
}
