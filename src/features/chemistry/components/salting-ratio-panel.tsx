import { useState } from 'react';
import { findChemical } from '@shared/domain/chemistry/chemicals';
import { silverToChlorideRatio } from '@shared/domain/chemistry/salting-ratio';
import { SelectField, TextField } from '@/components/ui/field';
import { ChemicalCaution } from '@/components/ui/notices';

const SALTS = ['sodium chloride', 'ammonium chloride'];

/** Silver-to-chloride molar ratio of a salting solution and a sensitiser, worked as you type. */
export function SaltingRatioPanel() {
  const [salt, setSalt] = useState('sodium chloride');
  const [saltPercent, setSaltPercent] = useState('2');
  const [silverPercent, setSilverPercent] = useState('12');
  const ratio =
    Number(saltPercent) > 0 && Number(silverPercent) > 0
      ? silverToChlorideRatio(
          { chemical: findChemical(salt)!, percent: Number(saltPercent) },
          { chemical: findChemical('silver nitrate')!, percent: Number(silverPercent) },
        )
      : null;
  return (
    <section aria-labelledby="ratio-heading">
      <h2 id="ratio-heading" className="mb-2 text-xl">
        Salting and sensitiser pair
      </h2>
      <div className="grid gap-3 rounded border border-paper-edge bg-white/60 p-3 sm:grid-cols-3">
        <SelectField
          label="Salt"
          options={SALTS.map((name) => ({ value: name, label: name }))}
          value={salt}
          onChange={(e) => setSalt(e.target.value)}
        />
        <TextField
          label="Salt (% w/v)"
          type="number"
          step="any"
          min={0}
          value={saltPercent}
          onChange={(e) => setSaltPercent(e.target.value)}
        />
        <TextField
          label="Silver nitrate (% w/v)"
          type="number"
          step="any"
          min={0}
          value={silverPercent}
          onChange={(e) => setSilverPercent(e.target.value)}
        />
        <p role="status" className="text-sm sm:col-span-3">
          {ratio === null ? (
            'Enter both concentrations above 0.'
          ) : (
            <>
              <strong>{ratio.toFixed(2)} : 1</strong> silver to chloride, for equal volumes of each
              on the paper.{' '}
              {ratio > 1
                ? 'The silver exceeds the chloride, leaving the free silver nitrate a printing-out paper needs (common practice).'
                : 'Not enough silver to turn all the chloride into silver chloride: printing-out papers need an excess of silver (common practice).'}
            </>
          )}
        </p>
        <p className="text-xs text-ink-faint sm:col-span-3">
          From NaCl + AgNO₃ → AgCl + NaNO₃: one silver for each chloride.
        </p>
      </div>
      <div className="mt-3">
        <ChemicalCaution chemicals={[salt, 'silver nitrate']} />
      </div>
    </section>
  );
}
