/**
 * Sheet optimiser benchmark: generated instances of the published two-dimensional bin-packing
 * classes I–X (Berkey & Wang 1987, J. Oper. Res. Soc. 38; Martello & Vigo 1998, Management
 * Science 44; generation rules of Lodi, Martello & Vigo 1999, INFORMS J. Computing 11 — see
 * REFERENCE.md §8), n = 20, 40, 60, 80, 100, ten seeded instances each, plus the demo pieces.
 * Each instance is packed by Casewright's optimiser and by the baseline package maxrects-packer
 * in this process, and both are set against the area lower bound L0 (Martello & Vigo 1998).
 *
 * Rotation rule, the same for both: items keep their orientation (the oriented problem of the
 * papers, 2BP|O), as a part whose face grain runs along the sheet must. No kerf, no trim. The
 * baseline runs with fixed bins (`smart: false`) under both of its packing logics (longest
 * edge first, largest area first) and keeps the better per instance: a strong baseline.
 * Casewright's layouts are guillotine-cut; the baseline's need not be.
 */
import { readFileSync } from 'node:fs';
import { MaxRectsPacker, PACKING_LOGIC } from 'maxrects-packer/dist/maxrects-packer.mjs';
import { buildPiece, defaultSpec, type PieceSpec } from '../../shared/engine/index.ts';
import { binPackingInstance, CLASS_NAMES, type BinPackingClass } from '../../shared/layout/binPackingClasses.ts';
import { layoutSheets } from '../../shared/layout/sheetOptimiser.ts';
import { DEFAULT_KERF_MM, DEFAULT_TRIM_MM, STANDARD_SHEET } from '../../shared/layout/sheetInput.ts';
import { sheetPartFor } from '../../shared/materials/partsForLayout.ts';
import { materialsTakeoff } from '../../shared/materials/takeoff.ts';

const SIZES = [20, 40, 60, 80, 100];
const INSTANCES = 10;
const DEMO_SPECS = ['chest-blanket-coastal.json', 'chest-toy-maple.json'];

function baselineSheets(binW: number, binH: number, items: { w: number; h: number }[], padding: number, allowRotation: boolean): number {
  let best = Infinity;
  for (const logic of [PACKING_LOGIC.MAX_EDGE, PACKING_LOGIC.MAX_AREA]) {
    const packer = new MaxRectsPacker(binW, binH, padding, { smart: false, pot: false, square: false, allowRotation, logic });
    packer.addArray(items.map((i) => ({ width: i.w, height: i.h })) as never);
    best = Math.min(best, packer.bins.length);
  }
  return best;
}

