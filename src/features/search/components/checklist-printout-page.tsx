import { formatCount, formatDate, formatSize } from '@shared/domain/format';
import { useQuery } from '@tanstack/react-query';
import { useParams } from 'react-router-dom';
import type { ChecklistItem } from '@shared/types/catalogue';
import { Button } from '@/components/ui/button';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { checklistQueries } from '../api/search-queries';

const mm = (width: number | null, height: number | null) =>
  width != null && height != null ? formatSize(width, height) : '—';

/** A checklist laid out for paper: one row per print, thumbnail first, no navigation. */
export function ChecklistPrintoutPage() {
  const id = Number(useParams().id);
  const checklist = useQuery(checklistQueries.detail(id));
  if (checklist.isPending) return <Loading label="Loading the checklist…" />;
  if (checklist.error) return <ErrorNotice error={checklist.error} />;
  const { name, items } = checklist.data;
  return (
    <article className="checklist-printout mx-auto max-w-4xl">
      <header className="mb-4 flex items-end justify-between gap-3 border-b border-ink pb-2">
        <div>
          <p className="text-xs tracking-widest text-ink-faint uppercase">Checklist</p>
          <h1 className="text-3xl">{name}</h1>
          <p className="text-sm text-ink-soft">
            {formatCount(items.length, 'print')} · printed {formatDate(new Date())}
          </p>
        </div>
        <Button className="print:hidden" onClick={() => window.print()}>
          Print
        </Button>
      </header>
      <table className="w-full border-collapse text-sm">
        <caption className="sr-only">Prints on the checklist, in order</caption>
        <thead className="text-left text-xs tracking-wide text-ink-soft uppercase">
          <tr className="border-b border-paper-edge">
            <th scope="col" className="py-1 pr-2">
              No.
            </th>
            <th scope="col" className="py-1 pr-2">
              <span className="sr-only">Thumbnail</span>
            </th>
            <th scope="col" className="py-1 pr-2">
              Accession · title · maker
            </th>
            <th scope="col" className="py-1 pr-2">
              Made
            </th>
            <th scope="col" className="py-1 pr-2">
              Process · paper
            </th>
            <th scope="col" className="py-1">
              Image · sheet (width × height)
            </th>
          </tr>
        </thead>
        <tbody>
          {items.map((item, index) => (
            <PrintoutRow key={item.id} item={item} number={index + 1} />
          ))}
        </tbody>
      </table>
    </article>
  );
}

function PrintoutRow({ item, number }: { item: ChecklistItem; number: number }) {
  return (
    <tr className="break-inside-avoid border-b border-paper-edge align-top">
      <td className="py-2 pr-2 tabular-nums">{number}</td>
      <td className="py-2 pr-2">
        {item.thumbnailUrl ? (
          <img src={item.thumbnailUrl} alt="" className="h-20 w-16 object-contain" />
        ) : (
          <div
            aria-hidden="true"
            className="flex h-20 w-16 items-center justify-center border border-paper-edge text-[10px] text-ink-faint"
          >
            no image
          </div>
        )}
      </td>
      <td className="py-2 pr-2">
        <div className="font-mono text-xs">{item.accessionNumber}</div>
        <div className="font-serif text-base">{item.title}</div>
        <div className="text-ink-soft">{item.maker ?? 'Maker unknown'}</div>
      </td>
      <td className="py-2 pr-2 whitespace-nowrap">{item.madeOn ?? '—'}</td>
      <td className="py-2 pr-2">
        {item.process}
        <div className="text-ink-soft">{item.paper?.name ?? '—'}</div>
      </td>
      <td className="py-2 whitespace-nowrap">
        {mm(item.imageWidthMm, item.imageHeightMm)}
        <div className="text-ink-soft">{mm(item.sheetWidthMm, item.sheetHeightMm)}</div>
      </td>
    </tr>
  );
}
