import { useNavigate } from 'react-router-dom';
import type { MeResponse } from '../../shared/schemas/auth.ts';
import { linkTo } from '../routes/paths.ts';

/** Moves between the workshops the user belongs to; shows their role in each. */
export function WorkshopSwitcher({ workshops, currentId }: { workshops: MeResponse['workshops']; currentId: string }) {
  const navigate = useNavigate();
  if (workshops.length < 2) return null;
  return (
    <div className="flex items-center gap-2 text-sm">
      <label htmlFor="workshop-switcher" className="text-graphite-soft">
        Workshop
      </label>
      <select id="workshop-switcher" className="field w-auto font-sans" value={currentId} onChange={(e) => navigate(linkTo.workshop(e.target.value))}>
        {workshops.map((w) => (
          <option key={w.id} value={w.id}>
            {w.name} ({w.role})
          </option>
        ))}
      </select>
    </div>
  );
}
