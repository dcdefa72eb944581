/** Words of a condition report: the trade's terms for damage, and our own grade scale. */

/** Our own four-step scale, best first; each grade is defined in words for the form and the PDF. */
export const CONDITION_GRADES = ['sound', 'settled', 'vulnerable', 'needs treatment'] as const;
export type ConditionGrade = (typeof CONDITION_GRADES)[number];

export const GRADE_DEFINITIONS: Record<ConditionGrade, string> = {
  sound: 'No damage beyond what the making left. Fit to handle, show and lend.',
  settled: 'Minor wear or old damage that is stable. Handle as usual; no action needed.',
  vulnerable:
    'Damage that handling, light or climate could worsen. Handle on a support; check before any loan.',
  'needs treatment':
    'Active deterioration or damage that puts the image at risk. Treat before display or loan.',
};

/** Terms conservators use for what they see on a photographic print. */
export const OBSERVATION_TERMS = [
  'silvering',
  'foxing',
  'staining',
  'fading',
  'yellowing',
  'abrasion',
  'scratch',
  'tear',
  'loss',
  'crease',
  'cockling',
  'surface dirt',
  'accretion',
  'mould',
  'insect damage',
  'adhesive residue',
  'mount damage',
  'retouching',
] as const;
export type ObservationTerm = (typeof OBSERVATION_TERMS)[number];

export const SEVERITIES = ['slight', 'moderate', 'severe'] as const;
export type Severity = (typeof SEVERITIES)[number];

/** Suggested places on the print; other words are accepted. */
export const LOCATION_SUGGESTIONS = [
  'overall',
  'image, shadows',
  'image, highlights',
  'image, centre',
  'upper edge',
  'lower edge',
  'left edge',
  'right edge',
  'corners',
  'margins',
  'verso',
  'mount',
] as const;

/** The three roles an image plays in a treatment record. */
export const TREATMENT_IMAGE_STAGES = ['before', 'after'] as const;
export type TreatmentImageStage = (typeof TREATMENT_IMAGE_STAGES)[number];
