import type { Transaction } from 'sequelize';
import { impossibleDateMessage } from '../../../shared/domain/calendar';
import { formatCount, formatNumber } from '../../../shared/domain/format';
import { CgatsError, parseCgats, type CgatsFile } from '../../../shared/domain/tone/cgats';
import {
  checkDateProblem,
  FUTURE_DATE_MESSAGE,
  todayIso,
} from '../../../shared/domain/tone/check-date';
import type { Reading } from '../../../shared/domain/tone/comparison';
import { ReadingSchema, TONE_METHODS } from '../../../shared/schemas/tone';
import type { ImportResult } from '../../../shared/types/tone';
import { writeTransaction } from '../../db/write-transaction';
import { HttpProblem, problems } from '../../middleware/problem';
import { Print, ToneCheck, type User } from '../../models';
import { presentToneCheck } from '../../presenters/tone';
import { recordAudit } from '../audit';
import type { PrintCommandContext } from '../prints/print-command';
import { evaluatePrints, TONE_BATCH } from './evaluate-prints';
import { loadToneSettings } from './settings-store';

interface PlannedCheck {
  accessionNumber: string;
  checkedOn: string;
  method: (typeof TONE_METHODS)[number];
  instrument: string | null;
  readings: Reading[];
  /** The file line of each reading (same order), for skip messages. */
  lines: number[];
}

/** Rows read from one file at most; a round of a whole collection fits many times over. */
export const MAX_IMPORT_ROWS = 100_000;
/** Rows named in one skip message; the rest are counted. */
const LINES_NAMED = 10;

/** A date from `2026-06-01`, `2026-06-01T10:00`, or any form Date.parse reads. */
function isoDay(value: string | undefined): string | null {
  if (!value) return null;
  if (/^\d{4}-\d{2}-\d{2}/.test(value)) return value.slice(0, 10);
  const parsed = Date.parse(value);
  return Number.isNaN(parsed) ? null : new Date(parsed).toISOString().slice(0, 10);
}

