import { useMemo } from 'react';
import type { ParamDef } from '../../shared/engine/paramDef.ts';
import type { PieceSpec } from '../../shared/engine/types.ts';
import { groupParams } from '../editor/fieldGroups.ts';
import { shownFields } from '../editor/shownFields.ts';
import { useDisplayUnits } from '../state/usePreferences.ts';
import { useEditorStore } from '../state/useEditorStore.ts';
import { ParamField } from './ParamField.tsx';

/**
 * The piece's parameters, grouped as the engine lists them; every field drawn from metadata.
 * A field whose `shownWhen` does not hold is left out (its value stays in the spec), and a
 * group left with no field goes with it.
 */
export function ParamForm({ defs, spec, readOnly, engineError }: { defs: readonly ParamDef[]; spec: PieceSpec; readOnly: boolean; engineError: { field: string; message: string } | null }) {
  const units = useDisplayUnits();
  const setParam = useEditorStore((s) => s.setParam);
  const sealStep = useEditorStore((s) => s.sealStep);
  const shown = useMemo(() => shownFields(defs, spec.params, engineError?.field ?? null), [defs, spec.params, engineError?.field]);
  return (
    <form aria-label="Parameters" onSubmit={(e) => e.preventDefault()} className="divide-y divide-rule">
      {groupParams(shown).map((group) => (
        <details key={group.id} open className="group py-1">
          <summary className="flex cursor-pointer select-none items-center justify-between py-1.5 text-xs font-semibold uppercase tracking-[0.14em] text-graphite-soft hover:text-pencil">
            <span id={group.id}>{group.title}</span>
            <span aria-hidden="true" className="font-mono text-[10px] transition-transform group-open:rotate-90">▸</span>
          </summary>
          <div className="pb-2">
            {group.defs.map((def) => (
              <ParamField
                key={def.key}
                def={def}
                value={(spec.params[def.key] as never) ?? def.default}
                units={units}
                readOnly={readOnly}
                engineError={engineError?.field === def.key ? engineError.message : null}
                onChange={(value, typing) => setParam(def.key, value, typing)}
                onDone={sealStep}
              />
            ))}
          </div>
        </details>
      ))}
    </form>
  );
}
