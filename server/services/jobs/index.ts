import type { Sequelize } from 'sequelize';
import { dialectOf } from '../../db/dialect';
import type { Config } from '../../config';
import type { AppContext } from '../../context';
import type { Logger } from '../../logging/logger';
import type { BackgroundWork } from '../background';
import { findFixityCheckById } from '../../repositories/fixity-repository';
import { runFixityCheck } from '../fixity/run-fixity';
import { runQueuedImport } from '../imports/run-import';
import { sendToneDigest } from '../tone/digest';
import { InProcessQueue } from './in-process-queue';
import type { JobQueue } from './job-queue';
import { PgBossQueue } from './pg-boss-queue';

export type { JobQueue } from './job-queue';

/** pg-boss where several instances may share the database, this process otherwise. */
export async function openJobQueue(
  sequelize: Sequelize,
  config: Config,
  background: BackgroundWork,
  logger: Logger,
): Promise<JobQueue> {
  return dialectOf(sequelize).severalInstances
    ? PgBossQueue.start(config.databaseUrl, background, logger)
    : new InProcessQueue(background, logger);
}

/** How each kind of job is run here; every server instance takes every kind. */
export async function handleJobs(ctx: AppContext): Promise<void> {
  await ctx.jobs.handle('fixity-check', async ({ checkId }) => {
    const check = await findFixityCheckById(Number(checkId));
    if (!check || check.status !== 'running') return;
    await runFixityCheck(
      { sequelize: ctx.sequelize, storage: ctx.images.storage, background: ctx.background },
      check,
    );
  });
  // Its state is a database row: every job goes on from where the run's last range ended.
  await ctx.jobs.handle('tone-reevaluation', () => ctx.toneReevaluation.run());
  // Keyed by the original's SHA-256; the instance that takes it reads the original from storage.
  await ctx.jobs.handle('image-derivatives', ({ sha256 }) =>
    ctx.images.jobs.runJob(String(sha256)),
  );
  // The CSV waits in storage under imports/; any instance reads it from there.
  await ctx.jobs.handle('csv-import', ({ jobId }) => runQueuedImport(ctx, Number(jobId)));
  await ctx.jobs.handle('tone-digest', async () => {
    const result = await sendToneDigest(ctx);
    ctx.logger.info(result, 'tone digest sent');
  });
}
