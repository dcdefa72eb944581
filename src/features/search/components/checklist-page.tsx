import { useQuery } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import { useNavigate, useParams } from 'react-router-dom';
import { Button, ButtonLink } from '@/components/ui/button';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { useDeleteChecklist, useUpdateChecklist } from '../api/search-mutations';
import { checklistQueries } from '../api/search-queries';
import { ReorderList } from './reorder-list';
import { FolderLabels } from '@/components/catalogue/folder-labels';
import { MovePrintsForm } from '@/components/catalogue/move-prints-form';
import { useCan } from '@/lib/session';

/** One checklist: rename, reorder, remove prints, export as CSV or a printable page. */
export function ChecklistPage() {
  const id = Number(useParams().id);
  const navigate = useNavigate();
  const checklist = useQuery(checklistQueries.detail(id));
  const update = useUpdateChecklist(id);
  const remove = useDeleteChecklist();
  const can = useCan();
  const [name, setName] = useState<string | null>(null);

  if (checklist.isPending) return <Loading label="Loading the checklist…" />;
  if (checklist.error) return <ErrorNotice error={checklist.error} />;
  const data = checklist.data;
  const rename = (event: FormEvent) => {
    event.preventDefault();
    if (name?.trim()) update.mutate({ name }, { onSuccess: () => setName(null) });
  };

  return (
    <>
      <PageHeader
        title={data.name}
        eyebrow="Checklist"
        actions={
          <>
            <a
              href={`/api/checklists/${id}.csv`}
              className="inline-flex items-center rounded border border-paper-edge px-3 py-1.5 text-sm text-ink no-underline hover:bg-paper-deep"
            >
              Download CSV
            </a>
            <ButtonLink to={paths.checklistPrintout(id)} tone="primary">
              Printable page
            </ButtonLink>
            <Button
              tone="danger"
              onClick={() => {
                if (window.confirm(`Delete the checklist “${data.name}”? The prints stay.`))
                  remove.mutate(id, { onSuccess: () => navigate(paths.checklists) });
              }}
            >
              Delete
            </Button>
          </>
        }
      />
      <form onSubmit={rename} className="mb-4 flex items-end gap-2">
        <div className="flex flex-col gap-1">
          <label htmlFor="checklist-rename" className="text-xs text-ink-soft">
            Name
          </label>
          <input
            id="checklist-rename"
            value={name ?? data.name}
            maxLength={120}
            onChange={(event) => setName(event.target.value)}
            className="w-80 max-w-full rounded border border-paper-edge bg-white px-2 py-1 text-sm"
          />
        </div>
        <Button type="submit" disabled={name === null || !name.trim() || update.isPending}>
          Rename
        </Button>
      </form>
      <ErrorNotice error={update.error ?? remove.error} className="mb-3" />
      {data.items.length ? (
        <ReorderList
          items={data.items}
          onReorder={(printIds) => update.mutate({ printIds })}
          onRemove={(printId) =>
            update.mutate({ printIds: data.printIds.filter((other) => other !== printId) })
          }
        />
      ) : (
        <p className="text-ink-soft">This checklist is empty. Pick prints in Search to add them.</p>
      )}
      {can('prints:move') && data.items.length > 0 && (
        <section aria-labelledby="move-checklist-heading" className="mt-6 max-w-sm">
          <h2 id="move-checklist-heading" className="mb-2 text-xl">
            Move these prints
          </h2>
          <MovePrintsForm printIds={data.items.map((item) => item.id)} />
        </section>
      )}
      {can('labels:print') && data.items.length > 0 && (
        <section aria-labelledby="labels-checklist-heading" className="mt-6 max-w-sm">
          <h2 id="labels-checklist-heading" className="mb-2 text-xl">
            Folder labels
          </h2>
          <FolderLabels printIds={data.items.map((item) => item.id)} />
        </section>
      )}
    </>
  );
}
