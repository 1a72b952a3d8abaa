import { useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router-dom';
import { can, type Role } from '../../shared/permissions.ts';
import type { MeResponse } from '../../shared/schemas/auth.ts';
import { titleSchema } from '../../shared/schemas/designs.ts';
import { useForkDesign } from '../api/useForkDesign.ts';
import { linkTo } from '../routes/paths.ts';
import { ErrorNotice } from './ErrorNotice.tsx';
import { RoleRefusal } from './RoleRefusal.tsx';

/**
 * Fork a revision into a workshop where the user may create designs; the original stays as it is.
 * Forking needs `design.fork` in the design's own workshop (`role`) as well: a reviewer there is
 * told so rather than shown a form the API would refuse.
 */
export function ForkPanel({ designId, title, revision, workshops, role }: { designId: string; title: string; revision: number; workshops: MeResponse['workshops']; role: Role | null }) {
  const targets = workshops.filter((w) => can(w.role, 'design.create'));
  const [workshopId, setWorkshopId] = useState(targets[0]?.id ?? '');
  const [name, setName] = useState(`${title} (variation)`);
  const [error, setError] = useState<string | null>(null);
  const fork = useForkDesign(designId);
  const navigate = useNavigate();
  if (!can(role, 'design.fork')) return <RoleRefusal compact role={role} action="design.fork" doing="fork this design" />;
  if (targets.length === 0) return <p className="px-3 py-4 text-sm text-graphite-soft">You cannot create designs in any of your workshops, so you cannot fork here.</p>;
  const submit = (event: FormEvent) => {
    event.preventDefault();
    const parsed = titleSchema.safeParse(name);
    if (!parsed.success) return setError(`Title ${parsed.error.issues[0]?.message ?? 'is not valid'}`);
    setError(null);
    fork.mutate({ workshopId, title: parsed.data, revision }, { onSuccess: (design) => navigate(linkTo.design(design.id)) });
  };
  return (
    <form onSubmit={submit} className="space-y-3 px-3 py-3 text-sm" aria-label="Fork this design">
      <p className="text-graphite-soft">A fork starts a new design from revision <span className="font-mono">r{revision}</span>. It remembers where it came from; the original is not touched.</p>
      <div>
        <label htmlFor="fork-title" className="block text-xs text-graphite-soft">Title of the fork</label>
        <input id="fork-title" className={`field mt-0.5 font-sans ${error ? 'border-pencil' : ''}`} value={name} onChange={(e) => setName(e.target.value)} aria-invalid={error ? true : undefined} />
        {error && <p role="alert" className="mt-0.5 text-xs text-pencil">{error}</p>}
      </div>
      <div>
        <label htmlFor="fork-workshop" className="block text-xs text-graphite-soft">Into the workshop</label>
        <select id="fork-workshop" className="field mt-0.5 font-sans" value={workshopId} onChange={(e) => setWorkshopId(e.target.value)}>
          {targets.map((w) => <option key={w.id} value={w.id}>{w.name}</option>)}
        </select>
      </div>
      <button type="submit" className="btn btn-primary" disabled={fork.isPending}>{fork.isPending ? 'Forking…' : `Fork r${revision}`}</button>
      {fork.error && <ErrorNotice title="Could not fork" error={fork.error} />}
    </form>
  );
}
