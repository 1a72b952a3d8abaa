import { useMemo, useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router-dom';
import { PIECE_KINDS, defaultSpec } from '../../shared/engine/params.ts';
import type { PieceKind } from '../../shared/engine/types.ts';
import { titleSchema, type DesignCard } from '../../shared/schemas/designs.ts';
import { useCreateDesign } from '../api/useCreateDesign.ts';
import { useForkDesign } from '../api/useForkDesign.ts';
import { linkTo } from '../routes/paths.ts';
import { TextField } from './TextField.tsx';

const KIND_WORDS: Record<PieceKind, string> = {
  chest: 'Chest — frame-and-panel sides on corner legs, lid',
  dresser: 'Dresser — carcass with drawers',
  cabinet: 'Cabinet — carcass with doors and shelves',
};

/** The kinds this engine can build, each with its defaults; unbuilt kinds are shown but disabled. */
function buildableKinds(): { kind: PieceKind; ok: boolean }[] {
  return PIECE_KINDS.map((kind) => {
    try {
      defaultSpec(kind);
      return { kind, ok: true };
    } catch {
      return { kind, ok: false };
    }
  });
}

/** Start a design from a kind's defaults, or as a variation (a fork) of one already in the workshop. */
export function NewDesignPanel({ workshopId, designs, onClose, initialKind, initialSourceId }: {
  workshopId: string;
  designs: readonly DesignCard[];
  onClose: () => void;
  /** The kind chosen at first (when the engine builds it). */
  initialKind?: PieceKind;
  /** Start as a variation of this design (when it is in the list). */
  initialSourceId?: string;
}) {
  const kinds = useMemo(buildableKinds, []);
  const startSource = designs.find((d) => d.id === initialSourceId)?.id;
  const [from, setFrom] = useState<'kind' | 'design'>(startSource ? 'design' : 'kind');
  const [kind, setKind] = useState<PieceKind>(kinds.find((k) => k.ok && k.kind === initialKind)?.kind ?? kinds.find((k) => k.ok)?.kind ?? 'chest');
  const [sourceId, setSourceId] = useState(startSource ?? designs[0]?.id ?? '');
  const [title, setTitle] = useState('');
  const [error, setError] = useState<string | null>(null);
  const create = useCreateDesign(workshopId);
  const fork = useForkDesign(sourceId || undefined);
  const navigate = useNavigate();
  const pending = create.isPending || fork.isPending;
  const serverError = create.error?.message ?? fork.error?.message ?? null;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const parsed = titleSchema.safeParse(title);
    if (!parsed.success) return setError(`Title ${parsed.error.issues[0]?.message ?? 'is not valid'}`);
    setError(null);
    const open = (design: { id: string }) => navigate(linkTo.design(design.id));
    if (from === 'kind') create.mutate({ title: parsed.data, spec: defaultSpec(kind), message: 'First revision, from the defaults' }, { onSuccess: open });
    else if (sourceId) fork.mutate({ workshopId, title: parsed.data }, { onSuccess: open });
  };

  return (
    <section aria-labelledby="new-design-title" className="card mb-6 p-5">
      <div className="flex items-start justify-between">
        <h2 id="new-design-title" className="font-semibold">New design</h2>
        <button type="button" className="text-sm text-graphite-soft hover:text-pencil" onClick={onClose}>
          Close
        </button>
      </div>
      <form onSubmit={submit} className="mt-4 grid gap-4 md:grid-cols-[1fr_1fr_auto] md:items-end" noValidate>
        <fieldset className="space-y-2 text-sm">
          <legend className="mb-1 font-medium">Start from</legend>
          <label className="flex items-center gap-2">
            <input type="radio" name="from" checked={from === 'kind'} onChange={() => setFrom('kind')} /> A kind, with its defaults
          </label>
          {from === 'kind' && (
            <select aria-label="Kind of piece" className="field font-sans" value={kind} onChange={(e) => setKind(e.target.value as PieceKind)}>
              {kinds.map(({ kind: k, ok }) => (
                <option key={k} value={k} disabled={!ok}>
                  {KIND_WORDS[k]}{ok ? '' : ' (not built yet)'}
                </option>
              ))}
            </select>
          )}
          <label className="flex items-center gap-2">
            <input type="radio" name="from" checked={from === 'design'} disabled={designs.length === 0} onChange={() => setFrom('design')} /> A variation of a design here
          </label>
          {from === 'design' && (
            <select aria-label="Design to start from" className="field font-sans" value={sourceId} onChange={(e) => setSourceId(e.target.value)}>
              {designs.map((d) => (
                <option key={d.id} value={d.id}>
                  {d.title} (r{d.head.number})
                </option>
              ))}
            </select>
          )}
        </fieldset>
        <TextField label="Title of the new design" placeholder="e.g. Hall chest in cherry" value={title} onChange={(e) => setTitle(e.target.value)} error={error ?? serverError} />
        <button type="submit" className="btn btn-primary justify-center" disabled={pending}>
          {pending ? 'Creating…' : 'Create and open'}
        </button>
      </form>
    </section>
  );
}
