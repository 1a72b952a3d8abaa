/**
 * A hand-drafted front elevation of a frame-and-panel chest with its overall dimensions,
 * used on the home page. Plain SVG: it prints and needs no 3D.
 */
export function ChestSketch() {
  return (
    <svg viewBox="0 0 420 300" className="h-auto w-full" role="img" aria-label="Front view of a frame-and-panel chest with corner legs, 40 inches wide and 23 inches high">
      <g fill="none" stroke="var(--color-graphite)" strokeWidth="1.6" strokeLinejoin="round">
        {/* lid */}
        <rect x="52" y="58" width="316" height="16" />
        {/* legs */}
        <rect x="60" y="74" width="26" height="176" />
        <rect x="334" y="74" width="26" height="176" />
        {/* rails and centre stile */}
        <rect x="86" y="74" width="248" height="22" />
        <rect x="86" y="196" width="248" height="22" />
        <rect x="202" y="96" width="16" height="100" />
        {/* panels */}
        <rect x="92" y="100" width="104" height="92" strokeWidth="1" />
        <rect x="224" y="100" width="104" height="92" strokeWidth="1" />
      </g>
      {/* hidden tongue-and-groove lines */}
      <g stroke="var(--color-graphite-soft)" strokeWidth="0.9" strokeDasharray="4 3" fill="none">
        <path d="M80 78v136M340 78v136M86 90h248M86 202h248" />
      </g>
      {/* dimension lines */}
      <g stroke="var(--color-pencil)" strokeWidth="0.9" fill="var(--color-pencil)">
        <path d="M60 268h300M60 262v12M360 262v12" />
        <path d="M392 58v192M386 58h12M386 250h12" />
        <path d="M60 268l8 -3v6zM360 268l-8 -3v6z" />
        <path d="M392 58l-3 8h6zM392 250l-3 -8h6z" />
      </g>
      <g fontFamily="var(--font-mono)" fontSize="12" fill="var(--color-pencil)">
        <text x="210" y="288" textAnchor="middle">40"</text>
        <text x="404" y="158" textAnchor="middle" transform="rotate(90 404 158)">23"</text>
      </g>
      <g fontFamily="var(--font-mono)" fontSize="9" fill="var(--color-graphite-soft)">
        <text x="20" y="66">LID</text>
        <text x="16" y="140">LEG</text>
        <text x="140" y="150" textAnchor="middle">PANEL</text>
        <text x="210" y="88" textAnchor="middle">TOP RAIL</text>
      </g>
      <path d="M40 250h340" stroke="var(--color-graphite)" strokeWidth="0.8" />
    </svg>
  );
}
