import type { Sequelize } from 'sequelize';
import { derivePrintFields } from '../shared/domain/print-derived';
import type { TimedStep } from '../shared/domain/processing';
import { PROCESSES } from '../shared/domain/vocabulary';
import { Paper, Print, ProcessingStep } from '../server/models';
import { seededRandom } from '../seeds/random';

const STEPS_PER_PRINT = 6;

/** Writes `count` prints with six steps each straight to the tables, in one transaction. */
export async function fillPrints(sequelize: Sequelize, count: number): Promise<void> {
  const rng = seededRandom(7);
  const papers = await Paper.bulkCreate(
    ['Rag 300', 'Rag 250', 'Writing 120', 'Kozo 45'].map((name) => ({ name })),
  );
  await sequelize.transaction(async (transaction) => {
    for (let start = 0; start < count; start += 1000) {
      const rows = [];
      const stepSets: TimedStep[][] = [];
      for (let i = start; i < Math.min(count, start + 1000); i += 1) {
        const steps = [
          { stage: 'salting' as const, minutes: 3 },
          { stage: 'sensitizing' as const, minutes: null },
          { stage: 'exposure' as const, minutes: rng.int(10, 60) },
          { stage: 'prewash' as const, minutes: 2 },
          { stage: 'fixing' as const, minutes: rng.int(3, 16) },
          { stage: 'washing' as const, minutes: rng.int(2, 40) },
        ];
        const process = rng.chance(0.7) ? 'salt print' : rng.pick(PROCESSES);
        const madeOn = `${rng.int(2015, 2026)}`;
        rows.push({
          accessionNumber: `${2015 + (i % 12)}.${String(i).padStart(5, '0')}`,
          title: `Bench print ${i} ${rng.pick(['weir', 'orchard', 'mill', 'lane', 'field'])}`,
          maker: rng.pick(['A. Maker', 'B. Maker', 'C. Maker']),
          madeOn,
          process,
          paperId: rng.pick(papers).id,
          status: 'in storage' as const,
          tags: [rng.pick(['river', 'winter', 'fog'])],
          ...derivePrintFields({ madeOn, process, processing: steps }),
        });
        stepSets.push(steps);
      }
      const created = await Print.bulkCreate(rows, { transaction });
      await ProcessingStep.bulkCreate(
        created.flatMap((print, index) =>
          stepSets[index]!.map((step, position) => ({
            ...step,
            printId: print.id,
            position: position + 1,
          })),
        ),
        { transaction },
      );
    }
  });
  if ((await ProcessingStep.count()) !== count * STEPS_PER_PRINT) throw new Error('fill failed');
}
