import { Link, useNavigate } from 'react-router-dom';
import { useMe } from '../api/useMe.ts';
import { useSignOut } from '../api/useSignOut.ts';
import { paths } from '../routes/paths.ts';

/** Who is signed in, and the way out; or the way in. */
export function UserMenu() {
  const me = useMe();
  const signOut = useSignOut();
  const navigate = useNavigate();
  if (me.isPending) return null;
  if (!me.data) {
    return (
      <Link to={paths.signIn} className="btn">
        Sign in
      </Link>
    );
  }
  return (
    <div className="flex items-center gap-3 text-sm">
      <span className="hidden text-graphite-soft md:inline" title={me.data.user.email}>
        {me.data.user.name}
      </span>
      <button
        type="button"
        className="btn"
        disabled={signOut.isPending}
        onClick={() => signOut.mutate(undefined, { onSuccess: () => navigate(paths.home) })}
      >
        Sign out
      </button>
    </div>
  );
}
