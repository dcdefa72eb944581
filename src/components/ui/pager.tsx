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