/** Runs the benchmark and returns the lines to print. */
export async function benchLayout(): Promise<string> {
  const lines: string[] = [];
  const started = performance.now();
  lines.push('Classes I–X, oriented items, no kerf or trim; sums over 50 instances per class (n = 20..100 × 10 seeds)');
  lines.push(`  ${'class'.padEnd(5)}  ${'L0'.padStart(6)}  ${'ours'.padStart(6)}  ${'baseline'.padStart(8)}  ${'ours/L0'.padStart(8)}  ${'base/L0'.padStart(8)}  ${'fewer'.padStart(5)}  ${'more'.padStart(4)}  ${'ms'.padStart(7)}`);
  const worse: string[] = [];
  let totals = { l0: 0, ours: 0, base: 0, fewer: 0 };
  for (let c = 1; c <= 10; c++) {
    const classStart = performance.now();
    let row = { l0: 0, ours: 0, base: 0, fewer: 0, more: 0 };
    for (const n of SIZES) {
      for (let seed = 0; seed < INSTANCES; seed++) {
        const instance = binPackingInstance(c as BinPackingClass, n, seed);
        const parts = instance.items.map((item, i) => ({ id: `i${i}`, name: `i${i}`, lengthMm: item.w, widthMm: item.h, quantity: 1, grain: 'length' as const }));
        const stock = [{ id: 'bin', name: 'bin', lengthMm: instance.binW, widthMm: instance.binH, count: null, offcut: false }];
        const ours = layoutSheets(parts, { stock, kerfMm: 0, trimMm: 0 });
        const base = baselineSheets(instance.binW, instance.binH, instance.items, 0, false);
        row = { l0: row.l0 + ours.lowerBound, ours: row.ours + ours.sheetsBought, base: row.base + base, fewer: row.fewer + (ours.sheetsBought < base ? 1 : 0), more: row.more + (ours.sheetsBought > base ? 1 : 0) };
        if (ours.sheetsBought > base) worse.push(`class ${CLASS_NAMES[c - 1]} n=${n} seed ${seed}: ${ours.sheetsBought} vs ${base}`);
      }
    }
    totals = { l0: totals.l0 + row.l0, ours: totals.ours + row.ours, base: totals.base + row.base, fewer: totals.fewer + row.fewer };
    const name = CLASS_NAMES[c - 1] ?? String(c);
    lines.push(`  ${name.padEnd(5)}  ${String(row.l0).padStart(6)}  ${String(row.ours).padStart(6)}  ${String(row.base).padStart(8)}  ${(row.ours / row.l0).toFixed(3).padStart(8)}  ${(row.base / row.l0).toFixed(3).padStart(8)}  ${String(row.fewer).padStart(5)}  ${String(row.more).padStart(4)}  ${(performance.now() - classStart).toFixed(0).padStart(7)}`);
  }
  lines.push(`  ${'all'.padEnd(5)}  ${String(totals.l0).padStart(6)}  ${String(totals.ours).padStart(6)}  ${String(totals.base).padStart(8)}  ${(totals.ours / totals.l0).toFixed(3).padStart(8)}  ${(totals.base / totals.l0).toFixed(3).padStart(8)}  ${String(totals.fewer).padStart(5)}  ${String(worse.length).padStart(4)}`);
  lines.push(worse.length === 0 ? '  Never more sheets than the baseline on any of the 500 instances: yes' : `  MORE SHEETS THAN THE BASELINE on ${worse.length} instances: ${worse.join('; ')}`);

  lines.push('', 'Demo pieces (48 × 96 in sheets, 1/8 in kerf, 1/4 in trim; rotation where the face grain allows, the same for the baseline)');
  for (const file of DEMO_SPECS) {
    const spec = JSON.parse(readFileSync(new URL(`../fixtures/specs/${file}`, import.meta.url), 'utf8')) as PieceSpec;
    const result = buildPiece(spec);
    const takeoff = materialsTakeoff(result);
    for (const sheet of takeoff.sheets) {
      const parts = result.parts.filter((p) => p.material.kind === 'sheet' && p.material.sheetId === sheet.sheetId).map(sheetPartFor);
      const items = parts.flatMap((p) => Array.from({ length: p.quantity }, () => ({ w: p.lengthMm, h: p.widthMm })));
      const usableL = STANDARD_SHEET.lengthMm - 2 * DEFAULT_TRIM_MM + DEFAULT_KERF_MM;
      const usableW = STANDARD_SHEET.widthMm - 2 * DEFAULT_TRIM_MM + DEFAULT_KERF_MM;
      const base = baselineSheets(usableL, usableW, items, DEFAULT_KERF_MM, parts.every((p) => p.grain === 'none'));
      lines.push(`  ${file} ${sheet.sheetName}: ours ${sheet.layout.sheetsBought}, baseline ${base}, L0 ${sheet.layout.lowerBound}, yield ${(sheet.layout.yield * 100).toFixed(1)} %`);
    }
    for (const b of takeoff.boards) {
      lines.push(`  ${file} ${b.speciesName} ${b.quarters}/4: ${b.layout.boards.length} boards, ${b.layout.boardFeetBought.toFixed(2)} bd ft bought, ${b.layout.boardFeetRough.toFixed(2)} rough, ${b.layout.boardFeetFinished.toFixed(2)} finished`);
    }
  }
  lines.push('', 'Default dresser, boards only: drawer fronts cut end to end per column (grain-matched runs), default boards and 10 ft × 12 in boards');
  const dresser = buildPiece(defaultSpec('dresser'));
  const wide = [{ id: 'wide', name: 'Board 10 ft × 12 in', lengthMm: 120 * 25.4, widthMm: 12 * 25.4, count: null, inStock: false, defects: [] }];
  for (const [name, options] of [['default boards', {}], ['10 ft × 12 in', { boardStock: () => wide }]] as const) {
    const runStart = performance.now();
    const takeoff = materialsTakeoff(dresser, options);
    const ms = performance.now() - runStart;
    for (const b of takeoff.boards) {
      const runs = new Set(b.layout.boards.flatMap((x) => x.parts.filter((p) => p.matchOrder !== null).map((p) => p.matchGroup)));
      const split = b.layout.splitGroups.filter((g) => runs.has(g)).length;
      lines.push(`  ${name} ${b.speciesName} ${b.quarters}/4: ${b.layout.boards.length} boards, ${b.layout.boardFeetBought.toFixed(2)} bd ft bought, runs ${runs.size - split} whole / ${split} split (whole takeoff ${ms.toFixed(0)} ms)`);
    }
  }
  lines.push('', `  total ${((performance.now() - started) / 1000).toFixed(1)} s`);
  return lines.join('\n');
}
