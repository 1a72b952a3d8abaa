import { describe, expect, it } from 'vitest';
import { isInputError } from '../../../shared/errors.ts';
import { fastenerSlotLength, fastenerSlotLengths, SLOT_END_CLEARANCE_MM } from '../../../shared/wood/slots.ts';

const SLOT_TOLERANCE_MM = 1e-6;
const CLIMATE = { buildMcPercent: 8, lowMcPercent: 6, highMcPercent: 10 };
const SHANK_MM = 4;

describe('fastenerSlotLength', () => {
  it('is the shank plus the travel both ways plus the end clearances', () => {
    // WH2010 Table 13-5, white oak C_T 0.00365: 300 mm × 0.00365 × 2 = 2.19 mm each way.
    const slot = fastenerSlotLength({ distanceFromFixedLineMm: 300, species: 'white-oak', sawn: 'flat', climate: CLIMATE, shankDiameterMm: SHANK_MM });
    expect(Math.abs(slot.slotLengthMm - (SHANK_MM + 2 * 2.19 + 2 * SLOT_END_CLEARANCE_MM))).toBeLessThan(SLOT_TOLERANCE_MM);
    expect(Math.abs(slot.travelTowardFixedLineMm - 2.19)).toBeLessThan(SLOT_TOLERANCE_MM);
    expect(slot.needsSlot).toBe(true);
    // 2.19 mm = 0.0862 in, nearest 1/64 in is 6/64 = 3/32 in
    expect(slot.text.travelAway.text).toEqual({ mm: '2.2 mm', in: '3/32"' });
    expect(slot.slotLengthIn).toBeCloseTo(slot.slotLengthMm / 25.4, 12);
  });

  it('needs no slot on the fixed line itself', () => {
    const slot = fastenerSlotLength({ distanceFromFixedLineMm: 0, species: 'white-oak', sawn: 'flat', climate: CLIMATE, shankDiameterMm: SHANK_MM });
    expect(slot.needsSlot).toBe(false);
    expect(Math.abs(slot.slotLengthMm - (SHANK_MM + 2 * SLOT_END_CLEARANCE_MM))).toBeLessThan(SLOT_TOLERANCE_MM);
  });

  it('sits the screw so the driest-season travel is on the side toward the fixed line', () => {
    const climate = { buildMcPercent: 7, lowMcPercent: 6, highMcPercent: 11 };
    const slot = fastenerSlotLength({ distanceFromFixedLineMm: 400, species: 'black-cherry', sawn: 'flat', climate, shankDiameterMm: SHANK_MM });
    expect(slot.travelAwayMm).toBeGreaterThan(slot.travelTowardFixedLineMm);
    expect(Math.abs(slot.screwFromNearEndMm - (SLOT_END_CLEARANCE_MM + slot.travelTowardFixedLineMm + SHANK_MM / 2))).toBeLessThan(SLOT_TOLERANCE_MM);
  });

  it('rejects a negative distance and a missing shank', () => {
    expect(() => fastenerSlotLength({ distanceFromFixedLineMm: -5, species: 'white-oak', sawn: 'flat', climate: CLIMATE, shankDiameterMm: SHANK_MM })).toThrow(/0 mm or more/);
    expect(() => fastenerSlotLength({ distanceFromFixedLineMm: 5, species: 'white-oak', sawn: 'flat', climate: CLIMATE, shankDiameterMm: 0 })).toThrow(/greater than 0/);
  });
});

describe('fastenerSlotLengths', () => {
  it('grows each slot with the screw’s distance from the fixed line', () => {
    const slots = fastenerSlotLengths({ distancesFromFixedLineMm: [50, 150, 250, 350], species: 'hard-maple', sawn: 'flat', climate: CLIMATE, shankDiameterMm: SHANK_MM });
    const lengths = slots.map((slot) => slot.slotLengthMm);
    expect(lengths).toEqual([...lengths].sort((a, b) => a - b));
    expect(new Set(lengths).size).toBe(4);
  });

  it('names the index of a bad distance', () => {
    let caught: unknown;
    try {
      fastenerSlotLengths({ distancesFromFixedLineMm: [50, -1], species: 'hard-maple', sawn: 'flat', climate: CLIMATE, shankDiameterMm: SHANK_MM });
    } catch (error) {
      caught = error;
    }
    expect(isInputError(caught) && caught.field).toBe('distancesFromFixedLineMm[1]');
  });
});
