import { useQuery } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import { PROCESSES } from '@shared/domain/vocabulary';
import { RIGHTS_STATEMENTS } from '@shared/domain/registrar/rights-statements';
import type { PrintListResponse } from '@shared/types/catalogue';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { referenceQueries } from '@/lib/reference-api';
import type { PrintListParams } from '@/lib/catalogue';

/** Words, process, paper and the processing-concern switch; counts come from the facets. */
export function PrintFilters({
  params,
  facets,
  onChange,
}: {
  params: PrintListParams;
  facets: PrintListResponse['facets'] | undefined;
  onChange: (changes: PrintListParams) => void;
}) {
  const papers = useQuery(referenceQueries.papers());
  const count = (
    list: Array<{ value: string | number; count: number }> | undefined,
    value: string | number,
  ) => {
    const found = list?.find((facet) => facet.value === value);
    return found ? ` (${found.count})` : '';
  };
  return (
    <div
      role="search"
      className="mb-4 grid gap-3 rounded border border-paper-edge bg-paper-deep/60 p-3 md:grid-cols-[2fr_1fr_1fr_1fr_auto] md:items-end"
    >
      <WordsSearch
        key={params.q ?? ''}
        initial={params.q ?? ''}
        onSearch={(q) => onChange({ q })}
      />
      <SelectField
        label="Process"
        value={params.process ?? ''}
        placeholder="Any process"
        options={PROCESSES.map((process) => ({
          value: process,
          label: `${process}${count(facets?.process, process)}`,
        }))}
        onChange={(event) => onChange({ process: event.target.value })}
      />
      <SelectField
        label="Paper"
        value={params.paperId ?? ''}
        placeholder="Any paper"
        options={(papers.data ?? []).map((paper) => ({
          value: paper.id,
          label: `${paper.name}${count(facets?.paperId, paper.id)}`,
        }))}
        onChange={(event) => onChange({ paperId: event.target.value })}
      />
      <SelectField
        label="Rights"
        value={params.rightsStatement ?? ''}
        placeholder="Any rights statement"
        options={RIGHTS_STATEMENTS.map((statement) => ({
          value: statement.uri,
          label: `${statement.label}${count(facets?.rightsStatement, statement.uri)}`,
        }))}
        onChange={(event) => onChange({ rightsStatement: event.target.value })}
      />
      {params.sourceId && (
        <p className="text-sm md:col-span-5">
          Only prints from one source.{' '}
          <button type="button" className="underline" onClick={() => onChange({ sourceId: '' })}>
            Show prints from every source
          </button>
        </p>
      )}
      <label className="flex items-center gap-2 pb-1.5 text-sm">
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

/** Words are sent on Enter or Find, not on every keystroke; remounted when the URL changes. */
function WordsSearch({ initial, onSearch }: { initial: string; onSearch: (q: string) => void }) {
  const [words, setWords] = useState(initial);
  const submit = (event: FormEvent) => {
    event.preventDefault();
    onSearch(words.trim());
  };
  return (
    <form onSubmit={submit} className="flex items-end gap-2">
      <TextField
        label="Find words"
        type="search"
        value={words}
        placeholder="title, maker, tag, accession number…"
        onChange={(event) => setWords(event.target.value)}
        className="flex-1"
      />
      <Button type="submit" tone="primary">
        Find
      </Button>
    </form>
  );
}
