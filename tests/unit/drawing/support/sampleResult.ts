/**
 * A small frame-and-panel chest built by hand as an engine result, so the drawing code can be
 * tested on every kind of cut (tongue, groove, stopped groove, rabbet, notch, recess, slot)
 * independently of the engine's own construction rules. Invented sizes, not a published design.
 */
import { placeInto } from '../../../../shared/engine/geometry/placement.ts';
import type { Box3, CutListGroup, Feature, Part, PieceResult, Placement, Vec3 } from '../../../../shared/engine/types.ts';

const OAK = { kind: 'solid', speciesId: 'white-oak', speciesName: 'White oak' } as const;
const PLY = { kind: 'sheet', sheetId: 'hardwood-plywood-1/2', sheetName: 'Hardwood plywood 1/2' } as const;

const box = (min: Vec3, max: Vec3): Box3 => ({ min, max });

function part(p: Omit<Part, 'rough' | 'notes' | 'grain'> & { grain?: Part['grain'] }): Part {
  return {
    grain: p.material.kind === 'solid' ? 'length' : 'none',
    notes: [],
    rough: { lengthMm: p.lengthMm + 25, widthMm: p.widthMm + 6, thicknessMm: 25.4, quarters: p.material.kind === 'solid' ? 4 : 0 },
    ...p,
  };
}

// Legs: 580 long, 45 square, stopped grooves on two adjacent faces for the frames.
const leg = part({
  id: 'leg', name: 'Leg', role: 'leg', material: OAK, lengthMm: 580, widthMm: 45, thicknessMm: 45, quantity: 4,
  features: [
    { id: 'groove-front', type: 'stopped-groove', face: 'face-b', label: 'groove for the front frame', widthMm: 6.35, depthMm: 12.7, offsetMm: 12, startMm: 87, stopMm: 568, removed: [box([87, 12, 32.3], [568, 18.35, 45])] },
    { id: 'groove-side', type: 'stopped-groove', face: 'edge-b', label: 'groove for the side frame', widthMm: 6.35, depthMm: 12.7, offsetMm: 12, startMm: 87, stopMm: 568, removed: [box([87, 32.3, 12], [568, 45, 18.35])] },
  ],
});

function tongues(lengthMm: number, widthMm: number): Feature[] {
  return [
    { id: 'tongue-a', type: 'tongue', face: 'end-a', label: 'stub tenon', thicknessMm: 6.35, lengthMm: 11, widthMm, tongue: box([0, 0, 6.35], [11, widthMm, 12.7]), removed: [box([0, 0, 0], [11, widthMm, 6.35]), box([0, 0, 12.7], [11, widthMm, 19])] },
    { id: 'tongue-b', type: 'tongue', face: 'end-b', label: 'stub tenon', thicknessMm: 6.35, lengthMm: 11, widthMm, tongue: box([lengthMm - 11, 0, 6.35], [lengthMm, widthMm, 12.7]), removed: [box([lengthMm - 11, 0, 0], [lengthMm, widthMm, 6.35]), box([lengthMm - 11, 0, 12.7], [lengthMm, widthMm, 19])] },
  ];
}

// Top rails: 932 long (910 between legs plus two 11 mm tongues), groove on the lower edge.
const topRail = part({
  id: 'front-top-rail', name: 'Front and back top rail', role: 'rail', material: OAK, lengthMm: 932, widthMm: 80, thicknessMm: 19, quantity: 2,
  features: [
    ...tongues(932, 80),
    { id: 'groove-panel', type: 'groove', face: 'edge-a', label: 'groove for the panel', widthMm: 6.35, depthMm: 9.5, offsetMm: 6.35, lengthMm: 932, removed: [box([0, 0, 6.35], [932, 9.5, 12.7])] },
  ],
});

const sideRail = part({
  id: 'side-top-rail', name: 'Side top rail', role: 'rail', material: OAK, lengthMm: 412, widthMm: 80, thicknessMm: 19, quantity: 2,
  features: tongues(412, 80),
});

