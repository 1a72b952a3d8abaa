/**
 * Glue-up stages for a carcass piece (dresser, cabinet): flat subassemblies first (boards into
 * wide parts, the face frame, door frames round their floating panels, drawer boxes), then the
 * carcass square in one go, then what hangs on it, and last what is screwed on so it can move
 * or be adjusted (the top, drawer fronts, doors).
 */
import type { GlueUpStage, Part, PartRole } from '../types.ts';

const ids = (parts: readonly Part[], roles: readonly PartRole[]): string[] => parts.filter((p) => roles.includes(p.role)).map((p) => p.id);

/** Glue-up stages from the parts of a dresser or cabinet; stages with nothing in them are left out. */
export function caseGlueUpStages(parts: readonly Part[]): GlueUpStage[] {
  const glued = parts.filter((p) => p.glueUp);
  const doorPanels = ids(parts, ['door-panel']);
  const drawerBottoms = ids(parts, ['drawer-bottom']);
  const grooveBack = parts.some((p) => p.role === 'back' && p.notes.some((n) => n.includes('Slides into its grooves')));
  // A dresser built like the chest glues its sides on the legs first, then joins them.
  const legs = ids(parts, ['leg']);
  const framedPanels = parts.filter((p) => p.role === 'panel').map((p) => p.id);
  const sideFrame = parts.filter((p) => (p.role === 'rail' || p.role === 'stile') && p.id.startsWith('side-')).map((p) => p.id);
  const joining = parts.filter((p) => (p.role === 'rail' || p.role === 'stile') && !p.id.startsWith('side-')).map((p) => p.id);
  // A carcass's web frames are glued up flat, then let into the sides with the bottom and top.
  const webFrameParts = legs.length > 0 ? [] : parts.filter((p) => p.id.startsWith('web-frame') || p.id.startsWith('dust-panel')).map((p) => p.id);
  const dustPanels = webFrameParts.filter((id) => id.startsWith('dust-panel'));
  // Runners that belong to a web frame are glued in with it; any other runner (a carcass's
  // runners, the slide spacers on a framed case's runners) is screwed in once the case is together.
  const runners = ids(parts, ['runner']);
  const webFrameRunners = runners.filter((id) => id.startsWith('web-frame'));
  const screwedRunners = runners.filter((id) => !id.startsWith('web-frame'));
  const framed: Omit<GlueUpStage, 'stage'>[] = legs.length === 0 ? [] : [
    {
      title: 'The two sides on their legs',
      steps: [{ title: 'Glue each side: two legs, the side rails and stiles, with the side panels in dry', partIds: [...legs, ...sideFrame, ...framedPanels.filter((id) => id.startsWith('side-'))], notes: ['Glue only the tenons; keep glue out of the panel grooves.', 'Check each side for square across its diagonals.'] }],
      floatingPartIds: framedPanels.filter((id) => id.startsWith('side-')),
    },
    {
      title: 'Join the sides with the back and the web frames',
      steps: [{ title: 'Glue the back rails and the web frames\' rails into the legs, the back panel in dry', partIds: [...joining, ...webFrameRunners, ...framedPanels.filter((id) => !id.startsWith('side-'))], notes: ['Glue the runners into the front rails only.', 'Dry-fit first; check the case for square and the web frames for level.'] }],
      floatingPartIds: framedPanels.filter((id) => !id.startsWith('side-')),
    },
  ];
  const stages: Omit<GlueUpStage, 'stage'>[] = [
    ...framed,
    {
      title: 'Wide parts, face frame, door frames and drawer boxes',
      steps: [
        ...glued.map((p) => ({ title: `Edge-glue the ${p.name.toLowerCase()} from ${p.glueUp!.boards} boards`, partIds: [p.id], notes: ['Alternate clamps above and below; flatten after the glue cures.'] })),
        { title: 'Pocket-screw and glue the face frame', partIds: ids(parts, ['face-frame']), notes: ['Glue and screw on a flat surface; check the diagonals.'] },
        { title: 'Glue up each web frame: runners into the front rail, the back rail and dust panels dry', partIds: webFrameParts, notes: ['Glue the runners\' front tenons only; check each frame for square and flat.'] },
        { title: 'Glue each door frame round its panel, the panel dry', partIds: [...ids(parts, ['door-frame']), ...doorPanels], notes: ['Glue only the stub tenons; keep glue out of the panel grooves.', 'Check each door for square and flat.'] },
        { title: 'Glue the drawer boxes with their bottoms slid in dry', partIds: [...ids(parts, ['drawer-side', 'drawer-end']), ...drawerBottoms], notes: ['Square each box to its bottom, then screw the bottom up into the back.'] },
        { title: 'Glue the edge strips to the shelves', partIds: ids(parts, ['edge-strip', 'shelf']), notes: ['Flush at the top; plane or scrape after the glue cures.'] },
      ].filter((s) => s.partIds.length > 0),
      floatingPartIds: [...doorPanels, ...drawerBottoms, ...dustPanels],
    },
    {
      title: 'The carcass',
      steps: [
        { title: 'Glue the bottom, top or stretchers, web frames, dividers and fixed shelves into the sides', partIds: [...ids(parts, ['case-side', 'case-bottom', 'case-top', 'stretcher', 'divider']), ...webFrameParts.filter((id) => id.endsWith('-rail'))], notes: ['Dry-fit first; clamp across every dado; check the diagonals.'] },
        { title: grooveBack ? 'Slide the back into its grooves' : 'Square the case, then glue and pin the back into its rabbets', partIds: ids(parts, ['back']), notes: ['The back holds the case square: fit it before the glue in the dadoes sets.'] },
      ].filter((s) => s.partIds.length > 0),
      floatingPartIds: grooveBack ? ids(parts, ['back']) : [],
    },
    {
      title: 'Face frame, base and runners',
      steps: [
        { title: 'Glue the face frame to the carcass', partIds: ids(parts, ['face-frame']), notes: ['Clamp with cauls; the frame may stand proud a hair and be planed flush.'] },
        { title: 'Build the base and screw the carcass down to it', partIds: ids(parts, ['base']), notes: ['Level the base on the floor first.'] },
        { title: 'Screw in the drawer runners or slides', partIds: screwedRunners, notes: ['Set them level and parallel from a spacer board.'] },
      ].filter((s) => s.partIds.length > 0),
      floatingPartIds: [],
    },
    {
      title: 'Top, fronts and doors',
      steps: [
        { title: 'Screw the top on through the stretchers: round holes at the front, slots at the back', partIds: ids(parts, ['top']), notes: ['Screws at the centre of each slot; no glue.'] },
        { title: 'Screw the drawer fronts to the boxes', partIds: ids(parts, ['drawer-front', 'drawer-end']), notes: ['Set the reveals with spacers before driving the screws.'] },
        { title: 'Hang the doors', partIds: ids(parts, ['door', 'door-frame']), notes: ['Adjust the hinges for even gaps.'] },
        { title: 'Drop in the adjustable shelves', partIds: ids(parts, ['shelf']), notes: [] },
      ].filter((s) => s.partIds.length > 0),
      floatingPartIds: ids(parts, ['top']).filter(() => parts.some((p) => p.role === 'top' && p.material.kind === 'solid')),
    },
  ];
  return stages.filter((s) => s.steps.length > 0).map((s, i) => ({ stage: i + 1, ...s }));
}
