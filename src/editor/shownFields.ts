/** Which parameter fields a form shows for the current values. */
import type { ParamDef } from '../../shared/engine/paramDef.ts';
import { paramShown } from '../../shared/engine/paramShown.ts';

/**
 * The definitions whose `shownWhen` holds for `params` (missing values read as the defaults).
 * A field the engine names in its refusal (`namedKey`) is always shown, so the maker can
 * always reach the value that stops the build, even one whose condition is off.
 */
export function shownFields(defs: readonly ParamDef[], params: Readonly<Record<string, unknown>>, namedKey: string | null): ParamDef[] {
  const values: Record<string, unknown> = {};
  for (const def of defs) values[def.key] = params[def.key] ?? def.default;
  return defs.filter((def) => def.key === namedKey || paramShown(def, values));
}
