import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { BATCH_KINDS } from '@shared/domain/vocabulary';
import { SolutionBatchSchema } from '@shared/schemas/reference';
import type { SolutionBatchView } from '@shared/types/catalogue';
import { ReferenceManager } from '@/components/layout/reference-manager';
import { ButtonLink } from '@/components/ui/button';
import { ChemicalCaution } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { referenceQueries } from '@/lib/reference-api';
import { useCan } from '@/lib/session';
import { ChemistrySettingsPanel } from './chemistry-settings-panel';

/** The Chemistry area: the darkroom's solution batches, the solution maker and settings. */
export function ChemistryPage() {
  const batches = useQuery(referenceQueries.batches());
  const can = useCan();
  return (
    <>
      <PageHeader
        title="Chemistry"
        eyebrow="Darkroom"
        actions={
          <ButtonLink to={paths.solutionMaker} tone="primary">
            Solution maker
          </ButtonLink>
        }
      />
      <section aria-labelledby="batches-heading" className="mb-8">
        <h2 id="batches-heading" className="mb-1 text-xl">
          Solution batches
        </h2>
        <p className="mb-3 max-w-prose text-sm text-ink-soft">
          Each mixed bottle or bath. Open a batch to see the prints made with it; a fixer marked
          exhausted flags the prints made after that day.
        </p>
        <ReferenceManager<SolutionBatchView>
          path="/solution-batches"
          noun="batch"
          list={batches}
          canEdit={can('reference:write')}
          schema={SolutionBatchSchema}
          toForm={(batch) => batch}
          columns={[
            {
              label: 'Code',
              render: (b) => (
                <Link to={paths.batch(b.id)} className="font-mono text-xs whitespace-nowrap">
                  {b.code}
                </Link>
              ),
            },
            { label: 'Kind', render: (b) => b.kind },
            { label: 'Chemical', render: (b) => b.chemical },
            {
              label: '% w/v',
              render: (b) => (b.concentrationPercent != null ? b.concentrationPercent : '—'),
            },
            { label: 'Volume', render: (b) => (b.volumeMl != null ? `${b.volumeMl} ml` : '—') },
            {
              label: 'Made',
              render: (b) => <span className="whitespace-nowrap">{b.madeOn ?? '—'}</span>,
            },
            {
              label: 'Exhausted',
              render: (b) =>
                b.exhaustedOn ? (
                  <span className="whitespace-nowrap text-alert">{b.exhaustedOn}</span>
                ) : (
                  '—'
                ),
            },
          ]}
          fields={[
            { name: 'code', label: 'Code' },
            {
              name: 'kind',
              label: 'Kind',
              kind: 'select',
              options: BATCH_KINDS.map((k) => ({ value: k, label: k })),
            },
            { name: 'chemical', label: 'Chemical' },
            { name: 'concentrationPercent', label: 'Concentration (% w/v)', kind: 'number' },
            { name: 'volumeMl', label: 'Volume (ml)', kind: 'number' },
            { name: 'madeOn', label: 'Made on', kind: 'date' },
            { name: 'madeBy', label: 'Made by' },
            { name: 'exhaustedOn', label: 'Exhausted on', kind: 'date' },
            { name: 'notes', label: 'Notes' },
          ]}
        />
      </section>
      <ChemistrySettingsPanel />
      <div className="mt-6">
        <ChemicalCaution chemicals={batches.data?.map((batch) => batch.chemical) ?? []} />
      </div>
    </>
  );
}
