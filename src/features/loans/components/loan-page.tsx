import { useQuery } from '@tanstack/react-query';
import { formatNumber } from '@shared/domain/format';
import { LIGHT_CAUTION } from '@shared/domain/light/settings';
import type { LoanStage } from '@shared/domain/loans';
import type { LoanView } from '@shared/types/loan';
import { Link, useParams } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { useCan } from '@/lib/session';
import { loanQueries, useUpdateLoan } from '../api/loan-queries';
import { ConditionsForm } from './conditions-form';
import { LinkedReport } from './linked-report';

/** What each stage may become, with the words of its button and who may press it. */
const STAGE_ACTIONS: Array<{
  from: LoanStage;
  to: LoanStage;
  label: string;
  needs: 'loans:plan' | 'prints:move';
}> = [
  { from: 'proposed', to: 'agreed', label: 'Mark as agreed', needs: 'loans:plan' },
  { from: 'agreed', to: 'away', label: 'Send the prints out', needs: 'prints:move' },
  { from: 'away', to: 'back', label: 'Take the prints back in', needs: 'prints:move' },
  { from: 'proposed', to: 'withdrawn', label: 'Withdraw', needs: 'loans:plan' },
];

const band = (value: { min: number; max: number } | null, unit: string) =>
  value ? `${formatNumber(value.min)}–${formatNumber(value.max)} ${unit}` : 'not agreed';

/** One loan or show: conditions and their signature, stage, prints with their light plan. */
export function LoanPage() {
  const id = Number(useParams().id);
  const can = useCan();
  const loan = useQuery(loanQueries.detail(id));
  const update = useUpdateLoan(id);
  if (loan.error) return <ErrorNotice error={loan.error} />;
  if (!loan.data) return <Loading label="Loading the loan…" />;
  const data = loan.data;
  return (
    <>
      <PageHeader
        title={data.title}
        eyebrow={`${data.kind} · ${data.stage}`}
        actions={
          can('loans:plan') && (
            <a
              href={`/api/loans/${id}/report.pdf`}
              className="inline-flex items-center rounded border border-paper-edge px-3 py-1.5 text-sm text-ink no-underline hover:bg-paper-deep"
            >
              Courier and borrower sheet (PDF)
            </a>
          )
        }
      />
      <dl className="mb-4 grid max-w-2xl grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="text-ink-soft">Venue</dt>
        <dd>{data.venue}</dd>
        {data.contact !== undefined && (
          <>
            <dt className="text-ink-soft">Contact</dt>
            <dd>{data.contact ?? '—'}</dd>
          </>
        )}
        <dt className="text-ink-soft">Dates</dt>
        <dd className="tabular-nums">
          {data.startsOn} to {data.endsOn}, {formatNumber(data.hoursPerDay)} hours a day
        </dd>
      </dl>
      <Conditions loan={data} canSign={can('condition:write')} update={update} />
      <section aria-labelledby="stage-heading" className="mb-6">
        <h2 id="stage-heading" className="mb-2 text-xl">
          Stage: {data.stage}
        </h2>
        <div className="flex flex-wrap gap-2">
          {STAGE_ACTIONS.filter((action) => action.from === data.stage && can(action.needs)).map(
            (action) => (
              <Button
                key={action.to}
                onClick={() => update.mutate({ stage: action.to })}
                disabled={update.isPending}
              >
                {action.label}
              </Button>
            ),
          )}
        </div>
        <ErrorNotice error={update.error} className="mt-2" />
      </section>
      <section aria-labelledby="loan-prints-heading">
        <h2 id="loan-prints-heading" className="mb-1 text-xl">
          Prints and their light
        </h2>
        <p className="mb-2 text-sm" role="status">
          {data.printsOverLimit === 0
            ? 'No print would pass its annual light limit.'
            : `${data.printsOverLimit} of ${data.prints.length} prints would pass their annual light limit.`}
        </p>
        <p className="mb-3 max-w-prose text-xs text-ink-soft">{LIGHT_CAUTION}</p>
        <table className="w-full text-sm">
          <thead>
            <tr className="text-left text-ink-soft">
              <th scope="col">Print</th>
              <th scope="col">This loan (lx·h)</th>
              <th scope="col">Annual limit</th>
              <th scope="col">Light</th>
              <th scope="col">At departure</th>
              <th scope="col">On return</th>
            </tr>
          </thead>
          <tbody>
            {data.prints.map((print) => (
              <tr key={print.id} className="border-t border-paper-edge align-top">
                <td>
                  <span className="font-mono text-xs">{print.accessionNumber}</span>{' '}
                  <Link to={paths.print(print.id)}>{print.title}</Link>
                  <div className="text-xs text-ink-soft">{print.process}</div>
                </td>
                <td className="tabular-nums">{formatNumber(print.light.plannedLuxHours)}</td>
                <td className="tabular-nums">{formatNumber(print.light.annualLimit)}</td>
                <td>
                  {print.light.excess.length === 0 ? (
                    'within its limit'
                  ) : (
                    <span className="font-semibold text-alert">
                      {print.light.excess
                        .map((year) => `over by ${formatNumber(year.overBy)} lx·h in ${year.year}`)
                        .join('; ')}
                    </span>
                  )}
                </td>
                {(['departure', 'return'] as const).map((moment) => (
                  <td key={moment}>
                    <LinkedReport
                      print={print}
                      moment={moment}
                      canLink={can('condition:write')}
                      link={(reportId) =>
                        update.mutate({
                          conditionReports: [
                            moment === 'departure'
                              ? { printId: print.id, departureReportId: reportId }
                              : { printId: print.id, returnReportId: reportId },
                          ],
                        })
                      }
                    />
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </section>
    </>
  );
}

function Conditions({
  loan,
  canSign,
  update,
}: {
  loan: LoanView;
  canSign: boolean;
  update: ReturnType<typeof useUpdateLoan>;
}) {
  return (
    <section aria-labelledby="conditions-heading" className="mb-6">
      <h2 id="conditions-heading" className="mb-2 text-xl">
        Agreed conditions
      </h2>
      <ul className="mb-2 text-sm">
        <li>Illuminance at most {formatNumber(loan.maxLux)} lx</li>
        <li>
          Ultraviolet{' '}
          {loan.maxUv === null ? 'not agreed' : `at most ${formatNumber(loan.maxUv)} µW/lm`}
        </li>
        <li>Temperature {band(loan.temperatureC, '°C')}</li>
        <li>Relative humidity {band(loan.humidityPercent, '%')}</li>
        <li>No flash photography</li>
      </ul>
      <p className="mb-2 text-sm">
        {loan.conditionsSigned
          ? `Signed by ${loan.conditionsSigned.by?.name ?? 'a removed user'} on ${loan.conditionsSigned.on}.`
          : 'Not signed yet: a conservator signs the conditions before the loan is agreed.'}
      </p>
      {canSign && !loan.conditionsSigned && (
        <Button tone="primary" onClick={() => update.mutate({ conditionsSigned: true })}>
          Sign the conditions
        </Button>
      )}
      {canSign && (
        <ConditionsForm
          key={JSON.stringify([loan.maxLux, loan.maxUv, loan.temperatureC, loan.humidityPercent])}
          loan={loan}
          update={update}
        />
      )}
    </section>
  );
}
