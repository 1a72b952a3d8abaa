/**
 * Fastener slots for a solid top or lid screwed to a cross-grain batten or rail. The top is
 * held fixed along one line (its back edge, or its centre); a screw at distance d from that
 * line travels as the width d swells and shrinks, so its hole in the batten is a slot as long
 * as the shank plus that travel both ways, plus a little clearance at each end.
 */
import { InputError } from '../errors.ts';
import { dual, type DualLength } from '../units/dual.ts';
import { MM_PER_INCH } from '../units/length.ts';
import { checkClimate, type Climate } from './climate.ts';
import { checkWidth, seasonalSwingMm, type Sawn } from './movement.ts';
import type { SpeciesInput } from './resolve.ts';

/**
 * Clearance at each end of a slot so the screw never bears on the end at the extreme season:
 * 1/64 in. Casewright's allowance, common practice, no published source.
 */
export const SLOT_END_CLEARANCE_MM = MM_PER_INCH / 64;

const SHOW = { inchPrecision: 64, mmPrecision: 0.1 } as const;

/** Inputs for {@link fastenerSlotLength}. */
export interface FastenerSlotInput {
  /** Distance across the grain from the fixed line to the screw, mm (0 on the line). */
  distanceFromFixedLineMm: number;
  species: SpeciesInput;
  sawn: Sawn;
  climate: Climate;
  /** Diameter of the screw's shank, mm. */
  shankDiameterMm: number;
  /** Clearance at each end, mm; default {@link SLOT_END_CLEARANCE_MM}. */
  endClearanceMm?: number;
}

/** The slot one screw needs. */
export interface FastenerSlot {
  distanceFromFixedLineMm: number;
  /** Length of the slot along the top's width, mm. */
  slotLengthMm: number;
  slotLengthIn: number;
  slotLength: DualLength;
  /** How far the screw moves toward the fixed line at the driest, mm. */
  travelTowardFixedLineMm: number;
  /** How far the screw moves away from the fixed line at the most humid, mm. */
  travelAwayMm: number;
  /**
   * Where the screw's centre sits at build, measured from the slot's end nearer the fixed
   * line, mm: it has the driest-season travel on that side and the humid travel on the other.
   */
  screwFromNearEndMm: number;
  /** The travel and the screw's place in the slot, ready to show. */
  text: { travelToward: DualLength; travelAway: DualLength; screwFromNearEnd: DualLength };
  /** True when the travel is large enough that a plain clearance hole would bind. */
  needsSlot: boolean;
  approximate: boolean;
}

/**
 * The numbers of a {@link FastenerSlot} without display text: what the engine reads on every
 * rebuild.
 */
export type FastenerSlotMm = Omit<FastenerSlot, 'slotLengthIn' | 'slotLength' | 'text'>;

/** Slot length (mm) for a screw `distanceFromFixedLineMm` from the line where the top is fixed. */
export function fastenerSlotLength(input: FastenerSlotInput): FastenerSlot {
  const s = fastenerSlotMm(input);
  return {
    distanceFromFixedLineMm: s.distanceFromFixedLineMm,
    slotLengthMm: s.slotLengthMm,
    slotLengthIn: s.slotLengthMm / MM_PER_INCH,
    slotLength: dual(s.slotLengthMm, { inchPrecision: 32, mmPrecision: 0.5 }),
    travelTowardFixedLineMm: s.travelTowardFixedLineMm,
    travelAwayMm: s.travelAwayMm,
    screwFromNearEndMm: s.screwFromNearEndMm,
    text: { travelToward: dual(s.travelTowardFixedLineMm, SHOW), travelAway: dual(s.travelAwayMm, SHOW), screwFromNearEnd: dual(s.screwFromNearEndMm, SHOW) },
    needsSlot: s.needsSlot,
    approximate: s.approximate,
  };
}

/** {@link fastenerSlotLength} without display text (mm). */
export function fastenerSlotMm(input: FastenerSlotInput): FastenerSlotMm {
  const distance = input.distanceFromFixedLineMm;
  if (typeof distance !== 'number' || !Number.isFinite(distance) || distance < 0) {
    throw new InputError('distanceFromFixedLineMm', `must be 0 mm or more (got ${String(distance)})`, 'at least 0');
  }
  checkWidth(input.shankDiameterMm, 'shankDiameterMm');
  const endClearanceMm = input.endClearanceMm ?? SLOT_END_CLEARANCE_MM;
  if (!Number.isFinite(endClearanceMm) || endClearanceMm < 0) {
    throw new InputError('endClearanceMm', `must be 0 mm or more (got ${endClearanceMm})`, 'at least 0');
  }
  const climate = checkClimate(input.climate);
  const swing = distance > 0 ? seasonalSwingMm({ widthMm: distance, species: input.species, sawn: input.sawn, climate }) : null;
  const toward = swing?.shrinkMm ?? 0;
  const away = swing?.swellMm ?? 0;
  return {
    distanceFromFixedLineMm: distance,
    slotLengthMm: input.shankDiameterMm + toward + away + 2 * endClearanceMm,
    travelTowardFixedLineMm: toward,
    travelAwayMm: away,
    screwFromNearEndMm: endClearanceMm + toward + input.shankDiameterMm / 2,
    needsSlot: toward + away > 2 * endClearanceMm,
    approximate: swing?.approximate ?? false,
  };
}

/** Inputs for {@link fastenerSlotLengths}: the same as one slot, with every screw's distance. */
export type FastenerSlotsInput = Omit<FastenerSlotInput, 'distanceFromFixedLineMm'> & {
  /** Distances of the screws from the fixed line, mm. */
  distancesFromFixedLineMm: readonly number[];
};

/** Slot lengths for several screws along one batten, in the order given. */
export function fastenerSlotLengths(input: FastenerSlotsInput): FastenerSlot[] {
  const { distancesFromFixedLineMm, ...rest } = input;
  return distancesFromFixedLineMm.map((distanceFromFixedLineMm, index) => {
    try {
      return fastenerSlotLength({ ...rest, distanceFromFixedLineMm });
    } catch (error) {
      if (error instanceof InputError && error.field === 'distanceFromFixedLineMm') {
        throw new InputError(`distancesFromFixedLineMm[${index}]`, error.message, error.limit);
      }
      throw error;
    }
  });
}
