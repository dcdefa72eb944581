import { useQuery } from '@tanstack/react-query';
import { formatCount } from '@shared/domain/format';
import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { ErrorNotice } from '@/components/ui/notices';
import { paths } from '@/config/paths';
import { useAppendToChecklist, useCreateChecklist } from '../api/search-mutations';
import { checklistQueries } from '../api/search-queries';
import type { ChecklistView } from '@shared/types/catalogue';

const NEW = 'new';

/** Picked prints go into a new checklist or onto the end of an existing one. */
export function PickPanel({ picked, onDone }: { picked: number[]; onDone: () => void }) {
  const checklists = useQuery(checklistQueries.list());
  const create = useCreateChecklist();
  const append = useAppendToChecklist();
  const [target, setTarget] = useState(NEW);
  const [name, setName] = useState('');
  const [done, setDone] = useState<{ id: number; name: string } | null>(null);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const finish = (checklist: ChecklistView) => {
      setDone({ id: checklist.id, name: checklist.name });
      setName('');
      onDone();
    };
    if (target === NEW) {
      create.mutate({ name, printIds: picked }, { onSuccess: finish });
      return;
    }
    const existing = checklists.data?.find((checklist) => String(checklist.id) === target);
    if (!existing) return;
    const printIds = [
      ...existing.printIds,
      ...picked.filter((id) => !existing.printIds.includes(id)),
    ];
    append.mutate({ id: existing.id, printIds }, { onSuccess: finish });
  };

  return (
    <section aria-labelledby="pick-heading" className="flex flex-col gap-2">
      <h2 id="pick-heading" className="text-lg">
        Checklist
      </h2>
      <p className="text-sm text-ink-soft" aria-live="polite">
        {formatCount(picked.length, 'print')} picked
      </p>
      <form onSubmit={submit} className="flex flex-col gap-2">
        <label htmlFor="pick-target" className="text-xs text-ink-soft">
          Add the picked prints to
        </label>
        <select
          id="pick-target"
          value={target}
          onChange={(event) => setTarget(event.target.value)}
          className="rounded border border-paper-edge bg-white px-2 py-1 text-sm"
        >
          <option value={NEW}>a new checklist…</option>
          {(checklists.data ?? []).map((checklist) => (
            <option key={checklist.id} value={checklist.id}>
              {checklist.name} ({checklist.printIds.length})
            </option>
          ))}
        </select>
        {target === NEW && (
          <>
            <label htmlFor="checklist-name" className="text-xs text-ink-soft">
              Name of the new checklist
            </label>
            <input
              id="checklist-name"
              value={name}
              maxLength={120}
              placeholder="e.g. Spring loan to the county museum"
              onChange={(event) => setName(event.target.value)}
              className="rounded border border-paper-edge bg-white px-2 py-1 text-sm"
            />
          </>
        )}
        <Button
          type="submit"
          tone="primary"
          disabled={
            !picked.length ||
            (target === NEW && !name.trim()) ||
            create.isPending ||
            append.isPending
          }
        >
          Add to checklist
        </Button>
      </form>
      <ErrorNotice error={create.error ?? append.error} />
      {done && (
        <p className="text-sm" role="status">
          Added. <Link to={paths.checklist(done.id)}>Open “{done.name}”</Link>
        </p>
      )}
    </section>
  );
}
