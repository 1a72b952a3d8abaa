/** The Casewright mark: a lidded case drawn in two strokes, and the name. */
export function Wordmark() {
  return (
    <span className="flex items-center gap-2">
      <svg width="28" height="28" viewBox="0 0 32 32" aria-hidden="true">
        <path d="M6 12h20v14H6z" fill="none" stroke="currentColor" strokeWidth="2" />
        <path d="M5 9h22v3H5z" fill="var(--color-pencil)" />
        <path d="M16 14v10M8 18h16" stroke="currentColor" strokeWidth="1.2" />
      </svg>
      <span className="text-lg font-semibold tracking-tight">Casewright</span>
    </span>
  );
}
