import { useQuery } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { ErrorNotice } from '@/components/ui/notices';
import { paths } from '@/config/paths';
import { useDeleteSavedSearch, useSaveSearch } from '../api/search-mutations';
import { savedSearchQueries } from '../api/search-queries';

/** Save the current search under a name; the list is the signed-in user's own. */
export function SavedSearchesPanel({ queryString }: { queryString: string }) {
  const saved = useQuery(savedSearchQueries.list());
  const save = useSaveSearch();
  const remove = useDeleteSavedSearch();
  const [name, setName] = useState('');
  const submit = (event: FormEvent) => {
    event.preventDefault();
    save.mutate({ name, query: queryString }, { onSuccess: () => setName('') });
  };
  return (
    <section aria-labelledby="saved-heading" className="flex flex-col gap-2">
      <h2 id="saved-heading" className="text-lg">
        Saved searches
      </h2>
      <form onSubmit={submit} className="flex items-end gap-2">
        <div className="flex flex-1 flex-col gap-1">
          <label htmlFor="saved-name" className="text-xs text-ink-soft">
            Name this search
          </label>
          <input
            id="saved-name"
            value={name}
            required
            maxLength={120}
            onChange={(event) => setName(event.target.value)}
            className="w-full rounded border border-paper-edge bg-white px-2 py-1 text-sm"
          />
        </div>
        <Button type="submit" disabled={save.isPending || !name.trim()}>
          Save
        </Button>
      </form>
      <ErrorNotice error={save.error ?? remove.error} />
      <ul className="flex flex-col gap-1 text-sm">
        {(saved.data ?? []).map((search) => (
          <li key={search.id} className="flex items-center justify-between gap-2">
            <Link to={`${paths.search}?${search.query}`}>{search.name}</Link>
            <button
              type="button"
              aria-label={`Delete saved search ${search.name}`}
              onClick={() => remove.mutate(search.id)}
              className="rounded px-1.5 text-ink-faint hover:bg-paper-deep hover:text-alert"
            >
              ×
            </button>
          </li>
        ))}
        {saved.data?.length === 0 && <li className="text-ink-faint">None yet.</li>}
      </ul>
    </section>
  );
}
