/** The environment area's settings, with where each default comes from. */
export interface EnvironmentSettings {
  /** Hours a place may stay outside its band before an alert opens. */
  excursionHours: number;
  /** Life assumed at 20 °C / 50 % RH, the yardstick of "expected life" (years). */
  lifeAtReferenceYears: number;
}

export const DEFAULT_ENVIRONMENT_SETTINGS: EnvironmentSettings = {
  excursionHours: 48,
  lifeAtReferenceYears: 100,
};

export const ENVIRONMENT_SETTING_SOURCES: Record<
  keyof EnvironmentSettings,
  { label: string; source: string; unit: string; min: number; max: number }
> = {
  excursionHours: {
    label: 'Hours outside the band before an alert',
    source:
      'Our choice: two days, so a door left open for an afternoon does not alert but a failing dehumidifier does.',
    unit: 'h',
    min: 1,
    max: 720,
  },
  lifeAtReferenceYears: {
    label: 'Life at 20 °C and 50 % RH (the yardstick of expected life)',
    source:
      'An assumption, not a measurement: expected life is shown relative to it. The isoperm approach (Sebera 1994) gives only ratios.',
    unit: 'years',
    min: 1,
    max: 10000,
  },
};
