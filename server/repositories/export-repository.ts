import { Paper, Print, Source } from '../models';

const LINKED = [
  { model: Paper, as: 'paper' },
  { model: Source, as: 'source', attributes: ['id', 'name'] },
];

/** One live print with its paper (and source's name), as the linked-data and manifest documents need it. */
export function findPrintWithPaper(id: number) {
  return Print.findByPk(id, { include: LINKED });
}

/** Every live print with its paper, by accession number. */
export function findAllPrintsWithPaper() {
  return Print.findAll({
    include: LINKED,
    order: [['accessionNumber', 'ASC']],
  });
}

/** One live print without its links. */
export function findPrintById(id: number) {
  return Print.findByPk(id);
}
