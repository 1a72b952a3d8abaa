import type { RoomCheck } from '../../shared/room/roomCheck.ts';
import { checkNumber } from '../editor/checkNumbers.ts';
import { lengthsInUserUnits } from '../editor/roomText.ts';
import { useRoomLength } from '../state/useRoomLength.ts';
import { CheckRow } from './CheckRow.tsx';

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
          <CheckRow
            key={check.id}
            data={{ 'data-room-check': check.id, 'data-passed': check.passed }}
            badge={verdict}
            title={check.title}
            message={lengthsInUserUnits(check.message, length)}
            // A passing check's numbers only repeat what passed; they are shown when it does not.
            numbers={check.passed ? [] : Object.entries(check.numbers).map(([key, value]) => {
              const n = checkNumber(key, value, length);
              return { key, label: LABELS[key] ?? n.label, text: n.text };
            })}
            fix={check.fix ? lengthsInUserUnits(check.fix, length) : null}
          />
        );
      })}
    </ul>
  );
}
