import { useQuery } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { formatSize, type LengthUnit } from '@shared/domain/units';
import type { PrintView } from '@shared/types/catalogue';
import { RiskMark, ToneBadge } from '@/components/ui/badges';
import { Button, ButtonLink } from '@/components/ui/button';
import { ChemicalCaution, ErrorNotice, Loading } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { useCan } from '@/lib/session';
import { useLengthUnit } from '@/lib/units';
import { useDeletePrint } from '../api/delete-print';
import { printQueries } from '@/lib/catalogue';
import { PrintImages } from './images/print-images';
import { PrintHistory } from './print-history';
import { ProcessingHistory } from './processing-history';
import { RegistrarRecord } from './registrar-record';
import { useDeferredData } from '@/lib/use-deferred-data';
import { useAfterFirstDraw } from '@/lib/use-after-first-draw';

/** `sections` lets the app add other areas' parts of the record (e.g. the tone panel). */
export function PrintRecordPage({ sections }: { sections?: (print: PrintView) => ReactNode }) {
  const id = Number(useParams().id);
  // While an image is still being prepared, the record refreshes itself.
  const print = useQuery({
    ...printQueries.detail(id),
    refetchInterval: (query) =>
      query.state.data?.assets.some((asset) => asset.status === 'processing') ? 1500 : false,
  });
  const [unit, setUnit] = useLengthUnit();
  const can = useCan();
  // The record and its sections draw in a background render split into short slices.
  const record = useDeferredData(print.data);
  // The panels under the record (tone, light, places, condition, formats) draw after it.
  const sectionsShown = useAfterFirstDraw(record !== undefined);
  if (print.error) return <ErrorNotice error={print.error} />;
  if (!record) return <Loading label="Loading the print…" />;

  return (
    <article>
      <PageHeader
        accession={record.accessionNumber}
        title={record.title}
        actions={<RecordActions print={record} />}
      />
      <PrintImages print={record} />
      <div className="grid gap-8 lg:grid-cols-[minmax(0,1fr)_minmax(0,1.1fr)]">
        <section aria-labelledby="record-details">
          <h2 id="record-details" className="mb-2 text-xl">
            Record
          </h2>
          <Details print={record} unit={unit} />
          <UnitToggle unit={unit} onChange={setUnit} />
          {record.tags.length > 0 && (
            <ul aria-label="Tags" className="mt-4 flex flex-wrap gap-1.5">
              {record.tags.map((tag) => (
                <li key={tag} className="rounded-full bg-paper-deep px-2 py-0.5 text-xs">
                  {tag}
                </li>
              ))}
            </ul>
          )}
          {record.description && (
            <p className="mt-4 max-w-prose font-serif text-lg leading-relaxed">
              {record.description}
            </p>
          )}
          {can('audit:read') && (
            <section aria-labelledby="record-history" className="mt-6">
              <h2 id="record-history" className="mb-2 text-xl">
                History of this record
              </h2>
              <PrintHistory printId={record.id} />
            </section>
          )}
        </section>
        <section aria-labelledby="record-processing">
          <h2 id="record-processing" className="mb-3 text-xl">
            Processing history
          </h2>
          <RiskReasons print={record} />
          <ProcessingHistory steps={record.processing} />
          {record.processing.some((step) => step.chemical) && (
            <div className="mt-5">
              <ChemicalCaution chemicals={record.processing.map((step) => step.chemical)} />
            </div>
          )}
        </section>
      </div>
      <RegistrarRecord print={record} />
      {sectionsShown && sections?.(record)}
    </article>
  );
}

function Details({ print, unit }: { print: PrintView; unit: LengthUnit }) {
  const rows: Array<[string, React.ReactNode]> = [
    ['Maker', print.maker ?? '—'],
    ['Made', print.madeOn ?? '—'],
    ['Process', print.process],
    ['Paper', print.paper?.name ?? '—'],
    [
      'Negative',
      print.negative ? (
        <Link key="negative" to={paths.negative(print.negative.id)}>
          {`${print.negative.code} (${print.negative.kind}${print.negative.format ? `, ${print.negative.format}` : ''})`}
        </Link>
      ) : (
        '—'
      ),
    ],
    ['Image', formatSize(print.imageWidthMm, print.imageHeightMm, unit) ?? '—'],
    ['Sheet', formatSize(print.sheetWidthMm, print.sheetHeightMm, unit) ?? '—'],
    ['Edition', print.edition ?? '—'],
    ['Status', print.status],
    ['Tone', <ToneBadge key="tone" status={print.tone.status} />],
  ];
  if (print.location !== undefined) rows.push(['Place', print.location?.path ?? '—']);
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

function UnitToggle({
  unit,
  onChange,
}: {
  unit: LengthUnit;
  onChange: (unit: LengthUnit) => void;
}) {
  return (
    <fieldset className="mt-3 flex items-center gap-3 text-sm">
      <legend className="sr-only">Show sizes in</legend>
      <span className="text-ink-faint" aria-hidden="true">
        Sizes in
      </span>
      {(['mm', 'in'] as const).map((choice) => (
        <label key={choice} className="flex items-center gap-1">
          <input
            type="radio"
            name="length-unit"
            checked={unit === choice}
            onChange={() => onChange(choice)}
          />
          {choice === 'mm' ? 'millimetres' : 'inches'}
        </label>
      ))}
    </fieldset>
  );
}

function RiskReasons({ print }: { print: PrintView }) {
  if (print.riskReasons.length === 0) return null;
  return (
    <div className="mb-4 rounded border border-alert/50 bg-alert-light/60 px-3 py-2 text-sm">
      <p className="mb-1 font-medium">
        <RiskMark risky={print.processingRisk} />{' '}
        {print.processingRisk
          ? 'This processing may shorten the print’s life:'
          : 'A note on this processing:'}
      </p>
      <ul className="list-disc pl-5">
        {print.riskReasons.map((reason) => (
          <li key={`${reason.code}-${reason.message}`}>
            {reason.message}
            {reason.basis && (
              <span className="block text-xs text-ink-faint">Basis: {reason.basis}</span>
            )}
          </li>
        ))}
      </ul>
      <p className="mt-1 text-xs text-ink-faint">Rules of thumb of the trade, not measurements.</p>
    </div>
  );
}

function RecordActions({ print }: { print: PrintView }) {
  const navigate = useNavigate();
  const remove = useDeletePrint(print.id);
  const [confirming, setConfirming] = useState(false);
  return (
    <>
      {(print.can.edit || print.can.editCuratorial) && (
        <ButtonLink to={paths.editPrint(print.id)} tone="primary">
          {print.can.edit ? 'Edit record' : 'Edit title, description, tags'}
        </ButtonLink>
      )}
      {print.can.delete && !confirming && (
        <Button tone="danger" onClick={() => setConfirming(true)}>
          Delete…
        </Button>
      )}
      {confirming && (
        <span
          role="group"
          aria-label="Confirm deletion"
          className="flex items-center gap-2 text-sm"
        >
          Move to deleted prints? It can be restored.
          <Button
            tone="danger"
            disabled={remove.isPending}
            onClick={() => remove.mutate(undefined, { onSuccess: () => navigate(paths.prints) })}
          >
            Yes, delete
          </Button>
          <Button onClick={() => setConfirming(false)}>Keep</Button>
        </span>
      )}
      <ErrorNotice error={remove.error} />
    </>
  );
}
