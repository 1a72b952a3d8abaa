import { useCallback } from 'react';
import { formatLength } from '../../shared/units/index.ts';
import { lengthFormat } from '../editor/displayUnits.ts';
import { usePreferences } from './usePreferences.ts';

/** A function writing a length in mm in the maker's chosen unit and precision. */
export function useLength(): (valueMm: number) => string {
  const unit = usePreferences((s) => s.unit);
  const inchPrecision = usePreferences((s) => s.inchPrecision);
  const mmPrecision = usePreferences((s) => s.mmPrecision);
  return useCallback((valueMm: number) => formatLength(valueMm, lengthFormat({ unit, inchPrecision, mmPrecision })), [unit, inchPrecision, mmPrecision]);
}
