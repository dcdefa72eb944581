import { Link } from 'react-router-dom';
import type { PrintView } from '@shared/types/catalogue';
import { paths } from '@/config/paths';

const METHOD_WORDS: Record<NonNullable<PrintView['acquisition']>['method'], string> = {
  gift: 'Gift',
  purchase: 'Purchase',
  transfer: 'Transfer',
  bequest: 'Bequest',
  'made for the collection': 'Made for the collection',
  'found in the collection': 'Found in the collection',
};

const dates = (from: string | null, to: string | null) =>
  from && to ? `${from} to ${to}` : from ? `from ${from}` : to ? `until ${to}` : '';

function Rows({ rows, label }: { rows: Array<[string, React.ReactNode]>; label: string }) {
  return (
    <dl aria-label={label} className="grid grid-cols-[8rem_1fr] gap-x-4 gap-y-1.5 text-sm">
      {rows.map(([term, value]) => (
        <div key={term} className="contents">
          <dt className="text-ink-faint">{term}</dt>
          <dd>{value}</dd>
        </div>
      ))}
    </dl>
  );
}

/**
 * The registrar's part of a print's record: how it came in (and from whom, with earlier
 * owners), its rights, and what is written or stamped on it. The server leaves out what
 * the reader may not see (prices, private marks).
 */
export function RegistrarRecord({ print }: { print: PrintView }) {
  const { acquisition, provenance, rights, marks } = print;
  const versoImage = (assetId: number | null) =>
    assetId === null ? null : print.assets.find((asset) => asset.id === assetId);
  return (
    <div className="mt-8 grid gap-8 lg:grid-cols-3">
      <section aria-labelledby="record-came-in">
        <h2 id="record-came-in" className="mb-2 text-xl">
          How it came in
        </h2>
        {acquisition ? (
          <Rows
            label="How it came in"
            rows={[
              ['How', METHOD_WORDS[acquisition.method]],
              [
                'From',
                acquisition.source ? (
                  <Link to={`${paths.prints}?sourceId=${acquisition.sourceId}`}>
                    {acquisition.source.name}
                  </Link>
                ) : (
                  '—'
                ),
              ],
              ['When', acquisition.acquiredOn],
              ['Reference', acquisition.reference ?? '—'],
              ['Credit line', acquisition.creditLine ?? '—'],
              ...(acquisition.price !== undefined
                ? ([['Price paid', acquisition.price ?? '—']] as Array<[string, React.ReactNode]>)
                : []),
            ]}
          />
        ) : (
          <p className="text-sm text-ink-faint">Not recorded yet.</p>
        )}
        {provenance.length > 0 && (
          <>
            <h3 className="mt-4 mb-1 text-base">Earlier owners, oldest first</h3>
            <ol aria-label="Earlier owners" className="list-decimal pl-5 text-sm">
              {provenance.map((link, index) => (
                <li key={`${link.owner}-${index}`}>
                  {link.owner}
                  {dates(link.from, link.to) && ` (${dates(link.from, link.to)})`}
                  {link.evidence && (
                    <span className="block text-xs text-ink-faint">Source: {link.evidence}</span>
                  )}
                </li>
              ))}
            </ol>
          </>
        )}
      </section>
      <section aria-labelledby="record-rights">
        <h2 id="record-rights" className="mb-2 text-xl">
          Rights
        </h2>
        {rights ? (
          <Rows
            label="Rights"
            rows={[
              [
                'Statement',
                <a key="statement" href={rights.statement} rel="noreferrer">
                  {rights.label}
                </a>,
              ],
              ['Holder', rights.holder ?? '—'],
              ['Note', rights.note ?? '—'],
            ]}
          />
        ) : (
          <p className="text-sm text-ink-faint">Not recorded yet.</p>
        )}
      </section>
      <section aria-labelledby="record-marks">
        <h2 id="record-marks" className="mb-2 text-xl">
          Marks and inscriptions
        </h2>
        {marks.length ? (
          <ul aria-label="Marks and inscriptions" className="space-y-2 text-sm">
            {marks.map((mark, index) => (
              <li key={`${mark.transcription}-${index}`}>
                <span className="text-ink-faint">
                  {mark.kind}, {mark.position}
                  {mark.private && ' (private)'}
                  {mark.area && versoImage(mark.assetId) && ' · marked on its photograph'}
                </span>
                <span className="block font-serif text-base">“{mark.transcription}”</span>
                {mark.reading && <span className="block">Reads: {mark.reading}</span>}
              </li>
            ))}
          </ul>
        ) : (
          <p className="text-sm text-ink-faint">None recorded.</p>
        )}
      </section>
    </div>
  );
}
