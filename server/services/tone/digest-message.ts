import type { AlertView } from '../../../shared/types/tone';
import { formatCount } from '../../../shared/domain/format';

export interface DueCheck {
  accessionNumber: string;
  title: string;
  nextCheckDue: string;
  status: string;
}

export interface DigestInput {
  today: string;
  alerts: readonly AlertView[];
  due: readonly DueCheck[];
  appUrl: string;
}

const escape = (text: string) =>
  text.replace(/[&<>"]/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;' })[c]!);

/** The weekly tone-watch digest: new alerts and checks due, as plain text and HTML. */
export function buildDigest(input: DigestInput): { subject: string; text: string; html: string } {
  const { today, alerts, due, appUrl } = input;
  const overdue = due.filter((d) => d.nextCheckDue < today).length;
  const subject = `Printwarden tone watch: ${formatCount(alerts.length, 'new alert')}, ${formatCount(due.length, 'check')} due`;
  const alertLines = alerts.map(
    (a) => `- ${a.print.accessionNumber} ${a.print.title}: ${a.reason}`,
  );
  const dueLines = due.map(
    (d) =>
      `- ${d.accessionNumber} ${d.title}: due ${d.nextCheckDue}${d.nextCheckDue < today ? ' (overdue)' : ''}, ${d.status}`,
  );
  const text = [
    `Tone watch digest for ${today}.`,
    '',
    `New alerts (${alerts.length}):`,
    ...(alertLines.length ? alertLines : ['- none']),
    '',
    `Checks due in the next 30 days (${due.length}, ${overdue} overdue):`,
    ...(dueLines.length ? dueLines : ['- none']),
    '',
    `Open the tone watch: ${appUrl}/tone-watch`,
  ].join('\n');
  const list = (items: string[]) =>
    items.length
      ? `<ul>${items.map((item) => `<li>${escape(item.slice(2))}</li>`).join('')}</ul>`
      : '<p>None.</p>';
  const html = [
    `<p>Tone watch digest for ${escape(today)}.</p>`,
    `<h2>New alerts (${alerts.length})</h2>`,
    list(alertLines),
    `<h2>Checks due in the next 30 days (${due.length}, ${overdue} overdue)</h2>`,
    list(dueLines),
    `<p><a href="${escape(appUrl)}/tone-watch">Open the tone watch</a></p>`,
  ].join('\n');
  return { subject, text, html };
}
