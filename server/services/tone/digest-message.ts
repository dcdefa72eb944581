import type { AlertView } from '../../../shared/types/tone';
import { formatCount } from '../../../shared/domain/format';

export interface DueCheck {
  accessionNumber: string;
  title: string;
  nextCheckDue: string;
  status: string;
}

/** A place's alert as the digest lists it. */
export interface PlaceAlertLine {
  place: { code: string; name: string };
  reason: string;
}

export interface DigestInput {
  today: string;
  alerts: readonly AlertView[];
  /** Places outside their storage band since the last digest (issue 17). */
  placeAlerts?: readonly PlaceAlertLine[];
  due: readonly DueCheck[];
  appUrl: string;
}

const escape = (text: string) =>
  text.replace(/[&<>"]/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;' })[c]!);

/** The weekly tone-watch digest: new alerts and checks due, as plain text and HTML. */
export function buildDigest(input: DigestInput): { subject: string; text: string; html: string } {
  const { today, alerts, due, appUrl } = input;
  const placeAlerts = input.placeAlerts ?? [];
  const overdue = due.filter((d) => d.nextCheckDue < today).length;
  const places = placeAlerts.length ? `, ${formatCount(placeAlerts.length, 'place alert')}` : '';
  const subject = `Printwarden tone watch: ${formatCount(alerts.length, 'new alert')}, ${formatCount(due.length, 'check')} due${places}`;
  const placeLines = placeAlerts.map((a) => `- ${a.place.code} ${a.place.name}: ${a.reason}`);
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
    `Places outside their storage band (${placeAlerts.length}):`,
    ...(placeLines.length ? placeLines : ['- none']),
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
    `<h2>Places outside their storage band (${placeAlerts.length})</h2>`,
    list(placeLines),
    `<p><a href="${escape(appUrl)}/tone-watch">Open the tone watch</a></p>`,
  ].join('\n');
  return { subject, text, html };
}
