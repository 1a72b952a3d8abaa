/**
 * Glue-up stages for a carcass piece (dresser, cabinet): flat subassemblies first (boards into
 * wide parts, the face frame, door frames round their floating panels, drawer boxes), then the
 * carcass square in one go, then what hangs on it, and last what is screwed on so it can move
 * or be adjusted (the top, drawer fronts, doors).
 */
import type { GlueUpStage, Part, PartRole } from '../types.ts';

/** The parts' ids sorted into the lists the stages name, in part order, in one pass. */
interface Sorted {
  glued: Part[];
  grooveBack: boolean;
  /** Ids by role. */
  byRole: Map<PartRole, string[]>;
  drawerBoxes: string[];
  drawerFronts: string[];
  carcass: string[];
  shelving: string[];
  doorsHung: string[];
  framedPanels: string[];
  sideFrame: string[];
  joining: string[];
  webFrameCandidates: string[];
}

const CARCASS_ROLES: ReadonlySet<PartRole> = new Set<PartRole>(['case-side', 'case-bottom', 'case-top', 'stretcher', 'divider']);

// One pass instead of a filter per list: the stages ask for some twenty lists of a few dozen parts.
function sortParts(parts: readonly Part[]): Sorted {
  const out: Sorted = {
    glued: [], grooveBack: false, byRole: new Map(), drawerBoxes: [], drawerFronts: [], carcass: [], shelving: [], doorsHung: [],
    framedPanels: [], sideFrame: [], joining: [], webFrameCandidates: [],
  };
  for (const p of parts) {
    const { id, role } = p;
    if (p.glueUp) out.glued.push(p);
    const list = out.byRole.get(role);
    if (list) list.push(id);
    else out.byRole.set(role, [id]);
    if (role === 'back' && !out.grooveBack && p.notes.some((n) => n.includes('Slides into its grooves'))) out.grooveBack = true;
    if (role === 'drawer-side' || role === 'drawer-end') out.drawerBoxes.push(id);
    if (role === 'drawer-front' || role === 'drawer-end') out.drawerFronts.push(id);
    if (CARCASS_ROLES.has(role)) out.carcass.push(id);
    if (role === 'edge-strip' || role === 'shelf') out.shelving.push(id);
    if (role === 'door' || role === 'door-frame') out.doorsHung.push(id);
    if (role === 'panel') out.framedPanels.push(id);
    if (role === 'rail' || role === 'stile') (id.startsWith('side-') ? out.sideFrame : out.joining).push(id);
    if (id.startsWith('web-frame') || id.startsWith('dust-panel')) out.webFrameCandidates.push(id);
  }
  return out;
}

/** Glue-up stages from the parts of a dresser or cabinet; stages with nothing in them are left out. */
export function caseGlueUpStages(parts: readonly Part[]): GlueUpStage[] {
  const sorted = sortParts(parts);
  const ids = (role: PartRole): string[] => sorted.byRole.get(role)?.slice() ?? [];
  const { glued, grooveBack, framedPanels, sideFrame, joining } = sorted;
  const doorPanels = ids('door-panel');
  const drawerBottoms = ids('drawer-bottom');
  // A dresser built like the chest glues its sides on the legs first, then joins them.
  const legs = ids('leg');
  // A carcass's web frames are glued up flat, then let into the sides with the bottom and top.
  const webFrameParts = legs.length > 0 ? [] : sorted.webFrameCandidates;
  const dustPanels = webFrameParts.filter((id) => id.startsWith('dust-panel'));
  // Runners that belong to a web frame are glued in with it; any other runner (a carcass's
  // runners, the slide spacers on a framed case's runners) is screwed in once the case is together.
  const runners = ids('runner');
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
        { title: 'Pocket-screw and glue the face frame', partIds: ids('face-frame'), notes: ['Glue and screw on a flat surface; check the diagonals.'] },
        { title: 'Glue up each web frame: runners into the front rail, the back rail and dust panels dry', partIds: webFrameParts, notes: ['Glue the runners\' front tenons only; check each frame for square and flat.'] },
        { title: 'Glue each door frame round its panel, the panel dry', partIds: [...ids('door-frame'), ...doorPanels], notes: ['Glue only the stub tenons; keep glue out of the panel grooves.', 'Check each door for square and flat.'] },
        { title: 'Glue the drawer boxes with their bottoms slid in dry', partIds: [...sorted.drawerBoxes, ...drawerBottoms], notes: ['Square each box to its bottom, then screw the bottom up into the back.'] },
        { title: 'Glue the edge strips to the shelves', partIds: sorted.shelving, notes: ['Flush at the top; plane or scrape after the glue cures.'] },
      ].filter((s) => s.partIds.length > 0),
      floatingPartIds: [...doorPanels, ...drawerBottoms, ...dustPanels],
    },
    {
      title: 'The carcass',
      steps: [
        { title: 'Glue the bottom, top or stretchers, web frames, dividers and fixed shelves into the sides', partIds: [...sorted.carcass, ...webFrameParts.filter((id) => id.endsWith('-rail'))], notes: ['Dry-fit first; clamp across every dado; check the diagonals.'] },
        { title: grooveBack ? 'Slide the back into its grooves' : 'Square the case, then glue and pin the back into its rabbets', partIds: ids('back'), notes: ['The back holds the case square: fit it before the glue in the dadoes sets.'] },
      ].filter((s) => s.partIds.length > 0),
      floatingPartIds: grooveBack ? ids('back') : [],
    },
    {
      title: 'Face frame, base and runners',
      steps: [
        { title: 'Glue the face frame to the carcass', partIds: ids('face-frame'), notes: ['Clamp with cauls; the frame may stand proud a hair and be planed flush.'] },
        { title: 'Build the base and screw the carcass down to it', partIds: ids('base'), notes: ['Level the base on the floor first.'] },
        { title: 'Screw in the drawer runners or slides', partIds: screwedRunners, notes: ['Set them level and parallel from a spacer board.'] },
      ].filter((s) => s.partIds.length > 0),
      floatingPartIds: [],
    },
    {
      title: 'Top, fronts and doors',
      steps: [
        { title: 'Screw the top on through the stretchers: round holes at the front, slots at the back', partIds: ids('top'), notes: ['Screws at the centre of each slot; no glue.'] },
        { title: 'Screw the drawer fronts to the boxes', partIds: sorted.drawerFronts, notes: ['Set the reveals with spacers before driving the screws.'] },
        { title: 'Hang the doors', partIds: sorted.doorsHung, notes: ['Adjust the hinges for even gaps.'] },
        { title: 'Drop in the adjustable shelves', partIds: ids('shelf'), notes: [] },
      ].filter((s) => s.partIds.length > 0),
      floatingPartIds: ids('top').filter(() => parts.some((p) => p.role === 'top' && p.material.kind === 'solid')),
    },
  ];
  return stages.filter((s) => s.steps.length > 0).map((s, i) => ({ stage: i + 1, ...s }));
}
