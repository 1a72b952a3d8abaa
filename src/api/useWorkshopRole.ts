import type { Role } from '../../shared/permissions.ts';
import { useMe } from './useMe.ts';

/** The signed-in member's workshop and role there (null when not a member or still loading). */
export function useWorkshopRole(workshopId: string | undefined): { workshop: { id: string; name: string } | null; role: Role | null; loading: boolean } {
  const me = useMe();
  const found = workshopId ? me.data?.workshops.find((w) => w.id === workshopId) : undefined;
  return { workshop: found ? { id: found.id, name: found.name } : null, role: found?.role ?? null, loading: me.isPending };
}
