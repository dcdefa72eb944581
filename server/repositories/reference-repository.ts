import type { Model, ModelStatic, Order, Transaction } from 'sequelize';
import { Location, Negative, Paper, SolutionBatch } from '../models';

/** The storage of one list the catalogue links to (papers, negatives, places, batches). */
export interface ReferenceStore<R> {
  list(transaction?: Transaction): Promise<R[]>;
  find(id: number, transaction?: Transaction): Promise<R | null>;
  create(input: Record<string, unknown>, transaction: Transaction): Promise<R>;
  update(record: R, input: Record<string, unknown>, transaction: Transaction): Promise<R>;
  destroy(record: R, transaction: Transaction): Promise<void>;
  idOf(record: R): number;
}

function storeOf<M extends Model>(model: ModelStatic<M>, order: Order): ReferenceStore<M> {
  return {
    list: (transaction) => model.findAll({ order, transaction }),
    find: (id, transaction) => model.findByPk(id, { transaction }),
    create: (input, transaction) =>
      model.create(input as M['_creationAttributes'], { transaction }),
    update: (record, input, transaction) => record.update(input, { transaction }),
    destroy: async (record, transaction) => {
      await record.destroy({ transaction });
    },
    idOf: (record) => record.get('id') as number,
  };
}

export const paperStore = storeOf(Paper, [['name', 'ASC']]);
export const negativeStore = storeOf(Negative, [['code', 'ASC']]);
export const solutionBatchStore = storeOf(SolutionBatch, [['code', 'ASC']]);
export const locationStore = storeOf(Location, [['code', 'ASC']]);
