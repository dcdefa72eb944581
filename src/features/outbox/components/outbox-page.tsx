import { formatDateTime } from '@shared/domain/format';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { OutboxMessageView, QueuedMailView } from '@shared/types/mail';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { ApiError } from '@/lib/api-client';
import { outboxQueries } from '../api/outbox-queries';

const when = (iso: string) => formatDateTime(iso);

/** Turns the plain-text part's links into links, leaving the rest as text. */
function TextWithLinks({ text }: { text: string }) {
  const parts = text.split(/(https?:\/\/\S+)/g);
  return (
    <>
      {parts.map((part, index) =>
        /^https?:\/\//.test(part) ? (
          <a key={index} href={part} className="break-all underline">
            {part}
          </a>
        ) : (
          part
        ),
      )}
    </>
  );
}

function Message({ message }: { message: OutboxMessageView }) {
  const [open, setOpen] = useState(false);
  return (
    <li className="border-t border-paper-edge/70 first:border-t-0">
      <button
        type="button"
        aria-expanded={open}
        onClick={() => setOpen(!open)}
        className="flex w-full flex-wrap items-baseline gap-x-4 px-3 py-2 text-left hover:bg-paper-deep/60"
      >
        <span className="font-serif text-base">{message.subject}</span>
        <span className="text-sm text-ink-soft">to {message.to.join(', ')}</span>
        <span className="ml-auto text-xs whitespace-nowrap text-ink-faint">
          {when(message.sentAt)}
        </span>
      </button>
      {open && (
        <pre className="mx-3 mb-3 rounded border border-paper-edge bg-white p-3 font-sans text-sm whitespace-pre-wrap">
          <TextWithLinks text={message.text} />
        </pre>
      )}
    </li>
  );
}

function Undelivered({ queue }: { queue: QueuedMailView[] }) {
  if (queue.length === 0) return null;
  return (
    <section
      aria-labelledby="undelivered-heading"
      className="rounded border border-alert bg-alert-light p-3"
    >
      <h2 id="undelivered-heading" className="mb-2 text-xl text-alert">
        Not delivered yet
      </h2>
      <ul className="flex flex-col gap-1 text-sm">
        {queue.map((mail) => (
          <li key={mail.id}>
            <strong>{mail.status === 'failed' ? 'Failed' : 'Retrying'}</strong>: “{mail.subject}” to{' '}
            {mail.to.join(', ')} after {mail.attempts} attempt{mail.attempts === 1 ? '' : 's'}
            {mail.lastError ? ` (${mail.lastError})` : ''}
            {mail.status === 'pending' ? `; next try ${when(mail.nextAttemptAt)}` : ''}
          </li>
        ))}
      </ul>
    </section>
  );
}

/** Outbox (admin): mail the built-in mail server received, newest first. */
export function OutboxPage() {
  const outbox = useQuery(outboxQueries.list());
  const notLocal = outbox.error instanceof ApiError && outbox.error.status === 404;
  return (
    <>
      <PageHeader title="Outbox" eyebrow="Mail sent by Printwarden" />
      <p className="mb-4 max-w-prose text-sm text-ink-soft">
        With no mail service configured, Printwarden keeps what it sends here instead: invitations,
        password resets and notices. Open a message to read it and follow its link.
      </p>
      {outbox.isPending && <Loading />}
      {notLocal ? (
        <p className="text-sm">
          Mail goes to the configured mail service (SMTP_URL); there is no local outbox.
        </p>
      ) : (
        <ErrorNotice error={outbox.error} />
      )}
      {outbox.data && (
        <div className="flex flex-col gap-4">
          <Undelivered queue={outbox.data.queue} />
          {outbox.data.messages.length === 0 ? (
            <p className="text-sm text-ink-faint">No mail yet.</p>
          ) : (
            <ul aria-label="Messages" className="rounded border border-paper-edge bg-white/60">
              {outbox.data.messages.map((message) => (
                <Message key={message.id} message={message} />
              ))}
            </ul>
          )}
        </div>
      )}
    </>
  );
}
