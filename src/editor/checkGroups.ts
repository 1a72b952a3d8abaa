/** Which of the engine's checks belong with the wood-movement results beside the climate inputs. */
import type { Check } from '../../shared/engine/types.ts';

// Check ids name their rule first (`panel-float:front`); these rules are about seasonal movement.
const MOVEMENT_RULES = ['panel-float', 'movement', 'seasonal', 'slot', 'lid-movement', 'glue-up-width'];

/** True when `check` reports how wood moves with moisture (float, slots, seasonal width). */
export function isMovementCheck(check: Check): boolean {
  const rule = check.id.split(':')[0] ?? '';
  return MOVEMENT_RULES.some((prefix) => rule === prefix || rule.startsWith(`${prefix}-`));
}

/** Counts of checks by how serious they are, for a tab label. */
export function problemCount(checks: readonly Check[]): number {
  return checks.filter((c) => c.severity === 'error' || c.severity === 'warning').length;
}
