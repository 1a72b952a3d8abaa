import { isApiError } from '../api/fetchJson.ts';

/** What went wrong fetching or saving, in words, with a way to try again when there is one. */
export function ErrorNotice({ title, error, onRetry, className = '' }: { title: string; error: unknown; onRetry?: () => void; className?: string }) {
  const detail = isApiError(error)
    ? error.status === 503 ? 'The database is not reachable right now; try again in a moment.' : error.message
    : error instanceof Error ? error.message : 'Something went wrong.';
  return (
    <div role="alert" className={`rounded-sm border border-pencil/60 bg-pencil-soft/50 px-4 py-3 text-sm ${className}`}>
      <p className="font-semibold text-pencil">{title}</p>
      <p className="mt-1 text-graphite">{detail}</p>
      {onRetry && (
        <button type="button" className="btn mt-2" onClick={onRetry}>
          Try again
        </button>
      )}
    </div>
  );
}
