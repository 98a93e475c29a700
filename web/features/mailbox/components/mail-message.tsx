import type { CaughtMail } from '#shared/schemas/mailbox';
import { formatDate } from '../../../lib/format-date';
import { linkSegments } from './link-segments';

export function MailMessage({ mail }: { mail: CaughtMail }) {
  const headingId = `mail-${mail.id}`;
  return (
    <article aria-labelledby={headingId} className="rounded-lg border border-rule bg-sheet px-6 py-5">
      <header className="flex flex-wrap items-baseline justify-between gap-x-6 gap-y-1 border-b border-rule pb-3">
        <h2 id={headingId} className="text-base font-bold">
          {mail.subject || '(no subject)'}
        </h2>
        <time dateTime={mail.receivedAt} className="text-xs text-ink-faint tabular-nums">
          {formatDate(mail.receivedAt)}
        </time>
        <p className="w-full text-sm text-ink-soft">
          To <span className="text-ink">{mail.to.join(', ')}</span> · from {mail.from}
        </p>
      </header>
      <p className="mt-4 font-serif text-sm leading-relaxed break-words whitespace-pre-wrap">
        {linkSegments(mail.text, mail.links).map((s, i) =>
          s.kind === 'text' ? (
            <span key={i}>{s.text}</span>
          ) : (
            <a key={i} href={s.href} className="break-all underline underline-offset-2">
              {s.href}
            </a>
          ),
        )}
      </p>
    </article>
  );
}
