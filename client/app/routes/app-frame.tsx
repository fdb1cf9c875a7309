import { Navigate, Outlet, useLocation, useNavigate } from 'react-router-dom';
import { ROLE_LABELS } from '../../../shared/domain/roles';
import type { Me } from '../../../shared/schemas/auth';
import { Badge } from '../../components/ui/badge';
import { Button } from '../../components/ui/button';
import { Icon } from '../../components/ui/icon';
import { Logo } from '../../components/ui/logo';
import { QueryError } from '../../components/ui/query-error';
import { useMe } from '../../features/auth/api/me';
import { useSignOut } from '../../features/auth/api/sign-out';
import { signInPathFor } from '../../features/auth/model/safe-next-path';
import { useServerConfig } from '../../features/dev-inbox/api/server-config';
import { isUnauthenticated } from '../../lib/api-error';
import { errorMessage } from '../../lib/form-errors';
import { FullPageLoading } from '../full-page-loading';
import { MainNav } from '../main-nav';

function TeamChip({ me }: { me: Me }) {
  return (
    <div className="rounded-lg bg-asphalt-850 px-3 py-2.5 ring-1 ring-asphalt-750">
      <p className="num text-sm font-semibold text-signal-300">{me.team.number}</p>
      <p className="truncate text-[0.9375rem] font-semibold text-asphalt-100">{me.team.name}</p>
    </div>
  );
}

function SignedInAs({ me }: { me: Me }) {
  const navigate = useNavigate();
  const signOut = useSignOut();
  return (
    <div className="flex items-center gap-3">
      {signOut.isError && (
        <span role="alert" className="text-sm text-stop">
          {errorMessage(signOut.error)}
        </span>
      )}
      <div className="text-right leading-tight">
        <p className="font-semibold text-asphalt-100">{me.user.name}</p>
        <p className="text-sm text-asphalt-400">{me.user.email}</p>
      </div>
      <Badge tone={me.role === 'lead' ? 'signal' : 'neutral'}>{ROLE_LABELS[me.role]}</Badge>
      <Button
        size="sm"
        variant="ghost"
        isPending={signOut.isPending}
        onClick={() => signOut.mutate(undefined, { onSuccess: () => navigate('/sign-in', { replace: true }) })}
      >
        {!signOut.isPending && <Icon name="signOut" className="size-4" />}
        Sign out
      </Button>
    </div>
  );
}

export function Component() {
  const me = useMe();
  const config = useServerConfig();
  const location = useLocation();

  if (me.isPending) return <FullPageLoading />;
  if (me.isError) {
    if (isUnauthenticated(me.error)) return <Navigate to={signInPathFor(location.pathname, location.search)} replace />;
    return (
      <main className="mx-auto grid min-h-dvh max-w-lg place-items-center p-6">
        <QueryError title="Pitwall couldn’t load your team" error={me.error} onRetry={() => me.refetch()} isRetrying={me.isFetching} />
      </main>
    );
  }

  const hasDevInbox = config.data?.devInbox ?? false;
  return (
    <div className="flex min-h-dvh">
      <a
        href="#main"
        className="sr-only z-50 rounded-lg bg-signal-500 px-4 py-3 font-semibold text-asphalt-950 focus:not-sr-only focus:fixed focus:top-3 focus:left-3"
      >
        Skip to content
      </a>
      <aside className="sticky top-0 hidden h-dvh w-64 shrink-0 flex-col gap-5 border-r border-asphalt-800 bg-asphalt-900 px-3 py-5 lg:flex">
        <div className="px-2">
          <Logo />
        </div>
        <TeamChip me={me.data} />
        <div className="min-h-0 flex-1 overflow-y-auto">
          <MainNav role={me.data.role} hasDevInbox={hasDevInbox} />
        </div>
        {config.data && <p className="num px-3 text-2xs text-asphalt-500">Pitwall {config.data.version}</p>}
      </aside>
      <div className="flex min-w-0 flex-1 flex-col">
        <header className="sticky top-0 z-10 border-b border-asphalt-800 bg-asphalt-950/90 backdrop-blur">
          <div className="flex min-h-16 items-center justify-between gap-4 px-4 lg:px-8">
            <div className="flex min-w-0 items-center gap-3 lg:hidden">
              <Logo />
              <span className="truncate text-sm text-asphalt-300">
                <span className="num text-signal-300">{me.data.team.number}</span> {me.data.team.name}
              </span>
            </div>
            <div className="hidden lg:block" />
            <SignedInAs me={me.data} />
          </div>
          <div className="lg:hidden">
            <MainNav role={me.data.role} hasDevInbox={hasDevInbox} isCompact />
          </div>
        </header>
        <main id="main" tabIndex={-1} className="w-full max-w-6xl flex-1 px-4 py-8 outline-none lg:px-10">
          <Outlet />
        </main>
      </div>
    </div>
  );
}
