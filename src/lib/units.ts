import { useEffect, useState } from 'react';
import type { LengthUnit } from '@shared/domain/units';

const KEY = 'printwarden.lengthUnit';

/** The reader's choice of millimetres or inches, remembered on this device. */
export function useLengthUnit(): [LengthUnit, (unit: LengthUnit) => void] {
  const [unit, setUnit] = useState<LengthUnit>(() =>
    localStorage.getItem(KEY) === 'in' ? 'in' : 'mm',
  );
  useEffect(() => localStorage.setItem(KEY, unit), [unit]);
  return [unit, setUnit];
}
