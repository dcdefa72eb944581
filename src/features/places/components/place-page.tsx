import { useQuery } from '@tanstack/react-query';
import { formatCount } from '@shared/domain/format';
import { LABEL_SHEETS } from '@shared/domain/label-sheets';
import { todayIso } from '@shared/domain/tone/check-date';
import { useState, type ReactNode } from 'react';
import { Link, useParams } from 'react-router-dom';
import { MovePrintsForm } from '@/components/catalogue/move-prints-form';
import { TextArea } from '@/components/ui/field';
import { DateField } from '@/components/ui/date-field';
import { isForbidden, NoAccess } from '@/components/ui/no-access';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { movementQueries } from '@/lib/catalogue';
import { useCan } from '@/lib/session';
import { accessionNumbersIn, printIdsOf } from '@/lib/accession-lookup';

/**
 * One place: what it holds now or on a chosen day, its labels, and "move here". Other areas
 * add their sections (the storage environment) through `sections`, as on the print's record.
 */
export function PlacePage({ sections }: { sections?: (place: { id: number }) => ReactNode } = {}) {
  const id = Number(useParams().id);
  const can = useCan();
  const [on, setOn] = useState(todayIso());
  const holdings = useQuery({
    ...movementQueries.holdings(id, on || todayIso()),
    enabled: can('locations:read'),
  });
  if (!can('locations:read') || isForbidden(holdings.error)) {
    return (
      <>
        <PageHeader title="Place" eyebrow="Where the prints are kept" />
        <NoAccess area="Places" needs="locations:read" />
      </>
    );
  }
  if (holdings.isPending) return <Loading label="Loading the place…" />;
  if (holdings.error) return <ErrorNotice error={holdings.error} />;
  const { place, items } = holdings.data;
  const today = on === todayIso();

  return (
    <>
      <PageHeader
        title={place.name}
        eyebrow={<span className="font-mono tracking-normal normal-case">{place.code}</span>}
      />
      {can('prints:move') && <MoveHere placeId={place.id} code={place.code} />}
      <section aria-labelledby="holdings-heading" className="mb-6">
        <h2 id="holdings-heading" className="mb-2 text-xl">
          {today ? 'Holds now' : `Held at the end of ${on}`}
        </h2>
        <DateField
          label="On the day"
          value={on}
          max={todayIso()}
          onChange={(event) => setOn(event.target.value)}
          className="mb-3 max-w-xs"
        />
        <p className="mb-2 text-sm text-ink-soft" aria-live="polite">
          {formatCount(items.length, 'print')}
        </p>
        {items.length > 0 && (
          <table className="w-full text-sm">
            <thead>
              <tr className="text-left text-ink-soft">
                <th scope="col">Accession number</th>
                <th scope="col">Title</th>
                <th scope="col">Process</th>
                <th scope="col">Here since</th>
              </tr>
            </thead>
            <tbody>
              {items.map((item) => (
                <tr key={item.id} className="border-t border-paper-edge">
                  <td className="font-mono text-xs">{item.accessionNumber}</td>
                  <td>
                    <Link to={paths.print(item.id)}>{item.title}</Link>
                  </td>
                  <td>{item.process}</td>
                  <td className="tabular-nums">{item.since}</td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </section>
      {sections?.(place)}
      {can('labels:print') && (
        <section aria-labelledby="labels-heading">
          <h2 id="labels-heading" className="mb-2 text-xl">
            Labels
          </h2>
          <p className="mb-2 max-w-prose text-sm text-ink-soft">
            A sheet with this place and every place inside it; each label&apos;s QR code opens the
            place&apos;s page. Check the sheet&apos;s sizes against the box of labels.
          </p>
          <ul className="flex flex-col gap-1 text-sm">
            {LABEL_SHEETS.map((sheet) => (
              <li key={sheet.id}>
                <a href={`/api/locations/${place.id}/labels.pdf?layout=${sheet.id}`}>
                  {sheet.label} (PDF)
                </a>
              </li>
            ))}
          </ul>
        </section>
      )}
    </>
  );
}

/** An archivist scans or types accession numbers and moves those prints into this place. */
function MoveHere({ placeId, code }: { placeId: number; code: string }) {
  const [text, setText] = useState('');
  const numbers = accessionNumbersIn(text);
  return (
    <section
      aria-labelledby="move-here-heading"
      className="mb-6 rounded border border-paper-edge p-3"
    >
      <h2 id="move-here-heading" className="mb-2 text-xl">
        Move here
      </h2>
      <TextArea
        label={`Accession numbers of the prints to move into ${code}, one a line`}
        value={text}
        onChange={(event) => setText(event.target.value)}
        rows={3}
      />
      <MovePrintsForm
        placeId={placeId}
        printIds={() => printIdsOf(numbers)}
        submitLabel={`Move ${formatCount(numbers.length, 'print')} here`}
        onMoved={() => setText('')}
      />
    </section>
  );
}
