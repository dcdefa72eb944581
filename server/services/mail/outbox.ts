import { findOutboxMessages, findUndeliveredMail } from '../../repositories/mail-repository';

const SHOWN = 200;

/** What the built-in mail server received, and what has not gone out, newest first. */
export async function readOutbox() {
  const [messages, queue] = await Promise.all([
    findOutboxMessages(SHOWN),
    findUndeliveredMail(SHOWN),
  ]);
  return { messages, queue };
}
