import { Op, type Transaction } from 'sequelize';
import { Checklist, Print } from '../models';

export function findChecklistById(id: number, transaction?: Transaction) {
  return Checklist.findByPk(id, { transaction });
}

/** Every checklist, most recently changed first. */
export function findAllChecklists() {
  return Checklist.findAll({ order: [['updatedAt', 'DESC']] });
}

export function insertChecklist(
  values: { name: string; printIds: number[]; createdBy: number },
  transaction: Transaction,
) {
  return Checklist.create(values, { transaction });
}

export function updateChecklistRow(
  checklist: Checklist,
  values: { name?: string; printIds?: number[] },
  transaction: Transaction,
) {
  return checklist.update(values, { transaction });
}

export async function deleteChecklistRow(checklist: Checklist): Promise<void> {
  await checklist.destroy();
}

/** Which of `ids` are prints, deleted ones included (they may stay on a list). */
export async function existingPrintIds(
  ids: readonly number[],
  transaction: Transaction,
): Promise<Set<number>> {
  const found = await Print.findAll({
    where: { id: { [Op.in]: [...ids] } },
    attributes: ['id'],
    paranoid: false,
    transaction,
  });
  return new Set(found.map((print) => print.id));
}