// Panel: 12 mm plywood rabbeted on face A all round to a 6.35 mm tongue.
const panel = part({
  id: 'front-panel', name: 'Front and back panel', role: 'panel', material: PLY, lengthMm: 930, widthMm: 350, thicknessMm: 12, quantity: 2,
  features: [
    { id: 'rabbet-a', type: 'rabbet', face: 'end-a', label: 'rabbet to a tongue', widthMm: 10, depthMm: 5.65, lengthMm: 350, removed: [box([0, 0, 0], [10, 350, 5.65])] },
    { id: 'rabbet-b', type: 'rabbet', face: 'end-b', label: 'rabbet to a tongue', widthMm: 10, depthMm: 5.65, lengthMm: 350, removed: [box([920, 0, 0], [930, 350, 5.65])] },
  ],
});

const bottom = part({
  id: 'bottom', name: 'Bottom', role: 'bottom', material: PLY, lengthMm: 956, widthMm: 436, thicknessMm: 12, quantity: 1,
  features: [
    { id: 'notch-1', type: 'notch', face: 'face-b', label: 'notch around the leg', lengthMm: 23, widthMm: 23, depthMm: 12, atMm: [0, 0], removed: [box([0, 0, 0], [23, 23, 12])] },
    { id: 'notch-2', type: 'notch', face: 'face-b', label: 'notch around the leg', lengthMm: 23, widthMm: 23, depthMm: 12, atMm: [933, 0], removed: [box([933, 0, 0], [956, 23, 12])] },
    { id: 'notch-3', type: 'notch', face: 'face-b', label: 'notch around the leg', lengthMm: 23, widthMm: 23, depthMm: 12, atMm: [0, 413], removed: [box([0, 413, 0], [23, 436, 12])] },
    { id: 'notch-4', type: 'notch', face: 'face-b', label: 'notch around the leg', lengthMm: 23, widthMm: 23, depthMm: 12, atMm: [933, 413], removed: [box([933, 413, 0], [956, 436, 12])] },
  ],
});

const lid = part({
  id: 'lid', name: 'Lid', role: 'lid', material: OAK, lengthMm: 1050, widthMm: 511, thicknessMm: 20, quantity: 1,
  glueUp: { boards: 4, boardWidthMm: 127.75 },
  features: [150, 836.5].map((x, i) => ({
    id: `hinge-${i + 1}`, type: 'recess' as const, face: 'face-a' as const, label: 'hinge leaf recess', lengthMm: 63.5, widthMm: 16, depthMm: 2,
    atMm: [x, 495] as const, removed: [box([x, 495, 0], [x + 63.5, 511, 2])],
  })),
});

const batten = part({
  id: 'batten', name: 'Lid batten', role: 'batten', material: OAK, lengthMm: 420, widthMm: 50, thicknessMm: 19, quantity: 2,
  features: [60, 210, 360].map((y, i) => ({
    id: `slot-${i + 1}`, type: 'slot' as const, face: 'face-b' as const, label: 'screw slot', diameterMm: 4.2, slotLengthMm: 10, depthMm: 19,
    atMm: [y, 25] as const, along: 'length' as const, removed: [box([y - 5, 22.9, 0], [y + 5, 27.1, 19])],
  })),
});

const parts: Part[] = [leg, topRail, sideRail, panel, bottom, lid, batten];

function placements(): Placement[] {
  const out: Placement[] = [];
  const legAxes = { length: '+Z', width: '+X', thickness: '+Y' } as const;
  [[0, 0], [955, 0], [0, 435], [955, 435]].forEach(([x, y], i) => {
    out.push(placeInto('leg', i, `leg ${i + 1}`, [580, 45, 45], legAxes, box([x!, y!, 0], [x! + 45, y! + 45, 580]), [x! < 500 ? -80 : 80, y! < 200 ? -80 : 80, 0]));
  });
  const railAxes = { length: '+X', width: '+Z', thickness: '-Y' } as const;
  out.push(placeInto('front-top-rail', 0, 'front top rail', [932, 80, 19], railAxes, box([34, 3, 500], [966, 22, 580]), [0, -160, 0]));
  out.push(placeInto('front-top-rail', 1, 'back top rail', [932, 80, 19], railAxes, box([34, 458, 500], [966, 477, 580]), [0, 160, 0]));
  const sideAxes = { length: '+Y', width: '+Z', thickness: '+X' } as const;
  out.push(placeInto('side-top-rail', 0, 'left top rail', [412, 80, 19], sideAxes, box([3, 34, 500], [22, 446, 580]), [-160, 0, 0]));
  out.push(placeInto('side-top-rail', 1, 'right top rail', [412, 80, 19], sideAxes, box([978, 34, 500], [997, 446, 580]), [160, 0, 0]));
  out.push(placeInto('front-panel', 0, 'front panel', [930, 350, 12], railAxes, box([35, 6, 160], [965, 18, 510]), [0, -120, 0]));
  out.push(placeInto('front-panel', 1, 'back panel', [930, 350, 12], railAxes, box([35, 462, 160], [965, 474, 510]), [0, 120, 0]));
  out.push(placeInto('bottom', 0, 'bottom', [956, 436, 12], { length: '+X', width: '+Y', thickness: '+Z' }, box([22, 22, 140], [978, 458, 152]), [0, 0, -120]));
  out.push(placeInto('lid', 0, 'lid', [1050, 511, 20], { length: '+X', width: '+Y', thickness: '+Z' }, box([-25, -25, 580], [1025, 486, 600]), [0, 0, 220]));
  const battenAxes = { length: '+Y', width: '+X', thickness: '-Z' } as const;
  out.push(placeInto('batten', 0, 'left batten', [420, 50, 19], battenAxes, box([100, 40, 561], [150, 460, 580]), [0, 0, 160]));
  out.push(placeInto('batten', 1, 'right batten', [420, 50, 19], battenAxes, box([850, 40, 561], [900, 460, 580]), [0, 0, 160]));
  return out;
}

