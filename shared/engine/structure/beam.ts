/**
 * Beam bending for shelves. Mid-span deflection of a simply supported beam under a uniform load:
 * δ = 5 w L⁴ / (384 E I), the standard case in the beam-deflection tables of mechanics-of-materials
 * texts (e.g. Gere & Goodno, Mechanics of Materials, appendix of beam deflections). A shelf made
 * of a panel and a solid edge strip is a composite section: its stiffness EI is found by the
 * transformed-section method, Σ Eᵢ (Iᵢ + Aᵢ dᵢ²) about the stiffness-weighted neutral axis.
 * Units throughout: N, mm, MPa (N/mm²).
 */
import { assert } from '../../assert.ts';

/** One rectangle of a section: width across the span, height, the height of its underside, and its modulus. */
export interface SectionPiece {
  widthMm: number;
  heightMm: number;
  /** Height of the piece's underside above any common datum (mm). */
  bottomMm: number;
  modulusMPa: number;
}

/** Second moment of area of a rectangle about its own centroid, b h³ / 12 (mm⁴). */
export function rectangleSecondMomentMm4(widthMm: number, heightMm: number): number {
  return (widthMm * heightMm ** 3) / 12;
}

/** Flexural rigidity E·I of a section of one or more rectangles (N·mm²), transformed-section method. */
export function sectionStiffnessNmm2(pieces: readonly SectionPiece[]): number {
  assert(pieces.length > 0, 'a section has at least one piece');
  const ea = pieces.reduce((s, p) => s + p.modulusMPa * p.widthMm * p.heightMm, 0);
  const neutral = pieces.reduce((s, p) => s + p.modulusMPa * p.widthMm * p.heightMm * (p.bottomMm + p.heightMm / 2), 0) / ea;
  return pieces.reduce((s, p) => {
    const d = p.bottomMm + p.heightMm / 2 - neutral;
    return s + p.modulusMPa * (rectangleSecondMomentMm4(p.widthMm, p.heightMm) + p.widthMm * p.heightMm * d * d);
  }, 0);
}

/** Mid-span deflection (mm) of a simply supported beam of span `spanMm` under `loadNPerMm`, stiffness `eiNmm2`: 5wL⁴/(384EI). */
export function uniformLoadDeflectionMm(loadNPerMm: number, spanMm: number, eiNmm2: number): number {
  return (5 * loadNPerMm * spanMm ** 4) / (384 * eiNmm2);
}

/** The longest span (mm) whose deflection under `loadNPerMm` stays within `limitPerSpan` × span, for stiffness `eiNmm2`. */
export function longestSpanMm(loadNPerMm: number, eiNmm2: number, limitPerSpan: number): number {
  // 5wL⁴/(384EI) = k·L  ⇒  L³ = 384·EI·k / (5w)
  return Math.cbrt((384 * eiNmm2 * limitPerSpan) / (5 * loadNPerMm));
}
