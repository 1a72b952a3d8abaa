import { useCallback } from 'react';
import { formatFeetInches, formatLength } from '../../shared/units/index.ts';
import { lengthFormat } from '../editor/displayUnits.ts';
import { usePreferences } from './usePreferences.ts';

/**
 * A function writing a room-scale length in mm (walls, niche, clearances) for the room pages:
 * feet and inches (`12' 6-1/2"`) when the maker reads inches, their millimetres otherwise.
 * Under a foot it reads as the rest of the editor does (`1 3/4"`).
 */
export function useRoomLength(): (valueMm: number) => string {
  const unit = usePreferences((s) => s.unit);
  const inchPrecision = usePreferences((s) => s.inchPrecision);
  const mmPrecision = usePreferences((s) => s.mmPrecision);
  return useCallback(
    (valueMm: number) => (unit === 'in' ? formatFeetInches(valueMm, inchPrecision) : formatLength(valueMm, lengthFormat({ unit, inchPrecision, mmPrecision }))),
    [unit, inchPrecision, mmPrecision],
  );
}
