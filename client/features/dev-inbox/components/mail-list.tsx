import { Link } from 'react-router-dom';
import type { DevMail } from '../../../../shared/schemas/team';
import { EmptyState } from '../../../components/ui/empty-state';
import { QueryGate } from '../../../components/ui/query-gate';
import { formatDateTime, formatRelative } from '../../../lib/format-time';
import { useDevMails } from '../api/mails';
import { localPath, splitMailText } from '../model/mail-text';

const linkClass = 'font-medium break-all text-signal-300 underline underline-offset-4 hover:text-signal-200';

function MailLink({ href }: { href: string }) {
  const path = localPath(href, window.location.origin);
  return path ? (
    <Link to={path} className={linkClass}>
      {href}
    </Link>
  ) : (
    <a href={href} className={linkClass} target="_blank" rel="noreferrer">
      {href}
    </a>
  );
}

function MailCard({ mail, now }: { mail: DevMail; now: number }) {
  const segments = splitMailText(mail.text, mail.links);
  return (
    <article aria-label={mail.subject} className="rounded-xl bg-asphalt-850 ring-1 ring-asphalt-750">
      <header className="flex flex-wrap items-start justify-between gap-3 border-b border-asphalt-750 px-5 py-4">
        <div className="min-w-0">
          <h2 className="text-lg font-semibold text-asphalt-100">{mail.subject || '(no subject)'}</h2>
          <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-3 text-sm">
            <dt className="text-asphalt-400">From</dt>
            <dd className="text-asphalt-200">{mail.from}</dd>
            <dt className="text-asphalt-400">To</dt>
            <dd className="text-asphalt-200">{mail.to.join(', ')}</dd>
          </dl>
        </div>
        <time dateTime={mail.receivedAt} title={formatDateTime(mail.receivedAt)} className="text-sm text-asphalt-400">
          {formatRelative(mail.receivedAt, now)}
        </time>
      </header>
      <div className="px-5 py-4">
        <p className="text-[0.9375rem] leading-relaxed whitespace-pre-wrap text-asphalt-200">
          {segments.map((s, i) => (s.kind === 'text' ? <span key={i}>{s.text}</span> : <MailLink key={i} href={s.href} />))}
        </p>
        {mail.links.length > 0 && (
          <nav aria-label={`Links in “${mail.subject}”`} className="mt-4 border-t border-asphalt-750 pt-3">
            <h3 className="text-xs font-semibold tracking-[0.14em] text-asphalt-400 uppercase">Links</h3>
            <ul className="mt-1 flex flex-col">
              {mail.links.map((href) => (
                <li key={href} className="flex min-h-11 items-center">
                  <MailLink href={href} />
                </li>
              ))}
            </ul>
          </nav>
        )}
      </div>
    </article>
  );
}

export function MailList() {
  const mails = useDevMails();
  const now = Date.now();
  return (
    <QueryGate query={mails} loadingLabel="Loading mails…" errorTitle="Couldn’t load the inbox">
      {(data) =>
        data.length === 0 ? (
          <EmptyState icon="inbox" title="No mail yet">
            Invites and password-reset mails sent by this server land here. This page checks for new ones every few
            seconds.
          </EmptyState>
        ) : (
          <div className="flex flex-col gap-4">
            {data.map((mail) => (
              <MailCard key={mail.id} mail={mail} now={now} />
            ))}
          </div>
        )
      }
    </QueryGate>
  );
}