/** Rows grouped into one planned check per print, day, method and instrument. */
export function planImport(file: CgatsFile): {
  plans: PlannedCheck[];
  skipped: ImportResult['skipped'];
} {
  const skipped: ImportResult['skipped'] = [];
  const plans = new Map<string, PlannedCheck>();
  const fileDay = isoDay(file.keywords.CREATED);
  for (const { line, values } of file.rows) {
    const skip = (reason: string) => skipped.push({ row: line, reason });
    const name = values.SAMPLE_NAME ?? values.SAMPLE_ID;
    const slash = name?.indexOf('/') ?? -1;
    if (!name || slash <= 0 || slash === name.length - 1) {
      skip('SAMPLE_NAME must read <accession number>/<patch>');
      continue;
    }
    const reading = ReadingSchema.safeParse({
      patch: name.slice(slash + 1),
      L: Number(values.LAB_L),
      a: Number(values.LAB_A),
      b: Number(values.LAB_B),
    });
    if (!reading.success) {
      skip(reading.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; '));
      continue;
    }
    const checkedOn = isoDay(values.checkedOn) ?? fileDay;
    if (!checkedOn) {
      skip('no date: give a checkedOn field or the CREATED keyword');
      continue;
    }
    const impossible = impossibleDateMessage(checkedOn);
    if (impossible) {
      skip(impossible);
      continue;
    }
    if (checkedOn > todayIso()) {
      skip(`${FUTURE_DATE_MESSAGE} (${checkedOn})`);
      continue;
    }
    const method = (values.method ?? 'spectrophotometer') as PlannedCheck['method'];
    if (!TONE_METHODS.includes(method)) {
      skip(`method must be one of ${TONE_METHODS.join(', ')}`);
      continue;
    }
    const accessionNumber = name.slice(0, slash);
    const instrument = values.instrument ?? file.keywords.INSTRUMENTATION ?? null;
    const key = [accessionNumber, checkedOn, method, instrument].join('\u0000');
    const plan = plans.get(key) ?? {
      accessionNumber,
      checkedOn,
      method,
      instrument,
      readings: [],
      lines: [],
    };
    if (plan.readings.some((r) => r.patch === reading.data.patch)) {
      skip(`patch ${reading.data.patch} of ${accessionNumber} appears twice for ${checkedOn}`);
      continue;
    }
    plan.readings.push(reading.data);
    plan.lines.push(line);
    plans.set(key, plan);
  }
  return { plans: [...plans.values()], skipped };
}

/** 413 for a file with more rows than one import reads, before any other work. */
function assertRowCount(file: CgatsFile): void {
  const rows = file.rows.length;
  if (rows <= MAX_IMPORT_ROWS) return;
  throw new HttpProblem(
    413,
    'Too many rows',
    `This file has ${formatNumber(rows)} rows; at most ${formatNumber(MAX_IMPORT_ROWS)} are read from one file. Split it and import the parts one after another.`,
  );
}

function readFile(text: string): CgatsFile {
  try {
    return parseCgats(text);
  } catch (error) {
    if (error instanceof CgatsError) {
      throw problems.invalid([{ path: `file.line.${error.line}`, message: error.message }]);
    }
    throw error;
  }
}

/** One skip per unknown print, naming its rows (grouped once, by accession number). */
function unknownPrintSkips(unknown: PlannedCheck[]): ImportResult['skipped'] {
  const lines = new Map<string, number[]>();
  for (const plan of unknown) {
    const list = lines.get(plan.accessionNumber) ?? [];
    list.push(...plan.lines);
    lines.set(plan.accessionNumber, list);
  }
  return [...lines].map(([accessionNumber, rows]) => {
    rows.sort((x, y) => x - y);
    const named = rows.slice(0, LINES_NAMED).join(', ');
    const more = rows.length > LINES_NAMED ? ` and ${rows.length - LINES_NAMED} more` : '';
    return {
      row: rows[0]!,
      reason: `no print with accession number ${accessionNumber} (${formatCount(rows.length, 'row')}: ${named}${more})`,
    };
  });
}

/** Reads a CGATS.17 file and creates its checks (or, on a dry run, only says what it would). */
export async function importCgats(
  ctx: Pick<PrintCommandContext, 'sequelize'> & { user: User },
  text: string,
  dryRun: boolean,
): Promise<ImportResult> {
  const file = readFile(text);
  assertRowCount(file);
  const { plans, skipped } = planImport(file);
  const result = await writeTransaction(ctx.sequelize, async (transaction) => {
    const numbers = [...new Set(plans.map((p) => p.accessionNumber))];
    const prints = await Print.findAll({
      where: { accessionNumber: numbers },
      attributes: ['id', 'accessionNumber', 'madeFrom'],
      transaction,
    });
    const idOf = new Map(prints.map((p) => [p.accessionNumber, p.id]));
    const madeFromOf = new Map(prints.map((p) => [p.id, p.madeFrom]));
    const stored = await storedPatches(
      prints.map((p) => p.id),
      transaction,
    );
    const warnings: string[] = [];
    const checks: ImportResult['checks'] = [];
    const unknown: PlannedCheck[] = [];
    const touched = new Set<number>();
    for (const plan of plans) {
      const printId = idOf.get(plan.accessionNumber);
      if (!printId) {
        unknown.push(plan);
        continue;
      }
      const dateProblem = checkDateProblem(plan.checkedOn, madeFromOf.get(printId) ?? null);
      if (dateProblem) {
        plan.lines.forEach((row) => skipped.push({ row, reason: dateProblem }));
        continue;
      }
      const repeated = dropStoredReadings(plan, stored.get(printId));
      for (const row of repeated)
        skipped.push({
          row: row.line,
          reason: `already stored: ${plan.accessionNumber}/${row.patch} checked on ${plan.checkedOn}`,
        });
      if (repeated.length > 0) warnings.push(alreadyImportedWarning(plan, repeated.length));
      if (plan.readings.length === 0) continue;
      rememberStored(stored, printId, plan);
      const summary = {
        printId,
        accessionNumber: plan.accessionNumber,
        checkedOn: plan.checkedOn,
        patches: plan.readings.map((r) => r.patch),
      };
      if (dryRun) {
        checks.push({ id: 0, ...summary });
        continue;
      }
      const { accessionNumber: _number, lines: _lines, ...fields } = plan;
      const check = await ToneCheck.create(
        {
          ...fields,
          printId,
          checkedBy: ctx.user.id,
          illuminant: 'D50',
          observer: '2',
          baseline: false,
          notes: 'Imported from a CGATS.17 file',
        },
        { transaction },
      );
      await recordAudit(
        {
          user: ctx.user,
          action: 'create',
          entity: 'tone-check',
          entityId: check.id,
          after: presentToneCheck(check),
        },
        transaction,
      );
      checks.push({ id: check.id, ...summary });
      touched.add(printId);
    }
    const settings = await loadToneSettings(transaction);
    const ids = [...touched];
    for (let start = 0; start < ids.length; start += TONE_BATCH) {
      const chunk = ids.slice(start, start + TONE_BATCH);
      await evaluatePrints(ctx.sequelize, settings, { ids: chunk }, transaction);
    }
    return { created: dryRun ? 0 : checks.length, checks, unknown, warnings };
  });
  // Skip messages are made after the write lock is released.
  const allSkipped = [...skipped, ...unknownPrintSkips(result.unknown)];
  allSkipped.sort((x, y) => x.row - y.row);
  return {
    created: result.created,
    checks: result.checks,
    skipped: allSkipped,
    warnings: result.warnings,
    dryRun,
  };
}

/** Per print: `checkedOn` → the patches already stored for that day. */
async function storedPatches(
  printIds: number[],
  transaction: Transaction,
): Promise<Map<number, Map<string, Set<string>>>> {
  const checks = await ToneCheck.findAll({
    where: { printId: printIds },
    attributes: ['printId', 'checkedOn', 'readings'],
    transaction,
  });
  const byPrint = new Map<number, Map<string, Set<string>>>();
  for (const check of checks) {
    const days = byPrint.get(check.printId) ?? new Map<string, Set<string>>();
    const patches = days.get(check.checkedOn) ?? new Set<string>();
    for (const reading of check.readings) patches.add(reading.patch);
    days.set(check.checkedOn, patches);
    byPrint.set(check.printId, days);
  }
  return byPrint;
}

/**
 * Takes out of the plan the readings whose print, day and patch are already stored (the
 * same file imported twice, or a day's readings logged by hand first); answers them.
 */
export function dropStoredReadings(
  plan: PlannedCheck,
  storedDays: Map<string, Set<string>> | undefined,
): Array<{ line: number; patch: string }> {
  const stored = storedDays?.get(plan.checkedOn);
  if (!stored) return [];
  const dropped: Array<{ line: number; patch: string }> = [];
  const keep = plan.readings.map((reading, i) => {
    if (!stored.has(reading.patch)) return true;
    dropped.push({ line: plan.lines[i]!, patch: reading.patch });
    return false;
  });
  plan.readings = plan.readings.filter((_r, i) => keep[i]);
  plan.lines = plan.lines.filter((_l, i) => keep[i]);
  return dropped;
}

/** Counts the plan's readings as stored, so a second plan of the same day does not repeat them. */
function rememberStored(
  stored: Map<number, Map<string, Set<string>>>,
  printId: number,
  plan: PlannedCheck,
): void {
  const days = stored.get(printId) ?? new Map<string, Set<string>>();
  const patches = days.get(plan.checkedOn) ?? new Set<string>();
  for (const reading of plan.readings) patches.add(reading.patch);
  days.set(plan.checkedOn, patches);
  stored.set(printId, days);
}

function alreadyImportedWarning(plan: PlannedCheck, count: number): string {
  return `${plan.accessionNumber}, ${plan.checkedOn}: ${formatCount(count, 'reading')} already stored, not imported again (was this file imported before?)`;
}
