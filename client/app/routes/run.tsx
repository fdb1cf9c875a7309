import { useEffect, useState } from 'react';
import { can } from '../../../shared/domain/roles';
import { useMe } from '../../features/auth/api/me';
import { signInPathFor } from '../../features/auth/model/safe-next-path';
import type { RunPanel } from '../../features/run/api/run-panel';
import { runPanelKey, usePublishedRunPanel, useRunPanel } from '../../features/run/api/run-panel';
import { useRunRelayWarmUp } from '../../features/run/hooks/run-relay';
import { useRunServiceWorker, type OfflineState } from '../../features/run/hooks/use-run-screen';
import { useSeasonProfile } from '../../components/panel-tiles/use-season-profile';
import { RunMessage } from '../../features/run/components/run-message';
import { RunScreen } from '../../features/run/components/run-screen';
import { isApiError } from '../../lib/api-error';
import { SafetyCaution } from '../safety-caution';

type Loaded = { isPending: boolean; isError: boolean; error: unknown; data: RunPanel | undefined; refetch: () => unknown; isFetching: boolean };

// No React Router here: run mode is its own light page (client/run.html, client/app/run-main.tsx) and also an
// in-app route of the full app, so it reads the address from `location` and leaves by plain links.

/** The panel id in `/panels/:id/run`, or undefined for any other address. */
export function runPanelIdFrom(pathname: string): string | undefined {
  const match = /^\/panels\/([^/]+)\/run\/?$/.exec(pathname);
  if (!match) return undefined;
  try {
    return decodeURIComponent(match[1]!);
  } catch {
    return undefined;
  }
}

/** The session ended: a full page load to sign-in, which comes back here afterwards. */
function SignInFirst({ backHref }: { backHref: string }) {
  useEffect(() => {
    window.location.replace(signInPathFor(window.location.pathname, window.location.search));
  }, []);
  return <RunMessage isBusy title="Opening sign-in…" backHref={backHref} />;
}

function RunGate({ query, backHref, offline }: { query: Loaded; backHref: string; offline?: OfflineState }) {
  // Ready for the first tap sooner: the relay link and the season profile (for the reef) start while the
  // panel itself loads, instead of after it.
  useRunRelayWarmUp();
  useSeasonProfile();
  if (query.isPending) return <RunMessage isBusy title="Opening the panel…" backHref={backHref} />;
  // A failed re-check keeps the panel that is running: only a first load that fails shows a message.
  if (!query.data) {
    const status = isApiError(query.error) ? query.error.status : 0;
    if (status === 401) return <SignInFirst backHref={backHref} />;
    if (status === 403) return <ForbiddenMessage backHref={backHref} />;
    if (status === 404)
      return (
        <RunMessage title="No panel is published yet" backHref={backHref}>
          The driver station runs the team’s published panel. Ask a programmer to publish one from Panels.
        </RunMessage>
      );
    return (
      <RunMessage
        tone="problem"
        title="The panel could not be loaded"
        backHref={backHref}
        action={
          <button type="button" onClick={() => query.refetch()} disabled={query.isFetching} className="inline-flex min-h-12 items-center rounded-lg bg-signal-500 px-5 text-lg font-bold text-asphalt-950 disabled:opacity-60">
            {query.isFetching ? 'Trying again…' : 'Try again'}
          </button>
        }
      >
        {query.error instanceof Error ? query.error.message : 'Pitwall could not reach its server.'} Check the cable to the driver-station laptop.
      </RunMessage>
    );
  }
  return <PinnedRunScreen latest={query.data} backHref={backHref} offline={offline} />;
}

/** Runs the version it opened with; a newer one the server reports is offered, and loaded only on a tap. */
function PinnedRunScreen({ latest, backHref, offline }: { latest: RunPanel; backHref: string; offline?: OfflineState }) {
  const [pinned, setPinned] = useState(latest);
  const newer = runPanelKey(latest) !== runPanelKey(pinned) ? latest : undefined;
  return (
    <RunScreen
      panel={pinned}
      caution={<SafetyCaution />}
      backHref={backHref}
      offline={offline}
      newerVersion={newer ? { versionNumber: newer.versionNumber, onLoad: () => setPinned(newer) } : undefined}
    />
  );
}

function ForbiddenMessage({ backHref }: { backHref: string }) {
  return (
    <RunMessage tone="problem" title="Run mode is for operators and programmers" backHref={backHref}>
      Your role can watch matches and recordings but cannot send targets to the robot. A team lead can change your role.
    </RunMessage>
  );
}

/** `/run`: the team's published panel, full screen at the driver station (works offline after the first load). */
export function Component() {
  const query = usePublishedRunPanel();
  const offline = useRunServiceWorker(query.isSuccess);
  return <RunGate query={query} backHref="/" offline={offline} />;
}

/** `/panels/:id/run`: that panel's published version, else its latest as a draft (programmers testing). */
export function PanelRunComponent({ panelId }: { panelId?: string }) {
  const id = panelId ?? runPanelIdFrom(window.location.pathname) ?? '';
  const me = useMe();
  const panel = useRunPanel(id);
  const backHref = `/panels/${id}/edit`;
  if (me.data && !can(me.data.role, 'panels.run')) return <ForbiddenMessage backHref="/" />;
  return <RunGate query={panel} backHref={backHref} />;
}
