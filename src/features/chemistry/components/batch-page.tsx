import { useQuery } from '@tanstack/react-query';
import { Link, useParams } from 'react-router-dom';
import { STAGE_LABELS } from '@shared/domain/vocabulary';
import type { SolutionBatchDetail } from '@shared/types/chemistry';
import { RiskMark, ToneBadge } from '@/components/ui/badges';
import { ButtonLink } from '@/components/ui/button';
import { ChemicalCaution, ErrorNotice, Loading } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { useCan } from '@/lib/session';
import { chemistryQueries } from '../api/chemistry-queries';

/** One solution batch: what it is, how far a fixer bath has been used, and its prints. */
export function BatchPage() {
  const id = Number(useParams().id);
  const batch = useQuery(chemistryQueries.batch(id));
  if (batch.isPending) return <Loading label="Loading the batch…" />;
  if (batch.error) return <ErrorNotice error={batch.error} />;
  const record = batch.data;
  return (
    <article>
      <PageHeader
        eyebrow="Solution batch"
        title={<span className="font-mono">{record.code}</span>}
        actions={<ButtonLink to={paths.chemistry}>All batches</ButtonLink>}
      />
      <div className="grid gap-8 lg:grid-cols-[minmax(0,1fr)_minmax(0,1.6fr)]">
        <section aria-labelledby="batch-details">
          <h2 id="batch-details" className="mb-2 text-xl">
            Batch
          </h2>
          <BatchDetails batch={record} />
          {record.fixerUse && <FixerUse use={record.fixerUse} />}
          <div className="mt-5">
            <ChemicalCaution chemicals={[record.chemical]} />
          </div>
        </section>
        <section aria-labelledby="batch-prints">
          <h2 id="batch-prints" className="mb-2 text-xl">
            Prints made with this batch ({record.prints.length})
          </h2>
          <BatchPrints batch={record} />
        </section>
      </div>
    </article>
  );
}

function BatchDetails({ batch }: { batch: SolutionBatchDetail }) {
  const rows: Array<[string, string]> = [
    ['Kind', batch.kind],
    ['Chemical', batch.chemical],
    [
      'Concentration',
      batch.concentrationPercent != null ? `${batch.concentrationPercent} % w/v` : '—',
    ],
    ['Volume', batch.volumeMl != null ? `${batch.volumeMl} ml` : '—'],
    ['Made on', batch.madeOn ?? '—'],
    ['Made by', batch.madeBy ?? '—'],
    ['Exhausted on', batch.exhaustedOn ?? 'not marked'],
    ['Notes', batch.notes ?? '—'],
  ];
  return (
    <dl className="grid grid-cols-[8rem_1fr] gap-x-4 gap-y-1.5 text-sm">
      {rows.map(([label, value]) => (
        <div key={label} className="contents">
          <dt className="text-ink-faint">{label}</dt>
          <dd>{value}</dd>
        </div>
      ))}
    </dl>
  );
}

/** Sheets through the bath against its capacity, as words and a plain bar. */
function FixerUse({ use }: { use: NonNullable<SolutionBatchDetail['fixerUse']> }) {
  const can = useCan();
  const sheets = Math.round(use.sheets * 10) / 10;
  const over = use.capacitySheets != null && use.sheets > use.capacitySheets;
  return (
    <div className="mt-4 rounded border border-paper-edge bg-white/60 p-3 text-sm">
      <p>
        <strong>Fixer use:</strong> about {sheets} sheets (8×10 in equivalents)
        {use.capacitySheets != null ? (
          <>
            {' '}
            of a capacity of {Math.round(use.capacitySheets * 10) / 10}
            {over && <span className="font-medium text-alert"> — over capacity</span>}
          </>
        ) : (
          '; record the volume to know its capacity'
        )}
        .
      </p>
      {use.capacitySheets != null && (
        <progress
          className="mt-2 h-2 w-full accent-gall"
          max={use.capacitySheets}
          value={Math.min(use.sheets, use.capacitySheets)}
          aria-label="Fixer use against capacity"
        />
      )}
      <p className="mt-1 text-xs text-ink-faint">
        Capacity is the batch&rsquo;s volume in litres × {use.sheetsPerLitre}{' '}
        {use.sheetsPerLitre === 1 ? 'sheet' : 'sheets'} per litre, a chemistry setting
        {can('settings:read') ? (
          <>
            {' '}
            (<Link to={paths.settings}>Settings</Link>)
          </>
        ) : (
          ' an admin changes'
        )}
        .
      </p>
    </div>
  );
}

function BatchPrints({ batch }: { batch: SolutionBatchDetail }) {
  if (batch.prints.length === 0) {
    return <p className="text-sm text-ink-faint">No print names this batch yet.</p>;
  }
  return (
    <div className="relative overflow-x-auto rounded border border-paper-edge bg-white/60">
      <table className="w-full border-collapse text-sm">
        <thead className="bg-paper-deep text-left text-xs tracking-wide text-ink-soft uppercase">
          <tr>
            <th scope="col" className="px-3 py-2">
              Accession
            </th>
            <th scope="col" className="px-3 py-2">
              Title
            </th>
            <th scope="col" className="px-3 py-2">
              Made
            </th>
            <th scope="col" className="px-3 py-2">
              Used for
            </th>
            <th scope="col" className="px-3 py-2">
              Tone
            </th>
          </tr>
        </thead>
        <tbody>
          {batch.prints.map((print) => (
            <tr key={print.id} className="border-t border-paper-edge/70">
              <td className="px-3 py-1.5 font-mono text-xs whitespace-nowrap">
                {print.accessionNumber}
              </td>
              <td className="px-3 py-1.5">
                <Link to={paths.print(print.id)}>{print.title}</Link>{' '}
                <RiskMark risky={print.processingRisk} />
              </td>
              <td className="px-3 py-1.5 whitespace-nowrap">{print.madeOn ?? '—'}</td>
              <td className="px-3 py-1.5">
                {print.stages.map((stage) => STAGE_LABELS[stage]).join(', ')}
              </td>
              <td className="px-3 py-1.5">
                <ToneBadge status={print.toneStatus} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
