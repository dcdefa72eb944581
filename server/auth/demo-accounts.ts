import type { Sequelize } from 'sequelize';
import { DEMO_USERS } from '../../seeds/demo-reference';
import { deleteSessionsOfEmails } from '../repositories/session-repository';
import { forgetReadSessions } from './session-store';
import {
  countUsersByEmails,
  findUsersByEmails,
  isUserNamedInRecords,
} from '../repositories/user-repository';

const DEMO_EMAILS: readonly string[] = DEMO_USERS.map((user) => user.email);

/** Whether an address (as typed at sign-in) is one of the demo's published accounts. */
export function isDemoEmail(email: string): boolean {
  return DEMO_EMAILS.includes(email.trim().toLowerCase());
}

/** How many demo accounts this database holds (a database once seeded as a demo). */
export function countDemoAccounts(): Promise<number> {
  return countUsersByEmails(DEMO_EMAILS);
}

/**
 * With the demo off, a demo account's published password must open nothing: its sessions
 * from an earlier demo run end now (sign-in refuses it separately).
 */
export async function endDemoSessions(sequelize: Sequelize): Promise<void> {
  await deleteSessionsOfEmails(sequelize, DEMO_EMAILS);
  await forgetReadSessions(sequelize);
}

/** What `--remove-demo` did: accounts deleted, and accounts kept as names only. */
export interface DemoRemoval {
  deleted: number;
  retired: number;
}

/**
 * Removes the demo accounts. One that nothing records is deleted. One that the audit trail
 * or a record names (who made a print, logged a check) is retired instead: it loses its
 * address, password and access but keeps its name, so the history still says who did what.
 */
export async function removeDemoAccounts(sequelize: Sequelize): Promise<DemoRemoval> {
  await endDemoSessions(sequelize);
  const removal: DemoRemoval = { deleted: 0, retired: 0 };
  for (const user of await findUsersByEmails(DEMO_EMAILS)) {
    if (await isUserNamedInRecords(sequelize, user.id)) {
      await user.update({
        email: `retired-demo-${user.id}@printwarden.invalid`,
        // Not a hash any scheme produces, so no password can match it.
        passwordHash: '!retired',
        active: false,
      });
      removal.retired += 1;
    } else {
      await user.destroy();
      removal.deleted += 1;
    }
  }
  return removal;
}
