/** Thresholds of the tone status rules (ΔE00, density, L*, b*) and the projection horizon. */
export interface ToneThresholds {
  watchDE00: number;
  noticeableDE00: number;
  fadingDensity: number;
  darkeningL: number;
  yellowingB: number;
  projectionYears: number;
  /** Repeatability of a reading in CIELAB units (ΔE00, L*, b*): the hysteresis of a status. */
  repeatabilityLab: number;
  /** Repeatability of a reading in reflection density: the hysteresis of fading. */
  repeatabilityDensity: number;
}

/** Months until the next tone check, by status. */
export interface CheckSchedule {
  steadyMonths: number;
  watchMonths: number;
  changingMonths: number;
}

export interface ToneSettings {
  tone: ToneThresholds;
  schedule: CheckSchedule;
}

export const DEFAULT_TONE_SETTINGS: ToneSettings = {
  tone: {
    watchDE00: 1.0,
    noticeableDE00: 2.0,
    fadingDensity: 0.05,
    darkeningL: 2.0,
    yellowingB: 2.0,
    projectionYears: 5,
    repeatabilityLab: 0.3,
    repeatabilityDensity: 0.01,
  },
  schedule: { steadyMonths: 24, watchMonths: 12, changingMonths: 6 },
};

type SettingKey = `tone.${keyof ToneThresholds}` | `schedule.${keyof CheckSchedule}`;

/** Where each default comes from, shown beside it on the Settings page. */
export const SETTING_SOURCES: Record<SettingKey, { label: string; source: string }> = {
  'tone.watchDE00': {
    label: 'Watch from ΔE00',
    source: 'About one just-noticeable difference (from memory, not a published threshold).',
  },
  'tone.noticeableDE00': {
    label: 'Noticeable change from ΔE00',
    source: 'Light-fading practice stops exposure tests near this difference (from memory).',
  },
  'tone.fadingDensity': {
    label: 'Fading: density loss in Dmax or midtone',
    source: 'Chosen by us.',
  },
  'tone.darkeningL': {
    label: 'Darkening: L* loss in highlight or bare paper',
    source: 'Chosen by us.',
  },
  'tone.yellowingB': {
    label: 'Yellowing: b* gain in highlight or bare paper',
    source: 'Chosen by us.',
  },
  'tone.projectionYears': {
    label: 'Watch when noticeable change is projected within (years)',
    source: 'Chosen by us.',
  },
  'tone.repeatabilityLab': {
    label: 'Repeatability of a reading (ΔE00, L*, b*)',
    source:
      'A hand-held spectrophotometer placed again by hand on a matte hand-coated print repeats to about 0.3 ΔE00 (from memory, not a published figure). A status changes only when the new state is past its threshold by more than this.',
  },
  'tone.repeatabilityDensity': {
    label: 'Repeatability of a density reading (D)',
    source:
      'Reflection densitometers are commonly specified to repeat within ±0.01 D (from memory). Fading starts or ends only when the density change is past its threshold by more than this.',
  },
  'schedule.steadyMonths': { label: 'Next check when steady (months)', source: 'Chosen by us.' },
  'schedule.watchMonths': { label: 'Next check when on watch (months)', source: 'Chosen by us.' },
  'schedule.changingMonths': {
    label: 'Next check when fading, darkening or yellowing (months)',
    source: 'Chosen by us.',
  },
};
