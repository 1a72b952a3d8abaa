import type { ApprovalState } from '../../shared/schemas/designs.ts';

const LOOK: Record<ApprovalState['state'], { text: string; cls: string }> = {
  approved: { text: 'Approved', cls: 'border-ok text-ok bg-ok-soft' },
  'approved-earlier': { text: 'Earlier revision approved', cls: 'border-ok/60 text-ok' },
  'changes-requested': { text: 'Changes requested', cls: 'border-caution text-caution bg-caution-soft' },
  pending: { text: 'Awaiting review', cls: 'border-rule text-graphite-soft' },
};

/** Where a design stands with its reviewers, as a small stamp. */
export function ApprovalBadge({ approval }: { approval: ApprovalState }) {
  const look = LOOK[approval.state];
  const revision = approval.state === 'approved-earlier' && approval.approvedRevision ? ` (r${approval.approvedRevision})` : '';
  return <span className={`inline-block rounded-sm border px-1.5 py-0.5 text-[11px] font-medium ${look.cls}`}>{look.text}{revision}</span>;
}
