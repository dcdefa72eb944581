import type { MailMessage } from '../mail';

const escapeHtml = (value: string) => value.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

function html(paragraphs: string[], link: { href: string; label: string }): string {
  const body = paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`).join('\n');
  return `<!doctype html><html><body style="font-family: Georgia, serif; color: #2b2118">
${body}
<p><a href="${escapeHtml(link.href)}">${escapeHtml(link.label)}</a></p>
<p style="color: #6b5d50; font-size: 0.9em">Printwarden</p>
</body></html>`;
}

/** The invitation: who invited, which role, the one-time link and how long it lasts. */
export function invitationMessage(input: {
  to: string;
  role: string;
  invitedBy: string;
  link: string;
  days: number;
}): MailMessage {
  const lines = [
    `${input.invitedBy} has invited you to the Printwarden catalogue as ${input.role}.`,
    `Open the link below to choose your name and password. It works once and for ${input.days} days.`,
    'If you did not expect this, ignore this message.',
  ];
  return {
    to: input.to,
    subject: 'Your invitation to Printwarden',
    text: `${lines.join('\n\n')}\n\n${input.link}\n`,
    html: html(lines, { href: input.link, label: 'Accept the invitation' }),
  };
}

/** The reset: the one-time link and how long it lasts. */
export function resetMessage(input: { to: string; link: string; minutes: number }): MailMessage {
  const lines = [
    'Someone asked to reset the password of your Printwarden account.',
    `Open the link below to choose a new one. It works once and for ${input.minutes} minutes.`,
    'If it was not you, ignore this message: your password stays as it is.',
  ];
  return {
    to: input.to,
    subject: 'Reset your Printwarden password',
    text: `${lines.join('\n\n')}\n\n${input.link}\n`,
    html: html(lines, { href: input.link, label: 'Choose a new password' }),
  };
}
