import type { Transaction } from 'sequelize';
import type { Role } from '../../../shared/domain/roles';
import type { AppContext } from '../../context';
import { writeTransaction } from '../../db/write-transaction';
import { hashPassword } from '../../auth/password';
import { problems } from '../../middleware/problem';
import type { Invitation, User } from '../../models';
import {
  findInvitationById,
  findOpenInvitationByToken,
  findRecentInvitations,
  insertInvitation,
  revokeOpenInvitationsTo,
  updateInvitationRow,
} from '../../repositories/invitation-repository';
import { findUserByEmail, insertUser } from '../../repositories/user-repository';
import { presentInvitation, presentUser } from '../../presenters/people';
import { recordAudit } from '../audit';
import { invitationMessage } from './messages';
import { INVITATION_DAYS, hashToken, newToken } from './tokens';

const DAY_MS = 24 * 3600 * 1000;

interface Caller {
  ctx: AppContext;
  user: User;
  /** Origin for the e-mailed link, e.g. `https://archive.example.org`. */
  origin: string;
}

async function mailInvitation(
  caller: Caller,
  invitation: Invitation,
  token: string,
  transaction: Transaction,
) {
  const link = `${caller.origin}/accept-invitation#${token}`;
  await caller.ctx.mailer.send(
    invitationMessage({
      to: invitation.email,
      role: invitation.role,
      invitedBy: caller.user.name,
      link,
      days: INVITATION_DAYS,
    }),
    { transaction },
  );
}

/** Invites an address with a role; earlier open invitations to it stop working. */
export async function inviteUser(caller: Caller, input: { email: string; role: Role }) {
  return writeTransaction(caller.ctx.sequelize, async (transaction) => {
    if (await findUserByEmail(input.email, { transaction })) {
      throw problems.conflict('This address already has an account.', [
        { path: 'email', message: 'Already has an account' },
      ]);
    }
    const now = new Date();
    await revokeOpenInvitationsTo(input.email, now, transaction);
    const { token, hash } = newToken();
    const invitation = await insertInvitation(
      {
        email: input.email,
        role: input.role,
        tokenHash: hash,
        invitedBy: caller.user.id,
        expiresAt: new Date(now.getTime() + INVITATION_DAYS * DAY_MS),
      },
      transaction,
    );
    const after = presentInvitation(invitation);
    await recordAudit(
      { user: caller.user, action: 'create', entity: 'invitation', entityId: invitation.id, after },
      transaction,
    );
    await mailInvitation(caller, invitation, token, transaction);
    return after;
  });
}

async function openInvitation(id: number, transaction: Transaction): Promise<Invitation> {
  const invitation = await findInvitationById(id, transaction);
  if (!invitation) throw problems.notFound('The invitation');
  if (invitation.acceptedAt || invitation.revokedAt) {
    throw problems.conflict('This invitation was already accepted or revoked.');
  }
  return invitation;
}

/** Sends a fresh link (the old one stops working) valid for another seven days. */
export async function resendInvitation(caller: Caller, id: number) {
  return writeTransaction(caller.ctx.sequelize, async (transaction) => {
    const invitation = await openInvitation(id, transaction);
    const { token, hash } = newToken();
    await updateInvitationRow(
      invitation,
      { tokenHash: hash, expiresAt: new Date(Date.now() + INVITATION_DAYS * DAY_MS) },
      transaction,
    );
    await mailInvitation(caller, invitation, token, transaction);
    const after = presentInvitation(invitation);
    await recordAudit(
      { user: caller.user, action: 'update', entity: 'invitation', entityId: id, after },
      transaction,
    );
    return after;
  });
}

export async function revokeInvitation(ctx: AppContext, user: User, id: number): Promise<void> {
  await writeTransaction(ctx.sequelize, async (transaction) => {
    const invitation = await openInvitation(id, transaction);
    const before = presentInvitation(invitation);
    await updateInvitationRow(invitation, { revokedAt: new Date() }, transaction);
    await recordAudit(
      { user, action: 'delete', entity: 'invitation', entityId: id, before },
      transaction,
    );
  });
}

/** The invitation a token opens, if it is still open; otherwise 404 (never says why). */
export async function findOpenInvitation(token: string, transaction?: Transaction) {
  const invitation = await findOpenInvitationByToken(hashToken(token), new Date(), transaction);
  if (!invitation) throw problems.notFound('This invitation link is not valid any more: it');
  return invitation;
}

/** Creates the account the invitation names; the token then stops working. */
export async function acceptInvitation(
  ctx: AppContext,
  token: string,
  input: { name: string; password: string },
) {
  // Check the token before the costly hashing, so a stream of bad tokens costs little.
  await findOpenInvitation(token);
  const passwordHash = await hashPassword(input.password, ctx.config.passwordCost);
  return writeTransaction(ctx.sequelize, async (transaction) => {
    const invitation = await findOpenInvitation(token, transaction);
    if (await findUserByEmail(invitation.email, { transaction })) {
      throw problems.conflict('This address already has an account.');
    }
    const user = await insertUser(
      { email: invitation.email, name: input.name, role: invitation.role, passwordHash },
      transaction,
    );
    await updateInvitationRow(invitation, { acceptedAt: new Date() }, transaction);
    const after = presentUser(user);
    await recordAudit(
      { user, action: 'create', entity: 'user', entityId: user.id, after },
      transaction,
    );
    return after;
  });
}

/** Newest first; accepted and revoked ones stay listed for the record. */
export async function listInvitations() {
  const invitations = await findRecentInvitations(200);
  return invitations.map(presentInvitation);
}
