import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { findChemical } from '@shared/domain/chemistry/chemicals';
import { CHEMISTRY_SETTINGS } from '@shared/domain/chemistry/settings';
import { sensitiserNeededMl } from '@shared/domain/chemistry/sheets';
import { solutionRecipe } from '@shared/domain/chemistry/solution';
import { sheetAreaCm2, type SheetUnit } from '@shared/domain/chemistry/units';
import { SelectField, TextField } from '@/components/ui/field';
import { ChemicalCaution } from '@/components/ui/notices';
import { useCan } from '@/lib/session';
import { settingsQueries } from '@/lib/settings-api';

const SILVER_NITRATE = findChemical('silver nitrate')!;

/** How much sensitiser a number of sheets needs, at the coverage setting. */
export function SensitiserPanel() {
  // The setting in force for those who may read settings; the default for everyone else.
  const allowed = useCan()('settings:read');
  const settings = useQuery({ ...settingsQueries.current(), enabled: allowed });
  const info = CHEMISTRY_SETTINGS.sensitiserMlPer8x10;
  const coverage = allowed
    ? settings.data && {
        value: settings.data.chemistry.sensitiserMlPer8x10,
        unit: info.unit,
        source: info.source,
        isDefault: false,
      }
    : { value: info.defaultValue, unit: info.unit, source: info.source, isDefault: true };
  const [values, setValues] = useState({
    sheets: '10',
    width: '8',
    height: '10',
    unit: 'in' as SheetUnit,
    coats: '1',
    percent: '12',
  });
  const set = (key: keyof typeof values) => (event: { target: { value: string } }) =>
    setValues({ ...values, [key]: event.target.value });
  const numbers = [values.sheets, values.width, values.height, values.coats].map(Number);
  const valid = coverage && numbers.every((n) => Number.isFinite(n) && n > 0);
  const ml = valid
    ? sensitiserNeededMl({
        sheets: numbers[0]!,
        areaCm2: sheetAreaCm2(numbers[1]!, numbers[2]!, values.unit),
        coats: numbers[3]!,
        mlPer8x10: coverage.value,
      })
    : null;
  const percent = Number(values.percent);
  const grams =
    ml !== null && percent > 0 ? solutionRecipe(SILVER_NITRATE, percent, ml).grams : null;
  return (
    <section aria-labelledby="coverage-heading">
      <h2 id="coverage-heading" className="mb-2 text-xl">
        Sensitiser for a batch of sheets
      </h2>
      <div className="grid gap-3 rounded border border-paper-edge bg-white/60 p-3 sm:grid-cols-3">
        <TextField
          label="Sheets"
          type="number"
          min={1}
          value={values.sheets}
          onChange={set('sheets')}
        />
        <TextField
          label="Width"
          type="number"
          step="any"
          value={values.width}
          onChange={set('width')}
        />
        <TextField
          label="Height"
          type="number"
          step="any"
          value={values.height}
          onChange={set('height')}
        />
        <SelectField
          label="Sizes in"
          options={[
            { value: 'in', label: 'inches' },
            { value: 'cm', label: 'centimetres' },
          ]}
          value={values.unit}
          onChange={set('unit')}
        />
        <TextField
          label="Coats"
          type="number"
          min={1}
          value={values.coats}
          onChange={set('coats')}
        />
        <TextField
          label="Silver nitrate (% w/v)"
          type="number"
          step="any"
          value={values.percent}
          onChange={set('percent')}
        />
        <p role="status" className="text-sm sm:col-span-3">
          {ml === null ? (
            'Enter sheets, size and coats above 0.'
          ) : (
            <>
              About <strong>{ml.toFixed(1)} ml</strong> of sensitiser
              {grams !== null && <> ({grams.toFixed(2)} g of silver nitrate)</>}; mix a little more
              for spills and the brush.
            </>
          )}
        </p>
        {coverage && (
          <p className="text-xs text-ink-faint sm:col-span-3">
            At {coverage.value} {coverage.unit} per coat (
            {coverage.isDefault ? 'the default' : 'a setting'}). Default: {coverage.source}
          </p>
        )}
      </div>
      <div className="mt-3">
        <ChemicalCaution chemicals={['silver nitrate']} />
      </div>
    </section>
  );
}
