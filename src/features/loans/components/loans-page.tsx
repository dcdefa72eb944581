import { useQuery } from '@tanstack/react-query';
import { LOAN_KINDS, type LoanKind } from '@shared/domain/loans';
import { useState, type FormEvent } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { SelectField, TextArea, TextField } from '@/components/ui/field';
import { DateField } from '@/components/ui/date-field';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { accessionNumbersIn, printIdsOf } from '@/lib/accession-lookup';
import { ApiError } from '@/lib/api-client';
import { useCan } from '@/lib/session';
import { loanQueries, useCreateLoan } from '../api/loan-queries';

/** Loans and exhibitions: every one with its stage; curators and above plan a new one. */
export function LoansPage() {
  const can = useCan();
  const loans = useQuery(loanQueries.list());
  return (
    <>
      <PageHeader title="Loans and shows" eyebrow="Prints away and on display" />
      {can('loans:plan') && <NewLoanForm />}
      <section aria-labelledby="loans-heading">
        <h2 id="loans-heading" className="mb-2 text-xl">
          All loans and shows
        </h2>
        {loans.error ? (
          <ErrorNotice error={loans.error} />
        ) : !loans.data ? (
          <Loading label="Loading loans…" />
        ) : loans.data.length === 0 ? (
          <p className="text-sm text-ink-soft">None yet.</p>
        ) : (
          <table className="w-full text-sm">
            <thead>
              <tr className="text-left text-ink-soft">
                <th scope="col">Title</th>
                <th scope="col">Kind</th>
                <th scope="col">Venue</th>
                <th scope="col">Dates</th>
                <th scope="col">Stage</th>
                <th scope="col">Prints</th>
              </tr>
            </thead>
            <tbody>
              {loans.data.map((loan) => (
                <tr key={loan.id} className="border-t border-paper-edge">
                  <td>
                    <Link to={paths.loan(loan.id)}>{loan.title}</Link>
                  </td>
                  <td>{loan.kind}</td>
                  <td>{loan.venue}</td>
                  <td className="tabular-nums">
                    {loan.startsOn} – {loan.endsOn}
                  </td>
                  <td>{loan.stage}</td>
                  <td className="tabular-nums">{loan.prints}</td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </section>
    </>
  );
}

const EMPTY = {
  title: '',
  kind: 'exhibition' as LoanKind,
  venue: '',
  contact: '',
  startsOn: '',
  endsOn: '',
  hoursPerDay: '8',
  maxLux: '50',
  numbers: '',
};

/** Plans a loan or show: dates, hours, the proposed illuminance, its prints by number. */
function NewLoanForm() {
  const create = useCreateLoan();
  const navigate = useNavigate();
  const [form, setForm] = useState(EMPTY);
  const [lookupError, setLookupError] = useState<unknown>(null);
  const set = (key: keyof typeof EMPTY) => (event: { target: { value: string } }) =>
    setForm((f) => ({ ...f, [key]: event.target.value }));
  const errors = create.error instanceof ApiError ? create.error.errors : [];
  const errorOf = (path: string) => errors.find((error) => error.path === path)?.message;
  const submit = async (event: FormEvent) => {
    event.preventDefault();
    setLookupError(null);
    let printIds: number[];
    try {
      printIds = await printIdsOf(accessionNumbersIn(form.numbers));
    } catch (error) {
      setLookupError(error);
      return;
    }
    create.mutate(
      {
        title: form.title,
        kind: form.kind,
        venue: form.venue,
        contact: form.contact || null,
        startsOn: form.startsOn,
        endsOn: form.endsOn,
        hoursPerDay: Number(form.hoursPerDay),
        maxLux: Number(form.maxLux),
        printIds,
      },
      { onSuccess: (loan) => navigate(paths.loan(loan.id)) },
    );
  };
  return (
    <form
      onSubmit={submit}
      aria-label="Plan a loan or show"
      className="mb-6 grid max-w-3xl gap-3 rounded border border-paper-edge p-3 sm:grid-cols-2"
    >
      <h2 className="text-xl sm:col-span-2">Plan a loan or show</h2>
      <TextField
        label="Title"
        value={form.title}
        onChange={set('title')}
        error={errorOf('title')}
      />
      <SelectField
        label="Kind"
        value={form.kind}
        onChange={set('kind')}
        options={LOAN_KINDS.map((kind) => ({ value: kind, label: kind }))}
      />
      <TextField
        label="Venue or borrower"
        value={form.venue}
        onChange={set('venue')}
        error={errorOf('venue')}
      />
      <TextField label="Borrower contact" value={form.contact} onChange={set('contact')} />
      <DateField
        label="Opens"
        value={form.startsOn}
        onChange={set('startsOn')}
        error={errorOf('startsOn')}
      />
      <DateField
        label="Closes"
        value={form.endsOn}
        onChange={set('endsOn')}
        error={errorOf('endsOn')}
      />
      <TextField
        label="Hours open a day"
        inputMode="decimal"
        value={form.hoursPerDay}
        onChange={set('hoursPerDay')}
        error={errorOf('hoursPerDay')}
      />
      <TextField
        label="Maximum illuminance (lx), as proposed"
        inputMode="decimal"
        value={form.maxLux}
        onChange={set('maxLux')}
        error={errorOf('maxLux')}
        hint="A conservator confirms and signs the conditions."
      />
      <TextArea
        label="Accession numbers of the prints, one a line"
        value={form.numbers}
        onChange={set('numbers')}
        rows={4}
        className="sm:col-span-2"
      />
      <div className="sm:col-span-2">
        <Button type="submit" tone="primary" disabled={create.isPending}>
          Plan it
        </Button>
      </div>
      <ErrorNotice
        error={lookupError ?? (errors.length ? null : create.error)}
        className="sm:col-span-2"
      />
    </form>
  );
}
