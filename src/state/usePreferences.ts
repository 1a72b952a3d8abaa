/**
 * The maker's reading preferences, kept in this browser: inches or millimetres and how fine.
 * Every length the client shows goes through these.
 */
import { create } from 'zustand';
import { createJSONStorage, persist } from 'zustand/middleware';
import type { LengthUnit } from '../../shared/units/index.ts';
import {
  DEFAULT_DISPLAY_UNITS, INCH_PRECISIONS, MM_PRECISIONS,
  type DisplayUnits, type EditorInchPrecision, type EditorMmPrecision,
} from '../editor/displayUnits.ts';

interface PreferencesState extends DisplayUnits {
  /** The workshop opened last, so the workshop link returns to it. */
  lastWorkshopId: string | null;
  setLastWorkshop: (workshopId: string) => void;
  setUnit: (unit: LengthUnit) => void;
  setInchPrecision: (precision: EditorInchPrecision) => void;
  setMmPrecision: (precision: EditorMmPrecision) => void;
}

export const usePreferences = create<PreferencesState>()(
  persist(
    (set) => ({
      ...DEFAULT_DISPLAY_UNITS,
      lastWorkshopId: null,
      setLastWorkshop: (lastWorkshopId) => set({ lastWorkshopId }),
      setUnit: (unit) => set({ unit }),
      setInchPrecision: (inchPrecision) => set({ inchPrecision }),
      setMmPrecision: (mmPrecision) => set({ mmPrecision }),
    }),
    {
      name: 'casewright.units',
      version: 1,
      storage: createJSONStorage(() => localStorage),
      partialize: ({ unit, inchPrecision, mmPrecision, lastWorkshopId }) => ({ unit, inchPrecision, mmPrecision, lastWorkshopId }),
      // A hand-edited or older stored value must not put an unknown precision on screen.
      merge: (stored, current) => {
        const s = (stored ?? {}) as Partial<DisplayUnits & { lastWorkshopId: string | null }>;
        return {
          ...current,
          lastWorkshopId: typeof s.lastWorkshopId === 'string' ? s.lastWorkshopId : null,
          unit: s.unit === 'mm' || s.unit === 'in' ? s.unit : current.unit,
          inchPrecision: (INCH_PRECISIONS as readonly number[]).includes(s.inchPrecision ?? 0) ? (s.inchPrecision as EditorInchPrecision) : current.inchPrecision,
          mmPrecision: (MM_PRECISIONS as readonly number[]).includes(s.mmPrecision ?? 0) ? (s.mmPrecision as EditorMmPrecision) : current.mmPrecision,
        };
      },
    },
  ),
);

/** The display units alone, for code that formats lengths. */
export function useDisplayUnits(): DisplayUnits {
  const unit = usePreferences((s) => s.unit);
  const inchPrecision = usePreferences((s) => s.inchPrecision);
  const mmPrecision = usePreferences((s) => s.mmPrecision);
  return { unit, inchPrecision, mmPrecision };
}
