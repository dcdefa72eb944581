import { problems } from '../../middleware/problem';
import { findAssetsOfPrint } from '../../repositories/asset-repository';
import {
  findAllPrintsWithPaper,
  findPrintById,
  findPrintWithPaper,
} from '../../repositories/export-repository';
import { recordLinksOf } from './record-links';

/** One print with its paper and the links of its images, for its JSON-LD document. */
export async function printForLinkedData(id: number) {
  const print = await findPrintWithPaper(id);
  if (!print) throw problems.notFound('The print');
  const links = (await recordLinksOf([print.id])).get(print.id);
  return { print, links };
}

/** Every live print with its paper and image links, for the catalogue document. */
export async function catalogueForLinkedData() {
  const prints = await findAllPrintsWithPaper();
  const links = await recordLinksOf(prints.map((print) => print.id));
  return prints.map((print) => ({ print, links: links.get(print.id) }));
}

/** A print and its images, for its IIIF manifest. */
export async function printForManifest(id: number) {
  const print = await findPrintById(id);
  if (!print) throw problems.notFound('The print');
  return { print, assets: await findAssetsOfPrint(id) };
}
