import { useState, type FormEvent } from 'react';
import { Link, Navigate, useNavigate, useSearchParams } from 'react-router-dom';
import { useMe } from '../api/useMe.ts';
import { useSignIn } from '../api/useSignIn.ts';
import { isApiError } from '../api/fetchJson.ts';
import { TextField } from '../components/TextField.tsx';
import { AuthFrame } from '../components/AuthFrame.tsx';
import { paths, safeNext } from './paths.ts';

/** Sign in with e-mail and password, then go where the visitor was heading. */
export function SignInPage() {
  const [params] = useSearchParams();
  const next = safeNext(params.get('next'));
  const me = useMe();
  const signIn = useSignIn();
  const navigate = useNavigate();
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');

  if (me.data) return <Navigate to={next} replace />;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    signIn.mutate({ email: email.trim(), password }, { onSuccess: () => navigate(next, { replace: true }) });
  };
  const error = signIn.error
    ? isApiError(signIn.error, 401) ? 'That e-mail and password do not match an account.'
      : isApiError(signIn.error, 429) ? 'Too many attempts; wait a few minutes and try again.'
      : signIn.error.message
    : null;

  return (
    <AuthFrame title="Sign in to your workshop" subtitle="Your designs, revisions and the people you build with.">
      <form onSubmit={submit} className="space-y-4" noValidate>
        <TextField label="E-mail" type="email" autoComplete="email" required value={email} onChange={(e) => setEmail(e.target.value)} />
        <TextField label="Password" type="password" autoComplete="current-password" required value={password} onChange={(e) => setPassword(e.target.value)} />
        {error && (
          <p role="alert" className="text-sm text-pencil">
            {error}
          </p>
        )}
        <button type="submit" className="btn btn-primary w-full justify-center" disabled={signIn.isPending}>
          {signIn.isPending ? 'Signing in…' : 'Sign in'}
        </button>
      </form>
      <div className="mt-6 flex justify-between border-t border-rule pt-4 text-sm">
        <Link className="text-graphite underline-offset-4 hover:text-pencil hover:underline" to={paths.register}>
          Create an account
        </Link>
        <Link className="text-graphite underline-offset-4 hover:text-pencil hover:underline" to={paths.resetPassword}>
          Forgot the password?
        </Link>
      </div>
    </AuthFrame>
  );
}
