import { describe, expect, it } from 'vitest';
import { buildPiece, defaultSpec, type Part, type PieceResult, type PieceSpec } from '../../../shared/engine/index.ts';
import { cutList } from '../../../shared/engine/derived/cutList.ts';
import { boardPartsFor } from '../../../shared/materials/partsForLayout.ts';
import { materialsTakeoff } from '../../../shared/materials/takeoff.ts';

const IN = 25.4;

// Each drawer front instance with its run and where it sits in the piece.
function frontInstances(result: PieceResult): { part: Part; instance: number; group: string; order: number; x: number; z: number }[] {
  return result.parts
    .filter((p) => p.role === 'drawer-front')
    .flatMap((part) => (part.grainMatch ?? []).map((run, instance) => {
      const at = result.placements.find((pl) => pl.partId === part.id && pl.instance === instance)!;
      return { part, instance, group: run.group, order: run.order, x: at.positionMm[0], z: at.positionMm[2] };
    }));
}

describe('boardPartsFor with grain-matched drawer fronts', () => {
  for (const caseConstruction of ['carcass', 'frame-and-panel'] as const) {
    const base = defaultSpec('dresser');
    // A frame-and-panel case carries its drawers on wooden runners.
    const spec: PieceSpec = { ...base, params: { ...base.params, caseConstruction, ...(caseConstruction === 'frame-and-panel' ? { slideType: 'wood-runners' } : {}) } };
    const result = buildPiece(spec);

    it(`gives every solid front of a default ${caseConstruction} dresser a run per column, ordered top to bottom`, () => {
      const fronts = result.parts.filter((p) => p.role === 'drawer-front');
      const rows = spec.params.drawerRows as number;
      const columns = spec.params.drawerColumns as number;
      expect(fronts.every((p) => p.material.kind === 'solid' && p.grainMatch?.length === p.quantity)).toBe(true);
      const instances = frontInstances(result);
      expect(instances).toHaveLength(rows * columns);
      const groups = [...new Set(instances.map((f) => f.group))].sort();
      expect(groups).toEqual(Array.from({ length: columns }, (_, c) => `drawer-fronts-column-${c + 1}`));
      for (const group of groups) {
        const column = instances.filter((f) => f.group === group).sort((a, b) => a.order - b.order);
        expect(column.map((f) => f.order)).toEqual(Array.from({ length: rows }, (_, r) => r + 1));
        // One column: every front at the same place across; top to bottom: each lower than the last.
        expect(new Set(column.map((f) => f.x.toFixed(6))).size).toBe(1);
        for (let i = 1; i < column.length; i++) expect(column[i]!.z).toBeLessThan(column[i - 1]!.z);
      }
      const xOf = (group: string) => instances.find((f) => f.group === group)!.x;
      for (let c = 1; c < columns; c++) expect(xOf(`drawer-fronts-column-${c + 1}`)).toBeGreaterThan(xOf(`drawer-fronts-column-${c}`));
    });

    it(`turns each ${caseConstruction} front into board inputs that keep its run and order, glued-up boards at one order`, () => {
      for (const part of result.parts.filter((p) => p.role === 'drawer-front')) {
        const inputs = boardPartsFor(part, 8 * IN);
        const boards = part.glueUp?.boards ?? (part.rough.widthMm > 8 * IN ? Math.ceil(part.rough.widthMm / (8 * IN)) : 1);
        expect(inputs.reduce((n, i) => n + i.quantity, 0)).toBe(part.quantity * boards);
        expect(inputs.map((i) => i.grainMatch)).toEqual(part.grainMatch!.map((m) => ({ group: m.group, order: m.order, note: m.note })));
        expect(inputs.every((i) => i.matchGroup === undefined)).toBe(true);
      }
    });
  }

  it('lays out the fronts of a column end to end on one board when the stock is long and wide enough', () => {
    const base = defaultSpec('dresser');
    const result = buildPiece({ ...base, params: { ...base.params, caseConstruction: 'frame-and-panel', slideType: 'wood-runners' } });
    const wide = [{ id: 'wide', name: 'Board 10 ft × 12 in', lengthMm: 120 * IN, widthMm: 12 * IN, count: null, inStock: false, defects: [] }];
    const takeoff = materialsTakeoff(result, { boardStock: () => wide, boardAttempts: 2 });
    const layout = takeoff.boards.find((b) => b.layout.boards.some((x) => x.parts.some((p) => p.matchGroup === 'drawer-fronts-column-1')))!.layout;
    expect(layout.splitGroups.filter((g) => g.startsWith('drawer-fronts'))).toEqual([]);
    for (const group of ['drawer-fronts-column-1', 'drawer-fronts-column-2']) {
      const holding = layout.boards.filter((b) => b.parts.some((p) => p.matchGroup === group));
      expect(holding).toHaveLength(1);
      const parts = holding[0]!.parts.filter((p) => p.matchGroup === group).sort((a, b) => a.x - b.x);
      expect(parts.map((p) => p.matchOrder)).toEqual([...parts.map((p) => p.matchOrder)].sort((a, b) => a! - b!));
      expect(new Set(parts.map((p) => p.matchOrder)).size).toBe(3);
    }
  });

  it('says in the cut list that the fronts are cut in order from one board', () => {
    const result = buildPiece(defaultSpec('dresser'));
    const rows = cutList(result.parts).flatMap((g) => g.rows).filter((r) => result.parts.find((p) => p.id === r.partId)?.role === 'drawer-front');
    expect(rows.length).toBeGreaterThan(0);
    for (const row of rows) expect(row.notes.some((n) => n.startsWith('grain-matched (drawer fronts, column 1; drawer fronts, column 2)'))).toBe(true);
  });
});
