import { Link } from 'react-router-dom';
import type { ClientDesignListItem } from '../api/pieceSpec.ts';
import { buildOutcome } from '../editor/pieceBuild.ts';
import { timeAgo } from '../editor/timeAgo.ts';
import { useLength } from '../state/useLength.ts';
import { linkTo } from '../routes/paths.ts';
import { ApprovalBadge } from './ApprovalBadge.tsx';
import { DesignThumbnail } from './DesignThumbnail.tsx';

/** One design in the workshop grid: its drawing, size, last change, approval and origin. */
export function DesignCard({ card }: { card: ClientDesignListItem }) {
  const length = useLength();
  const outcome = buildOutcome(card.headSpec);
  const size = outcome.ok ? outcome.result.bboxMm.map((n) => length(n)).join(' × ') : null;
  return (
    <li className="card group relative flex flex-col overflow-hidden transition-shadow focus-within:shadow-md hover:shadow-md">
      <div className="relative aspect-[4/3] border-b border-rule bg-paper/60 p-3">
        <DesignThumbnail spec={card.headSpec} title={card.title} />
        <span className="absolute left-2 top-2 rounded-sm bg-sheet/90 px-1.5 py-0.5 font-mono text-[10px] uppercase tracking-widest text-graphite-soft">{card.kind}</span>
        {card.archived && <span className="absolute right-2 top-2 rounded-sm bg-graphite px-1.5 py-0.5 text-[10px] uppercase tracking-widest text-sheet">Archived</span>}
      </div>
      <div className="flex flex-1 flex-col gap-1.5 p-3">
        <h3 className="font-semibold leading-snug">
          <Link to={linkTo.design(card.id)} className="after:absolute after:inset-0 hover:text-pencil">
            {card.title}
          </Link>
        </h3>
        <p className="dim text-xs text-graphite-soft" aria-label="Overall width, depth and height">
          {size ?? '—'}
        </p>
        <p className="text-xs text-graphite-soft">
          r{card.head.number} · {timeAgo(card.head.createdAt)}
          {card.head.author ? ` · ${card.head.author.name}` : ''}
        </p>
        {card.origin && (
          <p className="text-xs text-graphite-soft">
            Forked from {card.origin.title ? <span className="italic">{card.origin.title}</span> : 'a design in another workshop'} r{card.origin.revisionNumber}
          </p>
        )}
        <div className="mt-auto flex items-center justify-between pt-1">
          <ApprovalBadge approval={card.approval} />
          {card.forkCount > 0 && <span className="text-[11px] text-graphite-soft">{card.forkCount} fork{card.forkCount === 1 ? '' : 's'}</span>}
        </div>
      </div>
    </li>
  );
}
