import type { Transaction } from 'sequelize';
import type { Role } from '../../../shared/domain/roles';
import type { ChecklistCreate, ChecklistUpdate } from '../../../shared/schemas/saved-search';
import type { AppContext } from '../../context';
import { writeTransaction } from '../../db/write-transaction';
import { problems } from '../../middleware/problem';
import type { Checklist } from '../../models';
import { mayListDeletedPrints } from '../../policies/print';
import {
  deleteChecklistRow,
  existingPrintIds,
  findAllChecklists,
  findChecklistById,
  insertChecklist,
  updateChecklistRow,
} from '../../repositories/checklist-repository';
import { deletedPrintIds } from '../prints/list-prints';

export async function findChecklist(id: number, transaction?: Transaction): Promise<Checklist> {
  const checklist = await findChecklistById(id, transaction);
  if (!checklist) throw problems.notFound('The checklist');
  return checklist;
}

/** 422 naming the ids that are not prints (deleted prints may stay on a list). */
async function assertPrintsExist(ids: number[], transaction: Transaction): Promise<void> {
  const known = await existingPrintIds(ids, transaction);
  const missing = ids.filter((id) => !known.has(id));
  if (missing.length)
    throw problems.invalid([
      { path: 'printIds', message: `No print with id ${missing.join(', ')}` },
    ]);
}

/**
 * The checklists as the asker may read them: deleted prints stay on a list, but only roles
 * that see deleted prints find them there (in its ids, items and CSV).
 */
export async function asSeenBy<T extends Checklist | Checklist[]>(
  role: Role,
  found: T,
): Promise<T> {
  if (mayListDeletedPrints(role)) return found;
  const lists: Checklist[] = Array.isArray(found) ? found : [found];
  const deleted = await deletedPrintIds(lists.flatMap((list) => list.printIds));
  for (const list of lists) list.printIds = list.printIds.filter((id: number) => !deleted.has(id));
  return found;
}

/** Every checklist as the asker's role may read it. */
export async function listChecklists(role: Role): Promise<Checklist[]> {
  return asSeenBy(role, await findAllChecklists());
}

export function createChecklist(ctx: AppContext, input: ChecklistCreate, createdBy: number) {
  return writeTransaction(ctx.sequelize, async (transaction) => {
    await assertPrintsExist(input.printIds, transaction);
    return insertChecklist({ ...input, createdBy }, transaction);
  });
}

export function updateChecklist(ctx: AppContext, id: number, input: ChecklistUpdate) {
  return writeTransaction(ctx.sequelize, async (transaction) => {
    const found = await findChecklist(id, transaction);
    if (input.printIds) await assertPrintsExist(input.printIds, transaction);
    return updateChecklistRow(found, input, transaction);
  });
}

export async function deleteChecklist(id: number): Promise<void> {
  await deleteChecklistRow(await findChecklist(id));
}
