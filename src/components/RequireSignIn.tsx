import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { useMe } from '../api/useMe.ts';
import { linkTo } from '../routes/paths.ts';
import { ErrorNotice } from './ErrorNotice.tsx';
import { LoadingBlock } from './LoadingBlock.tsx';

/** The pages behind sign-in: a visitor is sent to sign in and brought back afterwards. */
export function RequireSignIn() {
  const me = useMe();
  const location = useLocation();
  if (me.isPending) return <LoadingBlock label="Checking who you are…" className="mx-auto max-w-7xl" />;
  if (me.isError) return <ErrorNotice title="Could not reach the server" error={me.error} onRetry={() => void me.refetch()} className="mx-auto mt-8 max-w-xl" />;
  if (!me.data) return <Navigate to={linkTo.signIn(location.pathname + location.search)} replace />;
  return <Outlet />;
}
