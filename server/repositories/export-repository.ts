import { Paper, Print } from '../models';

/** One live print with its paper, as the linked-data and manifest documents need it. */
export function findPrintWithPaper(id: number) {
  return Print.findByPk(id, { include: [{ model: Paper, as: 'paper' }] });
}

/** Every live print with its paper, by accession number. */
export function findAllPrintsWithPaper() {
  return Print.findAll({
    include: [{ model: Paper, as: 'paper' }],
    order: [['accessionNumber', 'ASC']],
  });
}

/** One live print without its links. */
export function findPrintById(id: number) {
  return Print.findByPk(id);
}
