import { useState, type FormEvent } from 'react';
import { Navigate, useNavigate } from 'react-router-dom';
import { nameSchema } from '../../shared/schemas/common.ts';
import { useCreateWorkshop } from '../api/useCreateWorkshop.ts';
import { useMe } from '../api/useMe.ts';
import { AuthFrame } from '../components/AuthFrame.tsx';
import { TextField } from '../components/TextField.tsx';
import { usePreferences } from '../state/usePreferences.ts';
import { linkTo } from './paths.ts';

/** Sends a member to their last (or first) workshop; someone with none starts one. */
export function WorkshopsIndexPage() {
  const me = useMe();
  const lastWorkshopId = usePreferences((s) => s.lastWorkshopId);
  const workshops = me.data?.workshops ?? [];
  const target = workshops.find((w) => w.id === lastWorkshopId) ?? workshops[0];
  if (target) return <Navigate to={linkTo.workshop(target.id)} replace />;
  return <StartWorkshop />;
}

function StartWorkshop() {
  const create = useCreateWorkshop();
  const navigate = useNavigate();
  const [name, setName] = useState('');
  const [error, setError] = useState<string | null>(null);
  const submit = (event: FormEvent) => {
    event.preventDefault();
    const parsed = nameSchema.safeParse(name);
    if (!parsed.success) return setError(`Name ${parsed.error.issues[0]?.message ?? 'is not valid'}`);
    setError(null);
    create.mutate(parsed.data, { onSuccess: (workshop) => navigate(linkTo.workshop(workshop.id)) });
  };
  return (
    <AuthFrame title="Start a workshop" subtitle="A workshop holds your designs and the people you share them with. You can also ask a workshop owner to invite you.">
      <form onSubmit={submit} className="space-y-4" noValidate>
        <TextField label="Workshop name" value={name} onChange={(e) => setName(e.target.value)} error={error ?? create.error?.message ?? null} />
        <button type="submit" className="btn btn-primary w-full justify-center" disabled={create.isPending}>
          {create.isPending ? 'Starting…' : 'Start the workshop'}
        </button>
      </form>
    </AuthFrame>
  );
}
