import { useQuery } from '@tanstack/react-query';
import { PROCESSES, TONE_STATUSES } from '@shared/domain/vocabulary';
import { RIGHTS_STATEMENTS } from '@shared/domain/registrar/rights-statements';
import type { PrintListResponse } from '@shared/types/catalogue';
import { referenceQueries } from '@/lib/reference-api';
import type { SearchParams } from '../api/search-queries';
import { printQueries } from '@/lib/catalogue';
import { FacetList } from './facet-list';
import { MinutesRange } from './minutes-range';
import { SourceNotice } from './source-notice';
import { MadeDate } from './made-date';

const TONE_LABELS: Record<string, string> = { unchecked: 'not yet checked' };

/** Whether the lists the filters are drawn from (papers, the collection's bands) are in. */
export function useFilterListsReady(): boolean {
  const papers = useQuery(referenceQueries.papers());
  const collection = useQuery(printQueries.collection());
  return !papers.isPending && !collection.isPending;
}

/** Every filter of the contract's query, each value with its count for the current search. */
export function SearchFilters({
  params,
  facets,
  onChange,
}: {
  params: SearchParams;
  facets: PrintListResponse['facets'] | undefined;
  onChange: (changes: Record<string, string>) => void;
}) {
  const papers = useQuery(referenceQueries.papers());
  const collection = useQuery(printQueries.collection());
  const whole = collection.data?.facets;
  // Twelve statements would crowd the column: only those the collection uses (or chosen).
  const rights = RIGHTS_STATEMENTS.filter(
    (statement) =>
      statement.uri === params.rightsStatement ||
      whole?.rightsStatement.some((facet) => facet.value === statement.uri && facet.count > 0),
  );
  return (
    <div className="flex flex-col gap-4">
      {params.sourceId && (
        <SourceNotice sourceId={params.sourceId} onClear={() => onChange({ sourceId: '' })} />
      )}
      <FacetList
        label="Process"
        values={PROCESSES.map((process) => ({ value: process, label: process }))}
        counts={facets?.process}
        selected={params.process ?? ''}
        onSelect={(process) => onChange({ process })}
      />
      <FacetList
        label="Paper"
        values={(papers.data ?? []).map((paper) => ({ value: paper.id, label: paper.name }))}
        counts={facets?.paperId}
        selected={params.paperId ?? ''}
        onSelect={(paperId) => onChange({ paperId })}
      />
      <FacetList
        label="Tone"
        values={TONE_STATUSES.map((tone) => ({ value: tone, label: TONE_LABELS[tone] ?? tone }))}
        counts={facets?.toneStatus}
        selected={params.toneStatus ?? ''}
        onSelect={(toneStatus) => onChange({ toneStatus })}
      />
      <FacetList
        label="Rights"
        values={rights.map((statement) => ({ value: statement.uri, label: statement.label }))}
        counts={facets?.rightsStatement}
        selected={params.rightsStatement ?? ''}
        onSelect={(rightsStatement) => onChange({ rightsStatement })}
      />
      <MinutesRange
        label="Fixing"
        collection={whole?.fixingBands}
        current={facets?.fixingBands}
        min={params.fixingMinutesMin ?? ''}
        max={params.fixingMinutesMax ?? ''}
        onChange={(min, max) => onChange({ fixingMinutesMin: min, fixingMinutesMax: max })}
      />
      <MinutesRange
        label="Washing"
        collection={whole?.washingBands}
        current={facets?.washingBands}
        min={params.washingMinutesMin ?? ''}
        max={params.washingMinutesMax ?? ''}
        onChange={(min, max) => onChange({ washingMinutesMin: min, washingMinutesMax: max })}
      />
      <fieldset className="flex flex-col gap-1 text-sm">
        <legend className="text-xs font-semibold tracking-wide text-ink-soft uppercase">
          Made
        </legend>
        <MadeDate
          label="From"
          value={params.madeFrom ?? ''}
          onChange={(madeFrom) => onChange({ madeFrom })}
        />
        <MadeDate
          label="To"
          value={params.madeTo ?? ''}
          onChange={(madeTo) => onChange({ madeTo })}
        />
      </fieldset>
      <label className="flex items-center gap-2 text-sm">
        <input
          type="checkbox"
          checked={params.processingRisk === 'true'}
          onChange={(event) => onChange({ processingRisk: event.target.checked ? 'true' : '' })}
        />
        Processing concerns only
      </label>
    </div>
  );
}
