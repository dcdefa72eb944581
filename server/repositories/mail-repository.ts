import { Op, type Transaction } from 'sequelize';
import { OutboxMessage, QueuedMail } from '../models';

/** A message waiting in the queue, as the mailer writes it. */
export interface QueuedMailRow {
  recipients: string;
  subject: string;
  textBody: string;
  htmlBody: string;
  nextAttemptAt: Date;
}

export async function insertQueuedMail(
  row: QueuedMailRow,
  transaction: Transaction,
): Promise<void> {
  await QueuedMail.create(row, { transaction });
}

/** Pending messages whose next attempt is due, soonest first. */
export function findDueMail(now: Date, limit: number) {
  return QueuedMail.findAll({
    where: { status: 'pending', nextAttemptAt: { [Op.lte]: now } },
    order: [['nextAttemptAt', 'ASC']],
    limit,
  });
}

/**
 * Takes a due message for one delivery attempt: its next attempt moves to `until`, only if
 * it is still pending and due. True when this caller took it; another instance's pass that
 * read the same message finds it no longer due, so no message is sent twice.
 */
export async function claimMail(
  mail: QueuedMail,
  now: Date,
  until: Date,
  transaction: Transaction,
): Promise<boolean> {
  const [taken] = await QueuedMail.update(
    { nextAttemptAt: until },
    {
      where: { id: mail.id, status: 'pending', nextAttemptAt: { [Op.lte]: now } },
      transaction,
    },
  );
  return taken === 1;
}

export async function updateQueuedMail(
  mail: QueuedMail,
  change: Partial<QueuedMail>,
  transaction: Transaction,
): Promise<void> {
  await mail.update(change, { transaction });
}

/** Messages not (yet) delivered, newest first. */
export function findUndeliveredMail(limit: number) {
  return QueuedMail.findAll({
    where: { status: { [Op.ne]: 'sent' } },
    order: [['id', 'DESC']],
    limit,
  });
}

/** What the built-in mail server received, newest first. */
export function findOutboxMessages(limit: number) {
  return OutboxMessage.findAll({ order: [['id', 'DESC']], limit });
}

export async function insertOutboxMessage(
  row: {
    recipients: string;
    sender: string;
    subject: string;
    textBody: string;
    htmlBody: string | null;
    sentAt: Date;
  },
  transaction: Transaction,
): Promise<void> {
  await OutboxMessage.create(row, { transaction });
}
