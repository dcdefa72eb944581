import { Router } from 'express';
import type { OutboxResponse } from '../../shared/types/mail';
import type { AppContext } from '../context';
import { requireAbility } from '../middleware/authorize';
import { HttpProblem } from '../middleware/problem';
import { presentOutboxMessage, presentQueuedMail } from '../presenters/mail';
import { readOutbox } from '../services/mail/outbox';

/** `/api/outbox`: what the built-in mail server received, and what has not gone out. */
export function outboxRouter(ctx: AppContext): Router {
  return Router().get('/', requireAbility('outbox:read'), async (_req, res) => {
    if (!ctx.mailer.usesLocalServer) {
      throw new HttpProblem(404, 'Not found', 'Mail goes to SMTP_URL; there is no local outbox.');
    }
    const { messages, queue } = await readOutbox();
    const body: OutboxResponse = {
      messages: messages.map(presentOutboxMessage),
      queue: queue.map(presentQueuedMail),
    };
    res.json(body);
  });
}
