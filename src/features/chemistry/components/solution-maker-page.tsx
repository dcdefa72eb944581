import { useQuery } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import { findChemical, KNOWN_CHEMICALS } from '@shared/domain/chemistry/chemicals';
import { convertForm, thiosulfateForms } from '@shared/domain/chemistry/solution';
import {
  fromGrams,
  toMillilitres,
  type MassUnit,
  type VolumeUnit,
} from '@shared/domain/chemistry/units';
import { SolutionQuerySchema } from '@shared/schemas/chemistry';
import type { SolutionAnswer } from '@shared/types/chemistry';
import { Button, ButtonLink } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { ErrorNotice } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { useCan } from '@/lib/session';
import { chemistryQueries, type SolutionParams } from '../api/chemistry-queries';
import { SaltingRatioPanel } from './salting-ratio-panel';
import { SaveBatchForm } from './save-batch-form';
import { SensitiserPanel } from './sensitiser-panel';

const CHEMICAL_OPTIONS = KNOWN_CHEMICALS.map((c) => ({
  value: c.name,
  label: `${c.name} (${c.formula})`,
}));
const VOLUME_UNITS = [
  { value: 'ml', label: 'millilitres' },
  { value: 'fl oz', label: 'US fluid ounces' },
];
const MASS_UNITS = [
  { value: 'g', label: 'grams' },
  { value: 'oz', label: 'ounces (avoirdupois)' },
  { value: 'gr', label: 'grains' },
];

/** Grams, molar mass and molarity for a % w/v solution; save it as a batch in one step. */
export function SolutionMakerPage() {
  const [draft, setDraft] = useState({
    chemical: 'silver nitrate',
    percent: '12',
    volume: '100',
    volumeUnit: 'ml' as VolumeUnit,
  });
  const [massUnit, setMassUnit] = useState<MassUnit>('g');
  const [asked, setAsked] = useState<SolutionParams | null>(null);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const answer = useQuery({ ...chemistryQueries.solution(asked!), enabled: asked !== null });
  const can = useCan();
  // Any change to the recipe retires the result worked out for the old one, so it can
  // neither be read as the new answer nor saved as a batch.
  const change = (next: Partial<typeof draft>) => {
    setDraft({ ...draft, ...next });
    setAsked(null);
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const volumeMl =
      draft.volume === '' ? NaN : toMillilitres(Number(draft.volume), draft.volumeUnit);
    const parsed = SolutionQuerySchema.safeParse({
      chemical: draft.chemical,
      percent: draft.percent === '' ? undefined : draft.percent,
      volumeMl: Number.isFinite(volumeMl) ? volumeMl : undefined,
    });
    if (!parsed.success) {
      setErrors(Object.fromEntries(parsed.error.issues.map((i) => [String(i.path[0]), i.message])));
      return;
    }
    setErrors({});
    setAsked(parsed.data);
  };

  return (
    <>
      <PageHeader
        title="Solution maker"
        eyebrow="Chemistry"
        actions={<ButtonLink to={paths.chemistry}>Solution batches</ButtonLink>}
      />
      <div className="grid gap-8 lg:grid-cols-2">
        <section aria-labelledby="make-heading">
          <h2 id="make-heading" className="mb-2 text-xl">
            Make a solution
          </h2>
          <form
            noValidate
            onSubmit={submit}
            className="grid gap-3 rounded border border-paper-edge bg-white/60 p-3 sm:grid-cols-2"
          >
            <SelectField
              label="Chemical"
              className="sm:col-span-2"
              options={CHEMICAL_OPTIONS}
              value={draft.chemical}
              onChange={(e) => change({ chemical: e.target.value })}
              error={errors.chemical}
            />
            <TextField
              label="Concentration (% w/v)"
              type="number"
              step="any"
              inputMode="decimal"
              value={draft.percent}
              onChange={(e) => change({ percent: e.target.value })}
              error={errors.percent}
              hint="grams per 100 ml of finished solution"
            />
            <TextField
              label="Volume to make"
              type="number"
              step="any"
              inputMode="decimal"
              value={draft.volume}
              onChange={(e) => change({ volume: e.target.value })}
              error={errors.volumeMl}
            />
            <SelectField
              label="Volume in"
              options={VOLUME_UNITS}
              value={draft.volumeUnit}
              onChange={(e) => change({ volumeUnit: e.target.value as VolumeUnit })}
            />
            <SelectField
              label="Weights in"
              options={MASS_UNITS}
              value={massUnit}
              onChange={(e) => setMassUnit(e.target.value as MassUnit)}
            />
            <div className="sm:col-span-2">
              <Button type="submit" tone="primary">
                Work it out
              </Button>
            </div>
          </form>
          <ErrorNotice error={answer.error} className="mt-3" />
          {asked && answer.data && (
            <SolutionResult answer={answer.data} asked={asked} massUnit={massUnit} />
          )}
          {asked && answer.data && can('reference:write') && (
            <SaveBatchForm key={JSON.stringify(asked)} answer={answer.data} asked={asked} />
          )}
        </section>
        <div className="flex flex-col gap-8">
          <SaltingRatioPanel />
          <SensitiserPanel />
        </div>
      </div>
    </>
  );
}

