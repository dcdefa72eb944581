import { roleCan, type Role } from '../../shared/domain/roles';
import type { LoanSummary, LoanView } from '../../shared/types/loan';
import type { LoanRow } from '../repositories/loan-repository';
import type { LoanRecord } from '../services/loans/loans';

const band = (min: number | null, max: number | null) =>
  min === null || max === null ? null : { min, max };

/** A loan as its asker may see it: viewers get no borrower contact and no place. */
export function presentLoan(record: LoanRecord, role: Role): LoanView {
  const { loan, prints, light } = record;
  const view: LoanView = {
    id: loan.id,
    title: loan.title,
    kind: loan.kind,
    venue: loan.venue,
    startsOn: loan.starts_on,
    endsOn: loan.ends_on,
    hoursPerDay: loan.hours_per_day,
    maxLux: loan.max_lux,
    maxUv: loan.max_uv,
    temperatureC: band(loan.temperature_min, loan.temperature_max),
    humidityPercent: band(loan.humidity_min, loan.humidity_max),
    stage: loan.stage,
    conditionsSigned: loan.conditions_signed_on
      ? {
          by: loan.conditions_signed_by
            ? { id: loan.conditions_signed_by, name: loan.signer_name ?? '' }
            : null,
          on: loan.conditions_signed_on,
        }
      : null,
    prints: prints.map((print) => ({
      id: print.print_id,
      accessionNumber: print.accession_number,
      title: print.title,
      process: print.process,
      sheetWidthMm: print.sheet_width_mm,
      sheetHeightMm: print.sheet_height_mm,
      departureReportId: print.departure_report_id,
      returnReportId: print.return_report_id,
      light: light.get(print.print_id)!,
    })),
    printsOverLimit: [...light.values()].filter((plan) => plan.excess.length > 0).length,
  };
  if (roleCan(role, 'loans:plan')) view.contact = loan.contact;
  if (roleCan(role, 'locations:read')) {
    view.awayPlace = loan.away_location_id
      ? { id: loan.away_location_id, code: loan.away_code ?? '' }
      : null;
  }
  return view;
}

export function presentLoanSummary(loan: LoanRow & { print_count: number }): LoanSummary {
  return {
    id: loan.id,
    title: loan.title,
    kind: loan.kind,
    venue: loan.venue,
    startsOn: loan.starts_on,
    endsOn: loan.ends_on,
    stage: loan.stage,
    prints: loan.print_count,
  };
}
