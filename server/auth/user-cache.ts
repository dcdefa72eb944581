import type { InferAttributes, Transaction } from 'sequelize';
import { announceAccountsChanged, onAccountsChanged } from '../db/accounts-changed';
import { User } from '../models';

type UserRow = InferAttributes<User>;

const USER_HOOKS = [
  'afterSave',
  'afterDestroy',
  'afterBulkUpdate',
  'afterBulkDestroy',
  'afterBulkCreate',
] as const;

/**
 * Signed-in users by id, so a request does not read its user row again each time. Users
 * change rarely; any change to the users table through the model empties the cache, and
 * again once its transaction commits, so a request that read the row in between cannot
 * keep the old one; other instances on the database empty theirs at the commit
 * (`db/accounts-changed.ts`). (Deactivation also deletes the user's sessions.)
 */
export class UserCache {
  /** The row as read; each request gets its own instance built from it. */
  private readonly rows = new Map<number, Promise<UserRow | null>>();

  constructor() {
    const sequelize = User.sequelize!;
    // Hooks are re-registered by each app: Model.init (one per database) clears them.
    for (const hook of USER_HOOKS) {
      User.addHook(hook, async (...args: unknown[]) => {
        this.clear();
        const options = args.at(-1) as { transaction?: Transaction | null } | undefined;
        options?.transaction?.afterCommit(() => this.clear());
        // Every other instance drops its rows too, at the commit.
        await announceAccountsChanged(sequelize, undefined, options?.transaction);
      });
    }
    onAccountsChanged(sequelize, () => this.clear());
  }

  /** The user with this id, read once until the next change. */
  async find(id: number): Promise<User | null> {
    let row = this.rows.get(id);
    if (!row) {
      row = User.findByPk(id).then((user) => (user ? user.get({ plain: true }) : null));
      this.rows.set(id, row);
      // A failed read is not kept.
      row.catch(() => this.rows.delete(id));
    }
    const data = await row;
    // Its own instance per request: one request's unsaved change never reaches another.
    return data ? User.build(data, { isNewRecord: false, raw: true }) : null;
  }

  clear(): void {
    this.rows.clear();
  }
}
