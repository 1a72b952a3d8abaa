/**
 * Density of wood from its specific gravity. WH2010 Chapter 4 (secondary):
 * ρ = 62.43 · G · (1 + M/100) lb/ft³, with G the specific gravity on oven-dry weight and volume
 * at moisture content M. 62.43 lb/ft³ is the density of water, 1000 kg/m³ in metric.
 */

/** Density of water in lb/ft³, the constant of the WH2010 density equation. */
export const WATER_LB_FT3 = 62.43;
/** Density of water in kg/m³. */
export const WATER_KG_M3 = 1000;

/** Density in kg/m³ at `mcPercent` (%), from `specificGravity` measured at that moisture content. */
export function densityKgM3(specificGravity: number, mcPercent: number): number {
  return WATER_KG_M3 * specificGravity * (1 + mcPercent / 100);
}

/** Density in lb/ft³ at `mcPercent` (%), from `specificGravity` measured at that moisture content. */
export function densityLbFt3(specificGravity: number, mcPercent: number): number {
  return WATER_LB_FT3 * specificGravity * (1 + mcPercent / 100);
}
