import { Link, useNavigate, useParams, useSearchParams } from 'react-router-dom';
import { PIECE_KINDS } from '../../shared/engine/params.ts';
import type { PieceKind } from '../../shared/engine/types.ts';
import { can } from '../../shared/permissions.ts';
import { useDesigns } from '../api/useDesigns.ts';
import { useWorkshopRole } from '../api/useWorkshopRole.ts';
import { ErrorNotice } from '../components/ErrorNotice.tsx';
import { LoadingBlock } from '../components/LoadingBlock.tsx';
import { NewDesignPanel } from '../components/NewDesignPanel.tsx';
import { RoleRefusal } from '../components/RoleRefusal.tsx';
import { linkTo, paths } from './paths.ts';

const isKind = (value: string | null): value is PieceKind => (PIECE_KINDS as readonly string[]).includes(value ?? '');

/**
 * Start a design in a workshop: from a kind's defaults (`?kind=dresser` picks one) or as a
 * variation of a design there (`?from=<designId>`). Needs `design.create`; any other member sees
 * why not instead of a form the API would refuse.
 */
export function NewDesignPage() {
  const { workshopId = '' } = useParams();
  const [search] = useSearchParams();
  const navigate = useNavigate();
  const { workshop, role, loading } = useWorkshopRole(workshopId);
  const allowed = can(role, 'design.create');
  const designs = useDesigns(workshop && allowed ? workshopId : undefined, { archived: 'false' });

  if (loading) return <LoadingBlock label="Checking your role…" className="mx-auto max-w-5xl" />;
  if (!workshop) return <RoleRefusal role={null} action="design.create" doing="start a design here" back={{ to: paths.workshops, label: 'Your workshops' }} />;
  if (!allowed) {
    return <RoleRefusal role={role} action="design.create" doing="start a design" workshopName={workshop.name} back={{ to: linkTo.workshop(workshop.id), label: `Back to ${workshop.name}` }} />;
  }
  const kind = search.get('kind');
  return (
    <div className="mx-auto w-full max-w-5xl px-4 py-6">
      <p className="text-xs text-graphite-soft"><Link to={linkTo.workshop(workshop.id)} className="hover:text-pencil">← {workshop.name}</Link></p>
      <h1 className="mb-4 mt-1 text-2xl font-semibold tracking-tight">Start a design</h1>
      {designs.isPending ? (
        <LoadingBlock label="Loading the workshop's designs…" />
      ) : designs.isError ? (
        <ErrorNotice title="Could not load the designs to start from" error={designs.error} onRetry={() => void designs.refetch()} />
      ) : (
        <NewDesignPanel workshopId={workshop.id} designs={designs.data.designs} initialKind={isKind(kind) ? kind : undefined}
          initialSourceId={search.get('from') ?? undefined} onClose={() => navigate(linkTo.workshop(workshop.id))} />
      )}
    </div>
  );
}
