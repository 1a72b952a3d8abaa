import { execFileSync } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { lengthText, partSizeText } from '../../../shared/drawing/lengthText.ts';
import { partLetters } from '../../../shared/drawing/partLetters.ts';
import { buildPlanSet } from '../../../shared/drawing/planSet.ts';
import { buildPiece, defaultSpec, type PieceResult } from '../../../shared/engine/index.ts';
import { monoFontsNode } from '../../../src/export/fontsNode.ts';
import { renderPlanSetPdf } from '../../../src/export/planSetPdf.ts';
import { sizesMissingFromPdf } from './support/planSetText.ts';

/** Share of dark pixels inside the drawing area below which a page counts as blank. */
const MIN_INK_SHARE = 0.002;

let dir: string;
let pdfPath: string;
let pages: string[];
let result: PieceResult;

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'casewright-planset-'));
  result = buildPiece(defaultSpec('chest'));
  const model = buildPlanSet(result, { title: 'Blanket chest', revision: 'R7', date: '2025-03-14', workshopName: 'Test workshop', sheet: { size: 'letter', orientation: 'landscape' }, units: 'in' });
  pdfPath = join(dir, 'plan.pdf');
  writeFileSync(pdfPath, new Uint8Array(await renderPlanSetPdf(model, await monoFontsNode())));
  pages = execFileSync('pdftotext', ['-layout', pdfPath, '-'], { encoding: 'utf8' }).split('\f').filter((p) => p.trim());
}, 60_000);

afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** Reads a binary greyscale PGM (P5) as written by `pdftoppm -gray`. */
function readPgm(path: string): { width: number; height: number; pixels: Uint8Array } {
  const bytes = readFileSync(path);
  const header = bytes.subarray(0, 64).toString('latin1');
  const m = /^P5\s+(\d+)\s+(\d+)\s+(\d+)\s/.exec(header);
  if (!m) throw new Error(`${path} is not a binary PGM`);
  return { width: Number(m[1]), height: Number(m[2]), pixels: bytes.subarray(m[0].length) };
}

describe('renderPlanSetPdf', () => {
  it('puts every part\'s finished size from the engine on its part drawing', () => {
    const letters = partLetters(result);
    for (const part of result.parts) {
      const page = pages.find((p) => p.includes(`Part ${letters.get(part.id)}: ${part.name}`));
      expect(page, `no drawing for ${part.name}`).toBeDefined();
      expect(page).toContain(partSizeText(part, 'in'));
    }
  });

  it('writes every defining size of every part on its part drawing: cuts, offsets, stops, hole lines', () => {
    expect(sizesMissingFromPdf(result, pages, 'in')).toEqual([]);
  });

  it('lists every part with its finished length, width and thickness in the cut list', () => {
    const cutList = pages.filter((p) => p.includes('Cut list —')).join('\n').split('\n');
    for (const part of result.parts) {
      const row = cutList.find((line) => line.includes(` ${part.name} `) || line.includes(`${part.name}  `));
      expect(row, `no cut-list row for ${part.name}`).toBeDefined();
      const sizes = [part.lengthMm, part.widthMm, part.thicknessMm].map((v) => lengthText(v, 'in'));
      let from = 0;
      for (const s of sizes) {
        const at = row!.indexOf(s, from);
        expect(at, `${part.name}: ${s} after column ${from} in "${row}"`).toBeGreaterThanOrEqual(0);
        from = at + s.length;
      }
    }
  });

  it('carries the revision, date and workshop in every title block', () => {
    for (const page of pages) {
      expect(page).toContain('R7');
      expect(page).toContain('2025-03-14');
      expect(page).toContain('Test workshop');
    }
    expect(pages[0]).toMatch(new RegExp(`1 of ${pages.length}`));
  });

  it('includes the safety notes, deferring to standards and never claiming certification', () => {
    const text = pages.join('\n').replace(/\s+/g, ' ');
    expect(text).toContain('Safety notes');
    expect(text).toContain('ASTM F963');
    expect(text).toContain('Router table');
    expect(text).toContain('Spray finishing');
    expect(text).toContain('not a certification');
    expect(text).not.toMatch(/certified safe(?! )/i);
  });

  it('embeds JetBrains Mono', () => {
    const fonts = execFileSync('pdffonts', [pdfPath], { encoding: 'utf8' });
    expect(fonts).toMatch(/JetBrainsMono\S*\s+CID TrueType\s+Identity-H\s+yes/);
  });

  it('fits every part drawing, cut table and all, on one sheet', () => {
    const continued = pages.filter((p) => /Part [A-Z]+: .*\(continued\)/.test(p));
    expect(continued.map((p) => /Part [A-Z]+: [^\n]*?\(continued\)/.exec(p)![0])).toEqual([]);
    expect(pages.filter((p) => /Part [A-Z]+: /.test(p)).length).toBe(partLetters(result).size);
  });

  it('writes no arrow as `->` (the fonts have no →; joints read "into")', () => {
    expect(pages.filter((p) => p.includes('->'))).toEqual([]);
    expect(pages.some((p) => / into Leg/.test(p))).toBe(true);
  });

  it('renders no blank page', () => {
    execFileSync('pdftoppm', ['-gray', '-r', '25', pdfPath, join(dir, 'page')]);
    const files = readdirSync(dir).filter((f) => f.startsWith('page') && f.endsWith('.pgm')).sort();
    expect(files).toHaveLength(pages.length);
    for (const f of files) {
      const { width, height, pixels } = readPgm(join(dir, f));
      // Inside the border and above the title block, so the frame alone does not count as ink.
      const x0 = Math.round(width * 0.06);
      const x1 = Math.round(width * 0.94);
      const y0 = Math.round(height * 0.08);
      const y1 = Math.round(height * 0.82);
      let dark = 0;
      for (let y = y0; y < y1; y++) for (let x = x0; x < x1; x++) if (pixels[y * width + x]! < 160) dark++;
      expect(dark / ((x1 - x0) * (y1 - y0)), `${f} looks blank`).toBeGreaterThan(MIN_INK_SHARE);
    }
  });
});