/** "Weigh 12.00 g …" in the chosen unit, with the numbers behind it and the cautions. */
function SolutionResult({
  answer,
  asked,
  massUnit,
}: {
  answer: SolutionAnswer;
  asked: SolutionParams;
  massUnit: MassUnit;
}) {
  const weight = (grams: number) =>
    `${fromGrams(grams, massUnit).toFixed(massUnit === 'gr' ? 1 : 2)} ${massUnit}`;
  const other = otherThiosulfateForm(answer);
  return (
    <div
      role="region"
      aria-label="Result"
      className="mt-4 rounded border border-gall/40 bg-white/70 p-3 text-sm"
    >
      <p className="font-serif text-xl">
        Weigh {weight(answer.grams)} of {answer.chemical} ({answer.formula}) and make up to{' '}
        {Math.round(asked.volumeMl * 10) / 10} ml with distilled water.
      </p>
      <dl className="mt-2 grid grid-cols-[9rem_1fr] gap-x-4 gap-y-1">
        <dt className="text-ink-faint">Molar mass</dt>
        <dd>{answer.molarMass.toFixed(2)} g/mol</dd>
        <dt className="text-ink-faint">Molarity</dt>
        <dd>{answer.molarity.toFixed(4)} mol/L</dd>
        {other && (
          <>
            <dt className="text-ink-faint">Or, as {other.form}</dt>
            <dd>{weight(other.grams)} for the same thiosulfate</dd>
          </>
        )}
      </dl>
      <p className="mt-1 text-xs text-ink-faint">Atomic weights: {answer.atomicWeights}.</p>
      {answer.warnings.map((warning) => (
        <div
          key={warning.kind}
          role="alert"
          className="mt-3 rounded border border-alert bg-alert-light px-3 py-2 text-sm text-ink"
        >
          <p>{warning.message}</p>
          <p className="mt-1 text-xs text-ink-soft">Solubility: {warning.source}.</p>
        </div>
      ))}
      <aside
        aria-label="Cautions for this solution"
        className="mt-3 rounded border border-gall/40 bg-gall-light px-3 py-2 text-xs leading-relaxed text-ink-soft"
      >
        <strong className="text-gall-dark">Handle with care.</strong>
        <ul className="mt-1 list-disc pl-4">
          {answer.cautions.map((caution) => (
            <li key={caution}>{caution}</li>
          ))}
        </ul>
      </aside>
    </div>
  );
}

/** Anhydrous ↔ pentahydrate sodium thiosulfate: the same moles in the other form. */
function otherThiosulfateForm(answer: SolutionAnswer): { form: string; grams: number } | null {
  const { anhydrous, pentahydrate } = thiosulfateForms();
  const chemical = findChemical(answer.chemical);
  if (chemical?.name === anhydrous.name) {
    return { form: 'pentahydrate', grams: convertForm(answer.grams, anhydrous, pentahydrate) };
  }
  if (chemical?.name === pentahydrate.name) {
    return { form: 'anhydrous', grams: convertForm(answer.grams, pentahydrate, anhydrous) };
  }
  return null;
}
