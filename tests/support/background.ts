import { setTimeout as sleep } from 'node:timers/promises';
import { Op } from 'sequelize';
import type { AppContext } from '../../server/context';
import { FixityCheck, ImportJob } from '../../server/models';
import { mailSettled } from './mail';

/**
 * Waits until the work an accepted request left running in the background has finished:
 * mail delivery, image derivatives, tone re-evaluation, fixity runs and imports. Tests that
 * compare the database before and after a refused request call it first, so they see only
 * that request's effect.
 */
export async function backgroundSettled(ctx: AppContext): Promise<void> {
  for (let attempt = 0; attempt < 400; attempt += 1) {
    await mailSettled(ctx);
    await ctx.images.jobs.idle();
    await ctx.toneReevaluation.idle();
    const running =
      (await FixityCheck.count({ where: { status: 'running' } })) +
      (await ImportJob.count({ where: { status: { [Op.in]: ['queued', 'running'] } } }));
    if (running === 0) return;
    await sleep(25);
  }
  throw new Error('background work did not finish within 10 s');
}
