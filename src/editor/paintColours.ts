/**
 * Paint colours the 3D view offers for a piece whose finish is paint. Display only: the spec
 * says the piece is painted, not which colour, so the colour is a view setting and is not saved.
 * Casewright's own names and tones.
 */

/** One paint the view can show. */
export interface PaintColour {
  id: string;
  label: string;
  /** Display tone, `#rrggbb`. */
  hex: string;
}

export const PAINT_COLOURS: readonly PaintColour[] = [
  { id: 'sage', label: 'Sage green', hex: '#8b9b7a' },
  { id: 'harbour', label: 'Harbour blue', hex: '#4e6a80' },
  { id: 'chalk', label: 'Chalk white', hex: '#ece8dd' },
  { id: 'slate', label: 'Slate grey', hex: '#6a6e71' },
  { id: 'brick', label: 'Brick red', hex: '#8f4b3b' },
];

/** The paint shown until the maker picks another. */
export const DEFAULT_PAINT_ID = 'sage';

/** The paint with `id`, or the default one for an id this list does not have. */
export function paintColour(id: string): PaintColour {
  return PAINT_COLOURS.find((p) => p.id === id) ?? PAINT_COLOURS.find((p) => p.id === DEFAULT_PAINT_ID)!;
}

/**
 * Part roles left unpainted on a painted piece: the drawer boxes, which run in the carcass and
 * are usually finished clear or left bare (common practice, no published source).
 */
const UNPAINTED_ROLES = new Set(['drawer-side', 'drawer-end', 'drawer-bottom']);

/** True when a part with `role` takes the paint on a painted piece. */
export function takesPaint(role: string): boolean {
  return !UNPAINTED_ROLES.has(role);
}
