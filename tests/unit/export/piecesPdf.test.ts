import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { partSizeText } from '../../../shared/drawing/lengthText.ts';
import { partLetters } from '../../../shared/drawing/partLetters.ts';
import { buildPlanSet } from '../../../shared/drawing/planSet.ts';
import { buildPiece, defaultSpec, type PieceResult } from '../../../shared/engine/index.ts';
import { monoFontsNode } from '../../../src/export/fontsNode.ts';
import { renderPlanSetPdf } from '../../../src/export/planSetPdf.ts';
import { sizesMissingFromPdf } from './support/planSetText.ts';

let dir: string;
const built: Record<'dresser' | 'cabinet', { result: PieceResult; pages: string[] }> = {} as never;

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'casewright-pieces-pdf-'));
  for (const kind of ['dresser', 'cabinet'] as const) {
    const result = buildPiece(defaultSpec(kind));
    const model = buildPlanSet(result, { title: `Test ${kind}`, revision: 'R12', date: '2025-06-01', workshopName: 'Test workshop', sheet: { size: 'letter', orientation: 'landscape' }, units: 'in' });
    const path = join(dir, `${kind}.pdf`);
    writeFileSync(path, new Uint8Array(await renderPlanSetPdf(model, await monoFontsNode())));
    const pages = execFileSync('pdftotext', ['-layout', path, '-'], { encoding: 'utf8' }).split('\f').filter((p) => p.trim());
    built[kind] = { result, pages };
  }
}, 120_000);

afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe.each(['dresser', 'cabinet'] as const)('the plan set PDF of the default %s', (kind) => {
  it('puts every part\'s finished size on its own part drawing', () => {
    const { result, pages } = built[kind];
    const letters = partLetters(result);
    for (const part of result.parts) {
      const page = pages.find((p) => p.includes(`Part ${letters.get(part.id)}: ${part.name}`));
      expect(page, `no drawing for ${part.name}`).toBeDefined();
      expect(page).toContain(partSizeText(part, 'in'));
    }
  });

  it('writes every defining size of every part on its part drawing: cuts, offsets, stops, hole lines', () => {
    const { result, pages } = built[kind];
    expect(sizesMissingFromPdf(result, pages, 'in')).toEqual([]);
  });

  it('lists every part in the cut list and names each on a cutting diagram or its key', () => {
    const { result, pages } = built[kind];
    const cutList = pages.filter((p) => p.includes('Cut list —')).join('\n');
    const diagrams = pages.filter((p) => p.includes('Cutting diagrams:')).join('\n');
    for (const part of result.parts) {
      // Table cells wrap long names onto a second line: the first 16 characters stay together.
      const name = part.name.slice(0, 16);
      expect(cutList).toContain(name);
      expect(diagrams, `${part.name} on no diagram`).toContain(name);
    }
  });

  it('carries the revision on every page and the tip-over caution with the safety notes', () => {
    const { pages } = built[kind];
    for (const page of pages) expect(page).toContain('R12');
    const text = pages.join('\n').replace(/\s+/g, ' ');
    expect(text).toContain('Safety notes');
    expect(text).toMatch(/tip/i);
    expect(text).not.toMatch(/certified safe(?! )/i);
  });
});
