import { Button } from './button';

/** Previous and next buttons around "Page N of M", for any paged list. */
export function Pager({
  page,
  pages,
  onPage,
}: {
  page: number;
  pages: number;
  onPage: (page: number) => void;
}) {
  // An address with a page past the end (an old link, a shorter list now): say so and offer
  // the last page, not "Page 9 of 3" over an empty table.
  if (page > pages) {
    return (
      <nav aria-label="Pages" className="mt-3 flex flex-wrap items-center gap-3 text-sm">
        <span>
          There is no page {page}: the list has {pages === 1 ? 'one page' : `${pages} pages`}.
        </span>
        <Button onClick={() => onPage(pages)}>Go to page {pages}</Button>
      </nav>
    );
  }
  return (
    <nav aria-label="Pages" className="mt-3 flex items-center gap-3 text-sm">
      <Button disabled={page <= 1} onClick={() => onPage(page - 1)}>
        ← Previous
      </Button>
      <span>
        Page {page} of {pages}
      </span>
      <Button disabled={page >= pages} onClick={() => onPage(page + 1)}>
        Next →
      </Button>
    </nav>
  );
}
