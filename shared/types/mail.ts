/** A message the built-in mail server received (GET /api/outbox). */
export interface OutboxMessageView {
  id: number;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  sentAt: string;
}

/** A message still waiting to go out, or given up on. */
export interface QueuedMailView {
  id: number;
  to: string[];
  subject: string;
  status: 'pending' | 'sent' | 'failed';
  attempts: number;
  lastError: string | null;
  nextAttemptAt: string;
  createdAt: string;
}

export interface OutboxResponse {
  messages: OutboxMessageView[];
  /** Pending and failed messages of the send queue, so no failure goes unseen. */
  queue: QueuedMailView[];
}
