import { describe, expect, it } from 'vitest';
import { lengthText } from '../../../shared/drawing/lengthText.ts';
import { buildPiece, defaultSpec } from '../../../shared/engine/index.ts';
import { viewSvg, SVG_VIEWS } from '../../../src/export/viewSvg.ts';
import { assertWellFormedXml } from './support/xml.ts';

const info = { title: 'Chest <test> & "quotes"', revision: '7', date: '2025-01-01', units: 'in' as const, workshopName: 'Shop' };
const sheet = { size: 'letter' as const, orientation: 'landscape' as const };

function keyedDimensions(svg: string): Map<string, string> {
  const out = new Map<string, string>();
  for (const m of svg.matchAll(/data-dimensions="([^"]*)"/g)) {
    const decoded = m[1]!.replace(/&quot;/g, '"').replace(/&amp;/g, '&');
    for (const pair of decoded.split(';').filter(Boolean)) {
      const [key, text] = pair.split('=');
      out.set(key!, text!);
    }
  }
  return out;
}

describe('viewSvg', () => {
  const result = buildPiece(defaultSpec('chest'));

  it('writes every view as well-formed XML with an svg root', () => {
    for (const view of SVG_VIEWS) expect(assertWellFormedXml(viewSvg(result, view, info, sheet))).toBe('svg');
  });

  it('writes the engine\'s overall width, depth and height on the front and side views', () => {
    const [w, d, h] = result.bboxMm;
    const front = keyedDimensions(viewSvg(result, 'front', info, sheet));
    const side = keyedDimensions(viewSvg(result, 'side', info, sheet));
    expect(front.get('overall-width')).toBe(lengthText(w, 'in'));
    expect(front.get('overall-height')).toBe(lengthText(h, 'in'));
    expect(side.get('overall-depth')).toBe(lengthText(d, 'in'));
    expect(side.get('overall-height')).toBe(lengthText(h, 'in'));
    // And the texts are drawn, not only recorded.
    expect(viewSvg(result, 'front', info, sheet)).toContain(`>${lengthText(w, 'in').replace(/"/g, '&quot;')}</text>`);
  });

  it('changes the overall width text when the width changes', () => {
    const wide = buildPiece({ ...defaultSpec('chest'), params: { ...defaultSpec('chest').params, width: 48 * 25.4 } });
    const front = keyedDimensions(viewSvg(wide, 'front', info, sheet));
    expect(front.get('overall-width')).toBe(lengthText(wide.bboxMm[0], 'in'));
    expect(front.get('overall-width')).not.toBe(lengthText(result.bboxMm[0], 'in'));
  });
});

describe('assertWellFormedXml', () => {
  it('rejects an unclosed tag and a bare ampersand', () => {
    expect(() => assertWellFormedXml('<svg><g></svg>')).toThrow();
    expect(() => assertWellFormedXml('<svg><text>a & b</text></svg>')).toThrow();
  });
});
