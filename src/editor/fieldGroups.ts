/** Turns the engine's parameter metadata into the groups a form shows, in the engine's order. */
import type { ParamDef } from '../../shared/engine/paramDef.ts';

/** One titled group of parameters, e.g. `Size` or `Lid`. */
export interface FieldGroup {
  title: string;
  /** A stable id for headings and anchors, e.g. `group-hinges-and-lid-support`. */
  id: string;
  defs: readonly ParamDef[];
}

/** Groups `defs` by their `group`, keeping the first appearance order of groups and of fields. */
export function groupParams(defs: readonly ParamDef[]): FieldGroup[] {
  const groups = new Map<string, ParamDef[]>();
  for (const def of defs) {
    const list = groups.get(def.group);
    if (list) list.push(def);
    else groups.set(def.group, [def]);
  }
  return [...groups].map(([title, list]) => ({ title, id: `group-${slug(title)}`, defs: list }));
}

function slug(text: string): string {
  return text.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '');
}
