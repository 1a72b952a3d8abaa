import { useEffect, useState } from 'react';
import { Link, Navigate, useParams } from 'react-router-dom';
import { PIECE_KINDS } from '../../shared/schemas/designs.ts';
import { can } from '../../shared/permissions.ts';
import { useDesigns, type DesignFilters } from '../api/useDesigns.ts';
import { useMe } from '../api/useMe.ts';
import { useMembers } from '../api/useMembers.ts';
import { DesignCard } from '../components/DesignCard.tsx';
import { ErrorNotice } from '../components/ErrorNotice.tsx';
import { LoadingBlock } from '../components/LoadingBlock.tsx';
import { WorkshopSwitcher } from '../components/WorkshopSwitcher.tsx';
import { usePreferences } from '../state/usePreferences.ts';
import { linkTo, paths } from './paths.ts';

/** A workshop's designs as a grid of cards, with search, filters and "new design". */
export function WorkshopPage() {
  const { workshopId = '' } = useParams();
  const me = useMe();
  const workshop = me.data?.workshops.find((w) => w.id === workshopId);
  const setLastWorkshop = usePreferences((s) => s.setLastWorkshop);
  const [search, setSearch] = useState('');
  const [filters, setFilters] = useState<DesignFilters>({ archived: 'false' });
  const members = useMembers(workshop ? workshopId : undefined);
  const designs = useDesigns(workshop ? workshopId : undefined, { ...filters, q: search.trim() || undefined });

  useEffect(() => {
    if (workshop) setLastWorkshop(workshop.id);
  }, [workshop, setLastWorkshop]);

  if (!me.data) return null;
  if (!workshop) return <Navigate to={paths.workshops} replace />;
  const canCreate = can(workshop.role, 'design.create');
  const list = designs.data?.designs ?? [];

  return (
    <div className="mx-auto w-full max-w-[1600px] px-4 py-6">
      <div className="flex flex-wrap items-end justify-between gap-4 border-b border-rule pb-4">
        <div>
          <p className="font-mono text-xs uppercase tracking-[0.2em] text-pencil">Workshop · {workshop.role}</p>
          <h1 className="mt-1 text-3xl font-semibold tracking-tight">{workshop.name}</h1>
        </div>
        <div className="flex flex-wrap items-center gap-3">
          <WorkshopSwitcher workshops={me.data.workshops} currentId={workshop.id} />
          {canCreate && (
            <Link to={linkTo.newDesign(workshop.id)} className="btn btn-primary">
              New design
            </Link>
          )}
        </div>
      </div>

      <form role="search" className="my-4 flex flex-wrap items-end gap-3" onSubmit={(e) => e.preventDefault()}>
        <div className="min-w-[14rem] flex-1">
          <label htmlFor="design-search" className="block text-xs font-medium text-graphite-soft">
            Search titles
          </label>
          <input id="design-search" type="search" className="field mt-1 font-sans" placeholder="blanket chest, cherry…" value={search} onChange={(e) => setSearch(e.target.value)} />
        </div>
        <Filter label="Kind" value={filters.kind ?? ''} onChange={(v) => setFilters((f) => ({ ...f, kind: (v || undefined) as DesignFilters['kind'] }))}
          options={[{ value: '', label: 'Any kind' }, ...PIECE_KINDS.map((k) => ({ value: k, label: k[0]!.toUpperCase() + k.slice(1) }))]} />
        <Filter label="Last saved by" value={filters.authorId ?? ''} onChange={(v) => setFilters((f) => ({ ...f, authorId: v || undefined }))}
          options={[{ value: '', label: 'Anyone' }, ...(members.data ?? []).map((m) => ({ value: m.id, label: m.name }))]} />
        <Filter label="Archived" value={filters.archived ?? 'false'} onChange={(v) => setFilters((f) => ({ ...f, archived: v as DesignFilters['archived'] }))}
          options={[{ value: 'false', label: 'Current designs' }, { value: 'true', label: 'Archived only' }, { value: 'all', label: 'Both' }]} />
      </form>

      {designs.isPending ? (
        <LoadingBlock label="Loading the designs…" />
      ) : designs.isError ? (
        <ErrorNotice title="Could not load the designs" error={designs.error} onRetry={() => void designs.refetch()} />
      ) : list.length === 0 ? (
        <EmptyGrid filtered={Boolean(search || filters.kind || filters.authorId || filters.archived !== 'false')} newDesignLink={canCreate ? linkTo.newDesign(workshop.id) : null} />
      ) : (
        <>
          <p className="mb-3 text-xs text-graphite-soft" aria-live="polite">
            {designs.data.total} design{designs.data.total === 1 ? '' : 's'}
            {designs.isFetching ? ' · updating…' : ''}
          </p>
          <ul className="grid grid-cols-2 gap-4 md:grid-cols-3 lg:grid-cols-4 2xl:grid-cols-5">
            {list.map((card) => (
              <DesignCard key={card.id} card={card} />
            ))}
          </ul>
        </>
      )}
    </div>
  );
}

function Filter({ label, value, onChange, options }: { label: string; value: string; onChange: (value: string) => void; options: { value: string; label: string }[] }) {
  const id = `filter-${label.toLowerCase().replace(/\W+/g, '-')}`;
  return (
    <div>
      <label htmlFor={id} className="block text-xs font-medium text-graphite-soft">
        {label}
      </label>
      <select id={id} className="field mt-1 w-auto font-sans" value={value} onChange={(e) => onChange(e.target.value)}>
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </div>
  );
}

function EmptyGrid({ filtered, newDesignLink }: { filtered: boolean; newDesignLink: string | null }) {
  return (
    <div className="rounded-sm border border-dashed border-rule px-6 py-14 text-center">
      <p className="font-semibold">{filtered ? 'No design matches these filters.' : 'No designs in this workshop yet.'}</p>
      <p className="mt-1 text-sm text-graphite-soft">
        {filtered ? 'Clear the search or choose other filters.' : newDesignLink ? 'Start one from a chest, dresser or cabinet with sensible defaults.' : 'A designer of this workshop will add them.'}
      </p>
      {!filtered && newDesignLink && (
        <Link to={newDesignLink} className="btn btn-primary mt-4">
          New design
        </Link>
      )}
    </div>
  );
}
