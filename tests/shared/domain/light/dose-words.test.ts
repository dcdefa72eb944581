import { describe, expect, it } from 'vitest';
import { DOSE_COUNTED_HOW, doseNotCountedNote } from '../../../../shared/domain/light/dose-words';

describe('the words beside a print’s light figure', () => {
  it('a print on display with nothing counted says its time on display is not counted yet', () => {
    expect(doseNotCountedNote('on display', 0)).toMatch(/on display.*not counted yet/);
    expect(doseNotCountedNote('on display', 9300)).toMatch(/not counted/);
  });

  it('a print in storage with nothing counted says no agreed loan is recorded', () => {
    expect(doseNotCountedNote('in storage', 0)).toMatch(/No agreed loan or exhibition/);
    expect(doseNotCountedNote('in storage', 9300)).toBeNull();
  });

  it('says how the figure is counted: the agreed maximum, future days included', () => {
    expect(DOSE_COUNTED_HOW).toMatch(/agreed maximum illuminance × hours open a day/);
    expect(DOSE_COUNTED_HOW).toMatch(/days still to come included/);
  });
});
