import type { RoomCheck } from '../../shared/room/roomCheck.ts';
import { checkNumber } from '../editor/checkNumbers.ts';
import { lengthsInUserUnits } from '../editor/roomText.ts';
import { useRoomLength } from '../state/useRoomLength.ts';

const VERDICT = {
  fails: { label: 'Fails', cls: 'bg-pencil text-sheet', order: 0 },
  warning: { label: 'Short', cls: 'bg-caution text-sheet', order: 1 },
  input: { label: 'Needs input', cls: 'bg-caution-soft text-caution border border-caution/50', order: 2 },
  passes: { label: 'Passes', cls: 'bg-ok-soft text-ok', order: 3 },
} as const;

/** Plain words for the numbers room fit reports whose engine names say little to a maker. */
const LABELS: Readonly<Record<string, string>> = {
  hingeYMm: 'hinge line from the front',
  hingeZMm: 'hinge line height',
  openAngleDeg: 'opens to',
  contactDeg: 'meets it at',
  pullOutMm: 'stand it out by',
  swingRadiusMm: 'lid swing radius',
  openReachMm: 'reach when open',
  standoffMm: 'off the wall',
  topMm: 'top of the piece',
  smallestFaceMm: 'smallest face',
  smallestFaceOtherMm: 'its other side',
  standUpDiagonalMm: 'diagonal to stand it up',
};

function verdictOf(check: RoomCheck): keyof typeof VERDICT {
  if (check.passed) return 'passes';
  if (check.needsInput) return 'input';
  return check.severity === 'error' ? 'fails' : 'warning';
}

/** Every room-fit check, failures first: the verdict, what was found, the numbers in the maker's unit, and the fix. */
export function RoomChecksList({ checks }: { checks: readonly RoomCheck[] }) {
  const length = useRoomLength();
  const sorted = [...checks].sort((a, b) => VERDICT[verdictOf(a)].order - VERDICT[verdictOf(b)].order);
  return (
    <ul className="divide-y divide-rule/70" aria-label="Room-fit checks">
      {sorted.map((check) => {
        const verdict = VERDICT[verdictOf(check)];
        return (
          <li key={check.id} data-room-check={check.id} data-passed={check.passed} className="grid grid-cols-[5.5rem_1fr] gap-3 px-3 py-2">
            <span className={`h-fit rounded-sm px-1.5 py-0.5 text-center text-[11px] font-semibold uppercase tracking-wider ${verdict.cls}`}>{verdict.label}</span>
            <div className="min-w-0 text-[13px]">
              <p className="font-semibold">{check.title}</p>
              <p className="text-graphite">{lengthsInUserUnits(check.message, length)}</p>
              {!check.passed && Object.keys(check.numbers).length > 0 && (
                <dl className="mt-1 flex flex-wrap gap-x-4 gap-y-0.5 text-xs">
                  {Object.entries(check.numbers).map(([key, value]) => {
                    const n = checkNumber(key, value, length);
                    return (
                      <div key={key} className="flex gap-1">
                        <dt className="text-graphite-soft">{LABELS[key] ?? n.label}</dt>
                        <dd className="dim">{n.text}</dd>
                      </div>
                    );
                  })}
                </dl>
              )}
              {check.fix && (
                <p className="mt-1 text-xs">
                  <span className="font-semibold text-ok">Fix: </span>
                  {lengthsInUserUnits(check.fix, length)}
                </p>
              )}
            </div>
          </li>
        );
      })}
    </ul>
  );
}
