import type { OutboxMessageView, QueuedMailView } from '../../shared/types/mail';
import type { OutboxMessage, QueuedMail } from '../models';

const split = (recipients: string) => recipients.split(', ').filter(Boolean);

export function presentOutboxMessage(message: OutboxMessage): OutboxMessageView {
  return {
    id: message.id,
    to: split(message.recipients),
    subject: message.subject,
    text: message.textBody,
    html: message.htmlBody,
    sentAt: message.sentAt.toISOString(),
  };
}

export function presentQueuedMail(mail: QueuedMail): QueuedMailView {
  return {
    id: mail.id,
    to: split(mail.recipients),
    subject: mail.subject,
    status: mail.status,
    attempts: mail.attempts,
    lastError: mail.lastError,
    nextAttemptAt: mail.nextAttemptAt.toISOString(),
    createdAt: mail.createdAt.toISOString(),
  };
}
