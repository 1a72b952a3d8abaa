/** Ids and names for merged parts of a construction made of several similar walls or corners. */
import type { PartNamer } from '../assembly.ts';

const titleCase = (text: string): string => text.charAt(0).toUpperCase() + text.slice(1);

/**
 * Names parts of a group of walls: one wall's part is `front-top-rail` / `Front top rail`; a
 * part shared by several walls takes the group's name, e.g. `side-panel` or `front-back-panel`.
 */
export function wallPartNamer(groupId: string, groupName: string, roleId: string, roleName: string): PartNamer {
  return (members) => {
    const distinct = [...new Set(members)];
    if (distinct.length === 1) return { id: `${distinct[0]}-${roleId}`, name: titleCase(`${distinct[0]} ${roleName}`) };
    return { id: `${groupId}-${roleId}`, name: `${groupName} ${roleName}` };
  };
}
