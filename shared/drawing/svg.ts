/**
 * Renders a sheet of the drawing model to an SVG string in paper millimetres: warm paper,
 * graphite lines, one pencil-red accent, dimensions in JetBrains Mono. Pure: no DOM.
 */
import { MM_PER_PT } from './textMetrics.ts';
import type { Fill, LineKind, Primitive, Sheet } from './types.ts';

/** The plan set's palette. */
export const PALETTE = {
  paper: '#f8f3e7',
  ink: '#2e2c29',
  accent: '#b0412e',
  fills: { paper: '#f8f3e7', light: '#efe3c8', mid: '#dcc7a0', dark: '#bfa57a' } as Readonly<Record<Fill, string>>,
} as const;

/** Stroke widths (mm) and dash patterns of each line kind, after ISO 128 line types. */
export const LINE_STYLES: Readonly<Record<LineKind, { width: number; dash: readonly number[] | null; accent?: boolean }>> = {
  visible: { width: 0.45, dash: null },
  hidden: { width: 0.25, dash: [1.8, 1] },
  centre: { width: 0.18, dash: [6, 1, 1, 1] },
  thin: { width: 0.15, dash: null },
  accent: { width: 0.3, dash: null, accent: true },
};

const FONTS = { mono: "'JetBrains Mono', ui-monospace, monospace", sans: 'Helvetica, Arial, sans-serif' } as const;

/** Escapes text for XML content and attributes. */
export function escapeXml(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;').replace(/'/g, '&apos;');
}

const n = (v: number): string => String(Math.round(v * 100) / 100);

function stroke(kind: LineKind): string {
  const s = LINE_STYLES[kind];
  const colour = s.accent ? PALETTE.accent : PALETTE.ink;
  const dash = s.dash ? ` stroke-dasharray="${s.dash.join(' ')}"` : '';
  return `stroke="${colour}" stroke-width="${s.width}"${dash}`;
}

/** One primitive as an SVG element. */
export function primitiveSvg(p: Primitive): string {
  switch (p.type) {
    case 'segment':
      return `<line x1="${n(p.a[0])}" y1="${n(p.a[1])}" x2="${n(p.b[0])}" y2="${n(p.b[1])}" ${stroke(p.kind)} stroke-linecap="round"/>`;
    case 'polygon': {
      const pts = p.points.map(([x, y]) => `${n(x)},${n(y)}`).join(' ');
      const fill = p.fill ? PALETTE.fills[p.fill] : 'none';
      return `<polygon points="${pts}" fill="${fill}" ${stroke(p.kind)} stroke-linejoin="round"/>`;
    }
    case 'circle':
      return `<circle cx="${n(p.centre[0])}" cy="${n(p.centre[1])}" r="${n(p.radius)}" fill="none" ${stroke(p.kind)}/>`;
    case 'arrow': {
      const dx = p.tip[0] - p.from[0];
      const dy = p.tip[1] - p.from[1];
      const len = Math.hypot(dx, dy) || 1;
      const w = len * 0.18;
      const px = (-dy / len) * w;
      const py = (dx / len) * w;
      const pts = [p.tip, [p.from[0] + px, p.from[1] + py], [p.from[0] - px, p.from[1] - py]].map(([x, y]) => `${n(x!)},${n(y!)}`).join(' ');
      return `<polygon points="${pts}" fill="${PALETTE.ink}"/>`;
    }
    case 'label': {
      const size = p.sizePt * MM_PER_PT;
      const rotate = p.rotate ? ` transform="rotate(-90 ${n(p.at[0])} ${n(p.at[1])})"` : '';
      const weight = p.bold ? ' font-weight="bold"' : '';
      const colour = p.accent ? PALETTE.accent : PALETTE.ink;
      return `<text x="${n(p.at[0])}" y="${n(p.at[1])}" font-family="${escapeXml(FONTS[p.font])}" font-size="${n(size)}" text-anchor="${p.anchor}" fill="${colour}"${weight}${rotate}>${escapeXml(p.text)}</text>`;
    }
  }
}

/**
 * A whole sheet as a standalone SVG document sized in mm. `frame` is the border and title block
 * (from `sheetFrame`), drawn with the sheet's own primitives and its views.
 */
export function renderSheetSvg(sheet: Sheet, frame: readonly Primitive[]): string {
  const body: string[] = [];
  for (const view of sheet.views) {
    const dims = view.dimensionTexts.filter((d) => d.key).map((d) => `${d.key}=${d.text}`).join(';');
    body.push(`<g data-view="${escapeXml(view.id)}" data-scale="${escapeXml(view.scaleText)}" data-dimensions="${escapeXml(dims)}">`);
    body.push(...view.primitives.map(primitiveSvg));
    body.push('</g>');
  }
  body.push(...sheet.primitives.map(primitiveSvg), ...frame.map(primitiveSvg));
  return [
    '<?xml version="1.0" encoding="UTF-8"?>',
    `<svg xmlns="http://www.w3.org/2000/svg" width="${n(sheet.widthMm)}mm" height="${n(sheet.heightMm)}mm" viewBox="0 0 ${n(sheet.widthMm)} ${n(sheet.heightMm)}">`,
    `<title>${escapeXml(sheet.name)}</title>`,
    `<rect x="0" y="0" width="${n(sheet.widthMm)}" height="${n(sheet.heightMm)}" fill="${PALETTE.paper}"/>`,
    ...body,
    '</svg>',
    '',
  ].join('\n');
}
