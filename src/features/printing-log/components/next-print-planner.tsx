import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { suggestExposure, type ExposureSuggestion } from '@shared/domain/printing-log';
import { LIGHT_SOURCE_SUGGESTIONS } from '@shared/domain/vocabulary';
import type { PrintingLogView } from '@shared/types/chemistry';
import { SelectField, TextField } from '@/components/ui/field';
import { referenceQueries } from '@/lib/reference-api';

const OUTCOME_WORDS: Record<ExposureSuggestion['outcome'], string> = {
  steady: 'that stayed steady',
  unchecked: 'not yet tone-checked',
  watch: 'under watch',
  fading: 'now fading',
  darkening: 'now darkening',
  yellowing: 'now yellowing',
};

/** Words for a suggestion: the minutes, the range and what they rest on. */
function describe(suggestion: ExposureSuggestion): string {
  const range =
    suggestion.low === suggestion.high ? '' : ` (${suggestion.low}–${suggestion.high} min)`;
  const prints = `${suggestion.basedOn} print${suggestion.basedOn === 1 ? '' : 's'}`;
  const where = suggestion.match === 'same' ? 'on this paper' : 'on other papers';
  return `about ${suggestion.minutes} min${range}, from ${prints} ${where} ${OUTCOME_WORDS[suggestion.outcome]}`;
}

/** Pick a paper and a light source; the log suggests where to start the exposure. */
export function NextPrintPlanner({ log }: { log: PrintingLogView }) {
  const papers = useQuery(referenceQueries.papers());
  const last = log.prints.findLast((print) => print.lightSource);
  const [paperId, setPaperId] = useState<number | null>(last?.paper?.id ?? null);
  const [light, setLight] = useState(last?.lightSource ?? 'open shade');
  const suggestion = suggestExposure(
    log.prints.map((print) => ({ ...print, paperId: print.paper?.id ?? null })),
    { paperId, lightSource: light },
  );
  return (
    <section aria-labelledby="next-print">
      <h2 id="next-print" className="mb-2 text-xl">
        Suggested exposure
      </h2>
      <div className="grid gap-3 rounded border border-paper-edge bg-white/60 p-3 sm:grid-cols-2">
        <SelectField
          label="Paper"
          placeholder="Not recorded"
          options={(papers.data ?? []).map((paper) => ({ value: paper.id, label: paper.name }))}
          value={paperId ?? ''}
          onChange={(e) => setPaperId(e.target.value ? Number(e.target.value) : null)}
        />
        <TextField
          label="Light source"
          list="planner-lights"
          value={light}
          onChange={(e) => setLight(e.target.value)}
        />
        <datalist id="planner-lights">
          {LIGHT_SOURCE_SUGGESTIONS.map((option) => (
            <option key={option} value={option} />
          ))}
        </datalist>
        <div role="status" className="text-sm sm:col-span-2">
          {suggestion ? (
            <p>
              <strong className="font-serif text-2xl">{suggestion.minutes} min</strong>
              <span className="block">Start at {describe(suggestion)}.</span>
            </p>
          ) : (
            <p>No past print from this negative under this light: make a test strip.</p>
          )}
        </div>
        <p className="text-xs text-ink-faint sm:col-span-2">
          A starting point drawn from past prints, not a measurement: light, paper batch and
          humidity change from day to day, so confirm with a test strip.
        </p>
      </div>
      {log.suggestions.length > 0 && (
        <>
          <h3 className="mt-4 mb-1 font-serif text-lg">Known starting points</h3>
          <ul className="list-disc pl-5 text-sm">
            {log.suggestions.map((group) => (
              <li key={`${group.paper?.id ?? 'none'}-${group.lightSource}`}>
                {group.paper?.name ?? 'Paper not recorded'}, {group.lightSource}:{' '}
                {describe(group.suggestion)}
              </li>
            ))}
          </ul>
        </>
      )}
    </section>
  );
}
