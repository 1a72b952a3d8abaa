/** A calm placeholder while data is on its way; announced to screen readers. */
export function LoadingBlock({ label, className = '' }: { label: string; className?: string }) {
  return (
    <div role="status" aria-live="polite" className={`flex items-center gap-3 px-4 py-6 text-sm text-graphite-soft ${className}`}>
      <span className="inline-block h-3 w-3 animate-pulse rounded-full bg-graphite-faint" aria-hidden="true" />
      {label}
    </div>
  );
}
