import { Link } from 'react-router-dom';
import { Badge } from '../../components/ui/badge';
import { Loading } from '../../components/ui/loading';
import { Logo } from '../../components/ui/logo';
import { Notice } from '../../components/ui/notice';
import { PageHeader } from '../../components/ui/page-header';
import { QueryError } from '../../components/ui/query-error';
import { useServerConfig } from '../../features/dev-inbox/api/server-config';
import { MailList } from '../../features/dev-inbox/components/mail-list';
import { TextLink } from '../text-link';

/** Open without signing in: the password-reset mail must be readable by someone who can't sign in. */
export function Component() {
  const config = useServerConfig();
  return (
    <div className="min-h-dvh">
      <header className="border-b border-asphalt-800 bg-asphalt-900">
        <div className="mx-auto flex min-h-16 max-w-4xl items-center justify-between gap-4 px-5">
          <Link to="/" aria-label="Pitwall team home" className="rounded-lg">
            <Logo />
          </Link>
          <TextLink to="/">Back to Pitwall</TextLink>
        </div>
      </header>
      <main className="mx-auto max-w-4xl px-5 py-8">
        <PageHeader
          eyebrow={<Badge tone="sky">Development server</Badge>}
          title="Dev inbox"
          description="This server doesn’t send real e-mail. Mails it would have sent — invites and password resets — are kept here instead, newest first."
        />
        {config.isPending && <Loading />}
        {config.isError && (
          <QueryError title="Couldn’t reach the server" error={config.error} onRetry={() => config.refetch()} isRetrying={config.isFetching} />
        )}
        {config.data?.devInbox === false && (
          <Notice tone="info" title="The dev inbox is off">
            This server sends real e-mail, so mails go to people’s own inboxes.
          </Notice>
        )}
        {config.data?.devInbox && <MailList />}
      </main>
    </div>
  );
}
