import { useState, type FormEvent } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { emailSchema, passwordSchema } from '../../shared/schemas/common.ts';
import { usePasswordResetConfirm } from '../api/usePasswordResetConfirm.ts';
import { usePasswordResetRequest } from '../api/usePasswordResetRequest.ts';
import { AuthFrame } from '../components/AuthFrame.tsx';
import { TextField } from '../components/TextField.tsx';
import { paths } from './paths.ts';

/** Without a token: ask for a reset link. With the token from the e-mail: choose a new password. */
export function ResetPasswordPage() {
  const [params] = useSearchParams();
  const token = params.get('token');
  return token ? <ConfirmReset token={token} /> : <RequestReset />;
}

function RequestReset() {
  const request = usePasswordResetRequest();
  const [email, setEmail] = useState('');
  const [error, setError] = useState<string | null>(null);
  const submit = (event: FormEvent) => {
    event.preventDefault();
    const parsed = emailSchema.safeParse(email.trim());
    if (!parsed.success) return setError(parsed.error.issues[0]?.message ?? 'must be an e-mail address');
    setError(null);
    request.mutate(parsed.data);
  };
  return (
    <AuthFrame title="Reset your password" subtitle="We e-mail a link that works for one hour.">
      {request.isSuccess ? (
        <p role="status" className="text-sm">
          {request.data.message}
        </p>
      ) : (
        <form onSubmit={submit} className="space-y-4" noValidate>
          <TextField label="E-mail" type="email" autoComplete="email" value={email} onChange={(e) => setEmail(e.target.value)} error={error ?? request.error?.message ?? null} />
          <button type="submit" className="btn btn-primary w-full justify-center" disabled={request.isPending}>
            {request.isPending ? 'Sending…' : 'Send the reset link'}
          </button>
        </form>
      )}
      <p className="mt-6 border-t border-rule pt-4 text-sm">
        <Link className="underline-offset-4 hover:text-pencil hover:underline" to={paths.signIn}>
          Back to sign in
        </Link>
      </p>
    </AuthFrame>
  );
}

function ConfirmReset({ token }: { token: string }) {
  const confirm = usePasswordResetConfirm();
  const [password, setPassword] = useState('');
  const [error, setError] = useState<string | null>(null);
  const submit = (event: FormEvent) => {
    event.preventDefault();
    const parsed = passwordSchema.safeParse(password);
    if (!parsed.success) return setError(`Password ${parsed.error.issues[0]?.message ?? 'is not valid'}`);
    setError(null);
    confirm.mutate({ token, password });
  };
  return (
    <AuthFrame title="Choose a new password" subtitle="Every other session of this account will be signed out.">
      {confirm.isSuccess ? (
        <p role="status" className="text-sm">
          Your password is changed.{' '}
          <Link className="text-pencil underline underline-offset-4" to={paths.signIn}>
            Sign in
          </Link>
        </p>
      ) : (
        <form onSubmit={submit} className="space-y-4" noValidate>
          <TextField label="New password" type="password" autoComplete="new-password" hint="At least 10 characters." value={password} onChange={(e) => setPassword(e.target.value)} error={error ?? confirm.error?.message ?? null} />
          <button type="submit" className="btn btn-primary w-full justify-center" disabled={confirm.isPending}>
            {confirm.isPending ? 'Saving…' : 'Set the new password'}
          </button>
        </form>
      )}
    </AuthFrame>
  );
}
