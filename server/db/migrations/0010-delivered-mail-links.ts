import { QueryTypes, type QueryInterface } from 'sequelize';
import { withoutOneTimeLinks } from '../../services/mail/one-time-links';

interface Row {
  id: number;
  text_body: string;
  html_body: string | null;
}

/**
 * Mail delivered before this change kept its one-time links (invitations, resets) in the
 * queue; delivered mail now keeps none, so take them out of the rows already sent.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  const rows = await qi.sequelize.query<Row>(
    "SELECT id, text_body, html_body FROM mail_queue WHERE status = 'sent'",
    { type: QueryTypes.SELECT },
  );
  for (const row of rows) {
    const text = withoutOneTimeLinks(row.text_body);
    const html = withoutOneTimeLinks(row.html_body);
    if (text === row.text_body && html === row.html_body) continue;
    await qi.sequelize.query('UPDATE mail_queue SET text_body = ?, html_body = ? WHERE id = ?', {
      replacements: [text, html, row.id],
    });
  }
}

/** The links are gone for good; nothing to put back. */
export async function down(): Promise<void> {}
