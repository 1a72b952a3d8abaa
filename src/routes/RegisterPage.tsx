import { useState, type FormEvent } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { registerBody } from '../../shared/schemas/auth.ts';
import { isApiError } from '../api/fetchJson.ts';
import { useRegister } from '../api/useRegister.ts';
import { AuthFrame } from '../components/AuthFrame.tsx';
import { TextField } from '../components/TextField.tsx';
import { paths } from './paths.ts';

type Field = 'email' | 'name' | 'password';

/** Create an account; the same zod schema the API uses names each field's problem. */
export function RegisterPage() {
  const register = useRegister();
  const navigate = useNavigate();
  const [values, setValues] = useState<Record<Field, string>>({ email: '', name: '', password: '' });
  const [errors, setErrors] = useState<Partial<Record<Field, string>>>({});

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const parsed = registerBody.safeParse(values);
    if (!parsed.success) {
      const found: Partial<Record<Field, string>> = {};
      for (const issue of parsed.error.issues) {
        const field = issue.path[0] as Field;
        found[field] ??= issue.message;
      }
      setErrors(found);
      return;
    }
    setErrors({});
    register.mutate(parsed.data, { onSuccess: () => navigate(paths.workshops, { replace: true }) });
  };
  const set = (field: Field) => (e: { target: { value: string } }) => setValues((v) => ({ ...v, [field]: e.target.value }));
  const serverError = register.error ? (isApiError(register.error, 409) ? register.error.message : register.error.message) : null;

  return (
    <AuthFrame title="Create an account" subtitle="Start a workshop, or accept an invitation to one.">
      <form onSubmit={submit} className="space-y-4" noValidate>
        <TextField label="Your name" autoComplete="name" value={values.name} onChange={set('name')} error={errors.name ?? null} />
        <TextField label="E-mail" type="email" autoComplete="email" value={values.email} onChange={set('email')} error={errors.email ?? null} />
        <TextField label="Password" type="password" autoComplete="new-password" hint="At least 10 characters." value={values.password} onChange={set('password')} error={errors.password ?? null} />
        {serverError && (
          <p role="alert" className="text-sm text-pencil">
            {serverError}
          </p>
        )}
        <button type="submit" className="btn btn-primary w-full justify-center" disabled={register.isPending}>
          {register.isPending ? 'Creating…' : 'Create account'}
        </button>
      </form>
      <p className="mt-6 border-t border-rule pt-4 text-sm">
        Already have one?{' '}
        <Link className="underline-offset-4 hover:text-pencil hover:underline" to={paths.signIn}>
          Sign in
        </Link>
      </p>
    </AuthFrame>
  );
}
