import { describe, expect, it } from 'vitest';
import { createLogger } from '../../../../server/logging/logger';
import { BackgroundWork } from '../../../../server/services/background';
import { InProcessQueue } from '../../../../server/services/jobs/in-process-queue';

describe('the in-process job queue (one instance, SQLite)', () => {
  it('queues a keyed job once while one with the same key has not finished', async () => {
    const background = new BackgroundWork();
    const queue = new InProcessQueue(background, createLogger('silent'));
    const taken: string[] = [];
    let release!: () => void;
    const held = new Promise<void>((resolve) => (release = resolve));
    await queue.handle('image-derivatives', async ({ sha256 }) => {
      taken.push(String(sha256));
      await held;
    });
    await queue.send('image-derivatives', { sha256: 'aa' }, 'aa');
    await queue.send('image-derivatives', { sha256: 'aa' }, 'aa');
    await queue.send('image-derivatives', { sha256: 'bb' }, 'bb');
    expect(taken).toEqual(['aa', 'bb']);
    release();
    // Once it has finished, the same original may be asked for again (a new upload of it).
    await expect
      .poll(async () => {
        await queue.send('image-derivatives', { sha256: 'aa' }, 'aa');
        return taken.length;
      })
      .toBe(3);
    expect(taken).toEqual(['aa', 'bb', 'aa']);
    expect(await background.stop(10_000)).toBe(true);
  });
});
