import { useHealth } from '../api/useHealth.ts';

/** A small status mark: is the server and its database answering? */
export function HealthMark() {
  const health = useHealth();
  const state = health.isPending ? 'checking' : health.data?.database.state === 'up' ? 'up' : 'down';
  const label = state === 'checking' ? 'Checking the server…' : state === 'up' ? 'Server and database up' : 'Server or database unreachable';
  const colour = state === 'up' ? 'bg-ok' : state === 'down' ? 'bg-pencil' : 'bg-graphite-faint';
  return (
    <span className="flex items-center gap-1.5" role="status" aria-live="polite">
      <span className={`inline-block h-2 w-2 rounded-full ${colour}`} aria-hidden="true" />
      {label}
    </span>
  );
}
