/**
 * Short hazard notes for the chemicals of hand-coated printing. They summarise the usual
 * warnings (from memory, of the kind safety data sheets give) and never replace the
 * sheet itself, local regulations or licensed practice.
 */
export interface ChemicalCaution {
  chemical: string;
  caution: string;
}

const CAUTIONS: Array<{ match: RegExp; chemical: string; caution: string }> = [
  {
    match: /silver nitrate/i,
    chemical: 'Silver nitrate',
    caution:
      'corrosive; can cause serious eye damage; stains skin; an oxidiser; toxic to aquatic life.',
  },
  {
    match: /thiosulfate|hypo/i,
    chemical: 'Sodium thiosulfate',
    caution:
      'low hazard, but gives off sulfur dioxide with acids; used fixer carries silver and is collected for recovery.',
  },
  {
    match: /gold/i,
    chemical: 'Gold chloride',
    caution: 'corrosive; may cause skin allergy.',
  },
  {
    match: /ferricyanide/i,
    chemical: 'Potassium ferricyanide',
    caution: 'keep from strong acids and heat, which can release hydrogen cyanide.',
  },
  {
    match: /oxalate/i,
    chemical: 'Oxalates',
    caution: 'harmful if swallowed or in contact with skin.',
  },
  {
    match: /platinum|palladium/i,
    chemical: 'Platinum and palladium salts',
    caution: 'may cause skin and breathing allergies; avoid dust and skin contact.',
  },
  {
    match: /ferric ammonium citrate/i,
    chemical: 'Ferric ammonium citrate',
    caution: 'irritating to eyes and skin.',
  },
  {
    match: /sodium chloride/i,
    chemical: 'Sodium chloride',
    caution: 'low hazard; a strong solution irritates the eyes.',
  },
  {
    match: /ammonium chloride/i,
    chemical: 'Ammonium chloride',
    caution: 'harmful if swallowed; causes serious eye irritation.',
  },
  {
    match: /sulfite/i,
    chemical: 'Sodium sulfite',
    caution: 'harmful if swallowed; gives off sulfur dioxide with acids.',
  },
  {
    match: /citric acid/i,
    chemical: 'Citric acid',
    caution: 'causes serious eye irritation.',
  },
  {
    match: /edta/i,
    chemical: 'EDTA',
    caution: 'irritating to eyes; harmful if inhaled as dust.',
  },
];

/** The cautions that apply to the named chemicals, each once, in a stable order. */
export function cautionsFor(
  chemicals: ReadonlyArray<string | null | undefined>,
): ChemicalCaution[] {
  const named = chemicals.filter((name): name is string => Boolean(name));
  return CAUTIONS.filter(({ match }) => named.some((name) => match.test(name))).map(
    ({ chemical, caution }) => ({ chemical, caution }),
  );
}

/** What every recipe or bath calls for, whatever the chemical. */
export const GENERAL_PRECAUTIONS =
  'Wear gloves and eye protection, work with ventilation, keep solutions in labelled amber bottles, and dispose of silver-bearing waste under local rules.';
