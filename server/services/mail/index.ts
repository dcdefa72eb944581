import type { Sequelize } from 'sequelize';
import type { Config } from '../../config';
import type { Logger } from '../../logging/logger';
import { startLocalMailServer } from './local-mail-server';
import { Mailer } from './mailer';

export { Mailer, type MailMessage } from './mailer';

/** The app's mailer: to SMTP_URL when set, else to the built-in loopback server. */
export async function createMailer(
  config: Config,
  sequelize: Sequelize,
  logger: Logger,
): Promise<Mailer> {
  if (config.smtpUrl) {
    return new Mailer({ sequelize, smtpUrl: config.smtpUrl, from: config.mailFrom, logger });
  }
  const localServer = await startLocalMailServer(sequelize);
  return new Mailer({
    sequelize,
    smtpUrl: localServer.url,
    from: config.mailFrom,
    logger,
    localServer,
  });
}
