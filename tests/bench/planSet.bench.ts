/**
 * Plan-set export time: drawing model and PDF for the largest piece the engine builds (the
 * dresser when it exists, else the chest). Prints figures; asserts nothing about speed.
 */
import { buildPlanSet } from '../../shared/drawing/planSet.ts';
import { buildPiece, defaultSpec, type PieceKind } from '../../shared/engine/index.ts';
import { monoFontsNode } from '../../src/export/fontsNode.ts';
import { renderPlanSetPdf } from '../../src/export/planSetPdf.ts';

const RUNS = 5;

function pick(): PieceKind {
  for (const kind of ['dresser', 'chest'] as const) {
    try {
      buildPiece(defaultSpec(kind));
      return kind;
    } catch {
      // Not built by this version of the engine yet: try the next.
    }
  }
  throw new Error('no piece kind builds');
}

const median = (xs: number[]): number => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

/** Printable lines: median model and PDF times over a few runs, sheets and bytes. */
export async function benchPlanSet(): Promise<string> {
  const kind = pick();
  const result = buildPiece(defaultSpec(kind));
  const fonts = await monoFontsNode();
  const modelMs: number[] = [];
  const pdfMs: number[] = [];
  let sheets = 0;
  let bytes = 0;
  for (let i = 0; i < RUNS; i++) {
    const t0 = performance.now();
    const model = buildPlanSet(result, { title: `Bench ${kind}`, revision: '1', date: '2025-01-01', workshopName: 'Bench', sheet: { size: 'letter', orientation: 'landscape' }, units: 'in' });
    const t1 = performance.now();
    const pdf = await renderPlanSetPdf(model, fonts);
    const t2 = performance.now();
    modelMs.push(t1 - t0);
    pdfMs.push(t2 - t1);
    sheets = model.sheets.length;
    bytes = pdf.byteLength;
  }
  return [
    `  piece: ${kind} (${result.parts.length} distinct parts), ${sheets} sheets before continuations, ${(bytes / 1024).toFixed(0)} KiB`,
    `  drawing model  median ${median(modelMs).toFixed(1)} ms  (${RUNS} runs)`,
    `  PDF render     median ${median(pdfMs).toFixed(1)} ms  (${RUNS} runs)`,
  ].join('\n');
}
