import type { Sequelize } from 'sequelize';
import { PrintCreateSchema } from '../shared/schemas/print';
import {
  LocationSchema,
  NegativeSchema,
  PaperSchema,
  SolutionBatchSchema,
} from '../shared/schemas/reference';
import { hashPassword } from '../server/auth/password';
import { Location, Negative, Paper, Print, SolutionBatch, Source, User } from '../server/models';
import { SourceSchema } from '../shared/schemas/registrar';
import { updatePrint } from '../server/services/prints/change-print';
import { createPrint } from '../server/services/prints/create-print';
import type { BackgroundWork } from '../server/services/background';
import type { ImageServices } from '../server/services/images';
import type { PrintSearchIndex } from '../server/services/prints/search-index';
import {
  DEMO_BATCHES,
  DEMO_LOCATIONS,
  DEMO_NEGATIVES,
  DEMO_PAPERS,
  DEMO_PASSWORD,
  DEMO_USERS,
} from './demo-reference';
import { seedDemoImages } from './demo-assets';
import { demoCataloguedAt, demoPrints } from './demo-prints';
import { DEMO_SOURCES, demoRegistrar, demoVersoMarks, type DemoSourceKey } from './demo-registrar';
import { demoPlaceFactors, seedDemoEnvironment } from './demo-environment';
import { seedDemoToneHistories } from './demo-tone';
import { seededRandom } from './random';

/**
 * Seeds the demo collection into an empty database; does nothing when any user or print
 * exists, so running it twice changes nothing. Prints go through the same command as the
 * API, so derived fields and audit events are real.
 */
export async function seedDemo(
  app: {
    sequelize: Sequelize;
    searchIndex: PrintSearchIndex;
    images: ImageServices;
    background?: BackgroundWork;
  },
  /**
   * `images`: attach the generated scans and wait (`'await'`), attach them after returning
   * (`'background'`, so `npm start` listens at once), or not at all (the default, for tests).
   */
  options: { passwordCost?: number; images?: 'await' | 'background' | false } = {},
): Promise<{ users: number; prints: number } | null> {
  if ((await User.count()) > 0 || (await Print.count({ paranoid: false })) > 0) return null;
  const passwordHash = await hashPassword(DEMO_PASSWORD, options.passwordCost);
  const users = await User.bulkCreate(DEMO_USERS.map((user) => ({ ...user, passwordHash })));
  const archivist = users.find((user) => user.role === 'archivist')!;

  const papers = await Paper.bulkCreate(DEMO_PAPERS.map((paper) => PaperSchema.parse(paper)));
  const negatives = await Negative.bulkCreate(DEMO_NEGATIVES.map((n) => NegativeSchema.parse(n)));
  const batches = await SolutionBatch.bulkCreate(
    DEMO_BATCHES.map((b) => SolutionBatchSchema.parse(b)),
  );
  const placeIds = new Map<string, number>();
  for (const { parent, ...place } of DEMO_LOCATIONS) {
    const parentId = parent ? placeIds.get(parent) : null;
    const created = await Location.create(LocationSchema.parse({ ...place, parentId }));
    placeIds.set(created.code, created.id);
  }
  const leaves = ['SR-C1-D1', 'SR-C1-D2', 'SR-C1-D3', 'SR-C2-B1', 'SR-C2-B2', 'RR-W', 'LS'];

  const albumen = papers.find((paper) => paper.name.startsWith('Albumenised'))!;
  const prints = demoPrints(seededRandom(20260514), {
    papers: papers.filter((paper) => paper.id !== albumen.id).map((paper) => paper.id),
    albumenPaper: albumen.id,
    negatives: negatives.map((negative) => negative.id),
    places: leaves.map((code) => placeIds.get(code)!),
    batches: Object.fromEntries(batches.map((batch) => [batch.code, batch.id])),
  });
  const sources = await Source.bulkCreate(
    DEMO_SOURCES.map(({ key: _key, ...source }) => SourceSchema.parse(source)),
  );
  const sourceIds = Object.fromEntries(
    DEMO_SOURCES.map((source, i) => [source.key, sources[i]!.id]),
  ) as Record<DemoSourceKey, number>;
  const registrarRng = seededRandom(20190917);
  const ctx = { ...app, user: archivist };
  const printIds: number[] = [];
  for (const [index, print] of prints.entries()) {
    const body = { ...print, ...demoRegistrar(registrarRng, index, print, sourceIds) };
    printIds.push((await createPrint(ctx, PrintCreateSchema.parse(body))).print.id);
  }
  const cataloguedAt = demoCataloguedAt(prints.map((print) => print.accessionNumber ?? ''));
  for (const [index, id] of printIds.entries()) {
    await app.sequelize.query('UPDATE prints SET created_at = ? WHERE id = ?', {
      replacements: [cataloguedAt[index], id],
    });
  }
  // A verso photograph, once attached, carries the pencil marks it shows.
  const markVerso = async (printId: number, assetId: number, view: 'recto' | 'verso') => {
    if (view !== 'verso') return;
    const index = printIds.indexOf(printId);
    const stored = (await Print.findByPk(printId, { attributes: ['id', 'marks'] }))?.marks ?? [];
    const shown = demoVersoMarks(index, prints[index]!, assetId).filter((mark) => mark.area);
    const marks = stored.map(
      (mark) =>
        shown.find((s) => s.position === mark.position && s.transcription === mark.transcription) ??
        mark,
    );
    await updatePrint(ctx, printId, { marks });
  };
  if (options.images === 'await') await seedDemoImages(app, printIds, archivist, markVerso);
  if (options.images === 'background') {
    const attaching = seedDemoImages(app, printIds, archivist, markVerso);
    app.background?.track(attaching);
    void attaching.then(
      (count) => console.log(`Demo images attached: ${count}.`),
      (error: unknown) => console.error('Demo images could not be attached:', error),
    );
  }
  const conservator = users.find((user) => user.role === 'conservator')!;
  const factors = demoPlaceFactors(DEMO_LOCATIONS);
  const codeOf = new Map([...placeIds].map(([code, id]) => [id, code]));
  await seedDemoToneHistories(app.sequelize, conservator, seededRandom(20240302), (id) =>
    id === null ? 1 : (factors.get(codeOf.get(id) ?? '') ?? 1),
  );
  await seedDemoEnvironment(app.sequelize, placeIds, seededRandom(20251116));
  // Tone status reaches the search index through the "prints changed" event of each write.
  return { users: users.length, prints: prints.length };
}
