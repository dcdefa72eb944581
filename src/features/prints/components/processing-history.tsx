import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { STAGE_LABELS } from '@shared/domain/vocabulary';
import type { ProcessingStepView } from '@shared/types/catalogue';
import { paths } from '@/config/paths';

/** "15 % w/v sodium thiosulfate, batch FIX-24A" and the like, from what was recorded. */
function chemistryOf(step: ProcessingStepView): ReactNode {
  const parts = [
    step.concentrationPercent != null ? `${step.concentrationPercent} % w/v` : null,
    step.chemical,
  ].filter(Boolean);
  const chemistry = parts.join(' ');
  if (!chemistry && !step.solutionBatch) return null;
  if (!step.solutionBatch) return chemistry;
  return (
    <>
      {chemistry && `${chemistry}, `}
      batch{' '}
      <Link to={paths.batch(step.solutionBatch.id)} className="underline">
        {step.solutionBatch.code}
      </Link>
    </>
  );
}

function conditionsOf(step: ProcessingStepView): string[] {
  return [
    step.method,
    step.lightSource,
    step.coats != null ? `${step.coats} coat${step.coats === 1 ? '' : 's'}` : null,
    step.minutes != null ? `${step.minutes} min` : null,
    step.temperatureC != null ? `${step.temperatureC} °C` : null,
  ].filter((part): part is string => Boolean(part));
}

/** The making of the print, step by step, as a numbered sequence. */
export function ProcessingHistory({ steps }: { steps: ProcessingStepView[] }) {
  if (steps.length === 0) {
    return <p className="text-sm text-ink-faint">No processing history recorded.</p>;
  }
  return (
    <ol aria-label="Processing steps" className="relative ml-3 border-l-2 border-gall/30">
      {steps.map((step) => {
        const chemistry = chemistryOf(step);
        return (
          <li key={step.position} className="relative mb-4 pl-6 last:mb-0">
            <span
              aria-hidden="true"
              className="absolute top-0.5 -left-[13px] flex h-6 w-6 items-center justify-center rounded-full border-2 border-gall bg-paper text-xs font-semibold text-gall"
            >
              {step.position}
            </span>
            <h3 className="font-serif text-lg leading-tight">{STAGE_LABELS[step.stage]}</h3>
            {chemistry && <p className="text-sm">{chemistry}</p>}
            {conditionsOf(step).length > 0 && (
              <p className="text-sm text-ink-soft">{conditionsOf(step).join(' · ')}</p>
            )}
            {step.notes && <p className="mt-0.5 text-sm text-ink-faint italic">{step.notes}</p>}
          </li>
        );
      })}
    </ol>
  );
}
