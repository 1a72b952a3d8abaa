import { Link } from 'react-router-dom';
import { paths } from './paths.ts';

/** Any path the router does not know. */
export function NotFoundPage() {
  return (
    <div className="mx-auto max-w-xl px-4 py-20 text-center">
      <p className="font-mono text-sm text-pencil">404</p>
      <h1 className="mt-2 text-2xl font-semibold">No drawing at this address</h1>
      <p className="mt-3 text-graphite-soft">The page may have moved, or the link was mistyped.</p>
      <Link to={paths.home} className="btn mt-6">Back to the start</Link>
    </div>
  );
}