function cutList(): CutListGroup[] {
  const row = (p: Part) => ({ partId: p.id, name: p.name, quantity: p.quantity, finished: [p.lengthMm, p.widthMm, p.thicknessMm] as const, rough: [p.rough.lengthMm, p.rough.widthMm, p.rough.thicknessMm] as const, grain: p.grain, notes: p.notes });
  return [
    { material: 'White oak 4/4', materialKind: 'solid', rows: parts.filter((p) => p.material.kind === 'solid').map(row) },
    { material: 'Hardwood plywood 1/2', materialKind: 'sheet', rows: parts.filter((p) => p.material.kind === 'sheet').map(row) },
  ];
}

/** The sample chest as an engine result: 1050 × 511 × 600 mm over the lid. */
export function sampleResult(): PieceResult {
  return {
    spec: { schemaVersion: 1, kind: 'chest', params: { width: 1000, depth: 480 }, climate: { buildMcPercent: 8, lowMcPercent: 6, highMcPercent: 10 } },
    kind: 'chest',
    engineVersion: 'sample',
    openings: [],
    parts,
    joints: [
      { id: 'front-top-rail:leg:stub-tenon', type: 'stub-tenon', members: [{ partId: 'front-top-rail', featureIds: ['tongue-a', 'tongue-b'] }, { partId: 'leg', featureIds: ['groove-front'] }], count: 4, clearanceMm: 1.6, glued: true, floating: false, note: 'tongue 1/16 in short of the groove bottom' },
      { id: 'front-panel:front-top-rail:panel-in-groove', type: 'panel-in-groove', members: [{ partId: 'front-panel', featureIds: ['rabbet-a'] }, { partId: 'front-top-rail', featureIds: ['groove-panel'] }], count: 2, clearanceMm: 1.6, glued: false, floating: true, note: 'panel floats: do not glue' },
    ],
    placements: placements(),
    checks: [
      { id: 'panel-float:front-panel', severity: 'info', title: 'Panel float', message: 'The plywood panel needs no seasonal float; 1/16 in clearance for fit.', partIds: ['front-panel'], numbers: { floatMm: 1.6 } },
    ],
    bboxMm: [1050, 511, 600],
    bboxMinMm: [-25, -25, 0],
    derived: {
      cutList: cutList(),
      joinery: [],
      boardFeet: { bySpecies: [{ speciesId: 'white-oak', speciesName: 'White oak', byThickness: { '4/4': 18.4 }, total: 18.4 }], total: 18.4 },
      sheetArea: [{ sheetId: 'hardwood-plywood-1/2', sheetName: 'Hardwood plywood 1/2', areaM2: 1.07, areaFt2: 11.5, sheetsByArea: 1 }],
      glueUp: [
        { stage: 1, title: 'Lid panel', steps: [{ title: 'Edge-glue the lid boards', partIds: ['lid'], notes: ['alternate the growth rings'] }], floatingPartIds: [] },
        { stage: 2, title: 'Front and back frames', steps: [{ title: 'Rails into the legs', partIds: ['leg', 'front-top-rail'], notes: [] }], floatingPartIds: ['front-panel'] },
      ],
    },
  };
}
