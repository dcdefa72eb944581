import { Op, type Transaction } from 'sequelize';
import type { Role } from '../../shared/domain/roles';
import { Invitation } from '../models';

/** Stops every open invitation to an address. */
export async function revokeOpenInvitationsTo(
  email: string,
  at: Date,
  transaction: Transaction,
): Promise<void> {
  await Invitation.update(
    { revokedAt: at },
    { where: { email, acceptedAt: null, revokedAt: null }, transaction },
  );
}

export function insertInvitation(
  row: { email: string; role: Role; tokenHash: string; invitedBy: number; expiresAt: Date },
  transaction: Transaction,
) {
  return Invitation.create(row, { transaction });
}

export function findInvitationById(id: number, transaction?: Transaction) {
  return Invitation.findByPk(id, { transaction });
}

/** The invitation with this token hash that is neither accepted, revoked nor expired. */
export function findOpenInvitationByToken(tokenHash: string, now: Date, transaction?: Transaction) {
  return Invitation.findOne({
    where: { tokenHash, acceptedAt: null, revokedAt: null, expiresAt: { [Op.gt]: now } },
    transaction,
  });
}

export async function updateInvitationRow(
  invitation: Invitation,
  change: Partial<Pick<Invitation, 'tokenHash' | 'expiresAt' | 'revokedAt' | 'acceptedAt'>>,
  transaction: Transaction,
): Promise<void> {
  await invitation.update(change, { transaction });
}

/** The latest invitations, newest first. */
export function findRecentInvitations(limit: number) {
  return Invitation.findAll({ order: [['id', 'DESC']], limit });
}
