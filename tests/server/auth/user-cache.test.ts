import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { UserCache } from '../../../server/auth/user-cache';
import { User } from '../../../server/models';
import { startTestApp, type TestApp } from '../../support/test-app';

let t: TestApp;
let cache: UserCache;
let id: number;
beforeAll(async () => {
  t = await startTestApp();
  cache = new UserCache();
  id = (await User.findOne({ where: { email: 'curator@test.example' } }))!.id;
});
afterAll(() => t.close());

describe('the signed-in user cache', () => {
  it('answers from memory until the row changes, then reads the change', async () => {
    expect((await cache.find(id))?.role).toBe('curator');
    // A change that bypasses the model would not be seen: the cache holds the first read.
    await t.ctx.sequelize.query("UPDATE users SET name = 'Behind its back' WHERE id = ?", {
      replacements: [id],
    });
    expect((await cache.find(id))?.name).not.toBe('Behind its back');

    await t.ctx.sequelize.transaction(async (transaction) => {
      const user = (await User.findByPk(id, { transaction }))!;
      await user.update({ role: 'conservator' }, { transaction });
    });
    const changed = await cache.find(id);
    expect(changed?.role).toBe('conservator');
    expect(changed?.name).toBe('Behind its back');

    await User.update({ active: false }, { where: { id } });
    expect((await cache.find(id))?.active).toBe(false);
  });

  it('gives each caller its own instance', async () => {
    const first = (await cache.find(id))!;
    first.set('role', 'admin');
    expect((await cache.find(id))?.role).not.toBe('admin');
  });
});
