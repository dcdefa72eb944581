import type { ToneCheckView } from '../../shared/types/tone';
import type { ToneCheck } from '../models';

/** A tone check as it leaves the server. */
export function presentToneCheck(check: ToneCheck): ToneCheckView {
  return {
    id: check.id,
    printId: check.printId,
    checkedOn: check.checkedOn,
    checkedBy: check.checker ? { id: check.checker.id, name: check.checker.name } : null,
    method: check.method,
    instrument: check.instrument,
    illuminant: check.illuminant,
    observer: check.observer,
    baseline: check.baseline,
    notes: check.notes,
    readings: check.readings,
  };
}
