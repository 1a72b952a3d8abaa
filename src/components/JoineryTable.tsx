import type { JoineryRow, Part } from '../../shared/engine/types.ts';
import { useLength } from '../state/useLength.ts';
import { PartRow } from './PartRow.tsx';

const TYPE_WORDS: Record<string, string> = {
  'stub-tenon': 'Stub tenon in groove',
  'panel-in-groove': 'Panel in groove',
  'notch-around-leg': 'Notch around leg',
  'cleat-screwed': 'Cleat, screwed',
  'bottom-on-cleats': 'Bottom on cleats',
  'batten-screwed': 'Batten, screwed',
  hinge: 'Hinge',
  'edge-glued': 'Edge-glued',
};

/** Every joint: the parts, the cuts on each, the machine set-ups, the fit and whether to glue. */
export function JoineryTable({ rows, parts }: { rows: readonly JoineryRow[]; parts: readonly Part[] }) {
  const length = useLength();
  const names = new Map(parts.map((p) => [p.id, p.name]));
  const name = (id: string) => names.get(id) ?? id;
  return (
    <table className="w-full border-collapse text-[13px]" aria-label="Joinery schedule">
      <thead className="sticky top-0 z-10 bg-sheet text-left text-xs text-graphite-soft shadow-[0_1px_0_var(--color-rule)]">
        <tr>
          <th scope="col" className="px-2 py-1.5 font-medium">Joint</th>
          <th scope="col" className="px-2 py-1.5 font-medium">Parts</th>
          <th scope="col" className="px-2 py-1.5 text-right font-medium">×</th>
          <th scope="col" className="px-2 py-1.5 font-medium">Cuts</th>
          <th scope="col" className="px-2 py-1.5 font-medium">Set-up</th>
          <th scope="col" className="px-2 py-1.5 text-right font-medium">Clearance</th>
          <th scope="col" className="px-2 py-1.5 font-medium">Glue</th>
        </tr>
      </thead>
      <tbody>
        {rows.map((row) => (
          <PartRow key={row.jointId} partId={row.parts[0]} name={name(row.parts[0])}>
            <td className="px-2 py-1 align-top font-medium">{TYPE_WORDS[row.type] ?? row.type}</td>
            <td className="px-2 py-1 align-top">
              {name(row.parts[0])} <span className="text-graphite-faint">→</span> {name(row.parts[1])}
            </td>
            <td className="dim whitespace-nowrap px-2 py-1 text-right align-top">{row.count}</td>
            <td className="px-2 py-1 align-top text-xs">
              {row.features.map((f) => (
                <span key={`${f.partId}:${f.featureId}`} className="block">
                  <span className="text-graphite-soft">{name(f.partId)}:</span> <span className="dim">{f.summary}</span>
                </span>
              ))}
            </td>
            <td className="px-2 py-1 align-top text-xs">
              {row.setUps.map((s, i) => (
                <span key={i} className="block">
                  <span className="text-graphite-soft">{s.tool}</span>{' '}
                  <span className="dim">{s.settings.map((x) => `${x.name} ${length(x.valueMm)}`).join(', ')}</span>
                </span>
              ))}
            </td>
            <td className="dim whitespace-nowrap px-2 py-1 text-right align-top">{row.clearanceMm > 0 ? length(row.clearanceMm) : 'tight'}</td>
            <td className="px-2 py-1 align-top text-xs">
              {row.floating ? <span className="font-semibold text-pencil">float — no glue</span> : row.glued ? 'glue' : 'dry / screws'}
            </td>
          </PartRow>
        ))}
      </tbody>
    </table>
  );
}
