import type { PrintListResponse } from '@shared/types/catalogue';
import { FolderLabels } from '@/components/catalogue/folder-labels';
import { MovePrintsForm } from '@/components/catalogue/move-prints-form';
import { Loading } from '@/components/ui/notices';
import { useCan } from '@/lib/session';
import type { SearchParams } from '../api/search-queries';
import { PickPanel } from './pick-panel';
import { SavedSearchesPanel } from './saved-searches-panel';
import { SearchFilters, useFilterListsReady } from './search-filters';

/**
 * What stands beside Search's results: the filters, saved searches, picks and what can be
 * done with the picked prints. A chunk of its own (date fields, forms, movement and label
 * code), loaded after the results' page has drawn, so none of it is on a first load's path.
 */
export function SearchAside({
  params,
  facets,
  onChange,
  queryString,
  picked,
  onPicksDone,
}: {
  params: SearchParams;
  facets: PrintListResponse['facets'];
  onChange: (changes: Record<string, string>) => void;
  queryString: string;
  picked: number[];
  onPicksDone: () => void;
}) {
  const can = useCan();
  // Drawn whole once its lists and counts are in: drawn in parts, each part that arrived
  // pushed the ones below it down the screen.
  if (!useFilterListsReady()) return <Loading label="Loading the filters…" />;
  return (
    <>
      <SearchFilters params={params} facets={facets} onChange={onChange} />
      {can('searches:save') && <SavedSearchesPanel queryString={queryString} />}
      {can('searches:save') && <PickPanel picked={picked} onDone={onPicksDone} />}
      {can('prints:move') && picked.length > 0 && (
        <section aria-labelledby="move-picked-heading" className="flex flex-col gap-2">
          <h2 id="move-picked-heading" className="text-lg">
            Move the picked prints
          </h2>
          <MovePrintsForm printIds={picked} />
        </section>
      )}
      {can('labels:print') && picked.length > 0 && (
        <section aria-labelledby="labels-picked-heading" className="flex flex-col gap-2">
          <h2 id="labels-picked-heading" className="text-lg">
            Folder labels
          </h2>
          <FolderLabels printIds={picked} />
        </section>
      )}
    </>
  );
}
