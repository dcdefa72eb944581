import type { AddressInfo } from 'node:net';
import { simpleParser, type AddressObject } from 'mailparser';
import type { Sequelize } from 'sequelize';
import { SMTPServer } from 'smtp-server';
import { writeTransaction } from '../../db/write-transaction';
import { insertOutboxMessage } from '../../repositories/mail-repository';

/** Largest message the built-in server accepts; our own mail is a few kilobytes. */
const MAX_MESSAGE_BYTES = 2 * 1024 * 1024;

export interface LocalMailServer {
  /** `smtp://127.0.0.1:<port>` for nodemailer. */
  url: string;
  close: () => Promise<void>;
}

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const list = Array.isArray(field) ? field : field ? [field] : [];
  return list.flatMap((item) => item.value.map((one) => one.address ?? '')).filter(Boolean);
}

/**
 * The stand-in for a hosted mail service: an SMTP server on loopback, on a port of its
 * own choosing, that parses each message it receives and keeps it in `outbox_messages`.
 */
export async function startLocalMailServer(sequelize: Sequelize): Promise<LocalMailServer> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    size: MAX_MESSAGE_BYTES,
    logger: false,
    banner: 'Printwarden local mail',
    onData(stream, session, callback) {
      simpleParser(stream)
        .then(async (mail) => {
          const envelopeTo = session.envelope.rcptTo.map((rcpt) => rcpt.address);
          const to = addresses(mail.to);
          await writeTransaction(sequelize, (transaction) =>
            insertOutboxMessage(
              {
                recipients: (to.length ? to : envelopeTo).join(', '),
                sender: addresses(mail.from).join(', ') || String(session.envelope.mailFrom),
                subject: mail.subject ?? '',
                textBody: mail.text ?? '',
                htmlBody: typeof mail.html === 'string' ? mail.html : null,
                sentAt: new Date(),
              },
              transaction,
            ),
          );
        })
        .then(
          () => callback(),
          (error: Error) => callback(error),
        );
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => resolve());
  });
  const { port } = server.server.address() as AddressInfo;
  return {
    url: `smtp://127.0.0.1:${port}`,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
