import { ROLE_LABELS } from '../../../../shared/domain/roles';
import { Spinner } from '../../../components/ui/spinner';
import type { RelayState } from '../../../lib/relay-client';
import { cx } from '../../../lib/cx';
import { formatMs } from '../model/live-view';

type Look = { tone: 'go' | 'caution' | 'stop' | 'neutral'; title: string; body: string; todo?: string };

const RING = { go: 'ring-go/50 bg-go-950', caution: 'ring-signal-500/60 bg-signal-950', stop: 'ring-stop/60 bg-stop-950', neutral: 'ring-asphalt-600 bg-asphalt-850' };
const LAMP = { go: 'bg-go', caution: 'bg-signal-400', stop: 'bg-stop', neutral: 'bg-asphalt-500' };

const RECENT_STALE_MS = 15_000;

const roleText = (state: RelayState) =>
  state.welcome && state.welcome.role !== 'robot' ? ROLE_LABELS[state.welcome.role].toLowerCase() : 'member';

function look(state: RelayState, ownRttMs: number | null | undefined, localNowMs: number): Look {
  const wentQuiet = state.lastStale && localNowMs - state.lastStale.atMs < RECENT_STALE_MS;
  switch (state.status) {
    case 'open':
      return { tone: 'go', title: 'Connected to the relay', body: `Signed in as ${roleText(state)} · round trip to the relay ${formatMs(ownRttMs)}` };
    case 'stale':
      return {
        tone: 'stop',
        title: 'Link stale',
        body: `${state.detail}. Pitwall is dropping the link and connecting again.`,
        todo: 'Values on this page are not current. Do not rely on them until the link is back.',
      };
    case 'reconnecting':
      return {
        tone: wentQuiet ? 'stop' : 'caution',
        title: wentQuiet ? 'Link went stale — reconnecting' : 'Reconnecting to the relay',
        body: state.detail,
        todo: 'Values below are the last ones received. Check that the driver-station laptop is running Pitwall and that this device is on its network.',
      };
    case 'refused':
      return {
        tone: 'stop',
        title: 'The relay refused this connection',
        body: state.detail,
        todo: 'Sign in again. If it keeps happening, reload the page: the server may have been updated to a new version.',
      };
    case 'connecting':
    case 'idle':
      return { tone: 'neutral', title: 'Connecting to the relay…', body: 'Opening the link to the Pitwall server.' };
    case 'stopped':
      return { tone: 'neutral', title: 'Not connected', body: 'The link is closed.', todo: 'Reload the page to connect again.' };
  }
}

/** A healthy link, small enough for the page header. */
export function LinkPill({ state, ownRttMs }: { state: RelayState; ownRttMs: number | null | undefined }) {
  return (
    <p
      role="status"
      aria-label="Relay link"
      data-status={state.status}
      className="flex min-h-11 items-center gap-2.5 rounded-full bg-go-950 px-4 text-[0.9375rem] ring-1 ring-go/50 ring-inset"
    >
      <span aria-hidden="true" className="size-2.5 rounded-full bg-go shadow-[0_0_0_3px_rgb(47_191_143/0.25)]" />
      <span className="font-semibold text-asphalt-100">Connected to the relay</span>
      <span className="text-sm text-asphalt-300">
        {roleText(state)} · <span className="num">{formatMs(ownRttMs)}</span>
      </span>
    </p>
  );
}

/** The state of this tab's relay link, in words and colour, with what to do when it is not connected. */
export function LinkStatus({ state, ownRttMs, localNowMs }: { state: RelayState; ownRttMs: number | null | undefined; localNowMs: number }) {
  const l = look(state, ownRttMs, localNowMs);
  const isBusy = state.status === 'connecting' || state.status === 'reconnecting' || state.status === 'idle';
  return (
    <section
      aria-label="Relay link"
      role={l.tone === 'stop' ? 'alert' : 'status'}
      data-status={state.status}
      className={cx('flex items-start gap-3 rounded-tile p-3.5 ring-1 ring-inset', RING[l.tone])}
    >
      <span className="mt-1 grid size-4 shrink-0 place-items-center">
        {isBusy ? <Spinner className="text-signal-400" /> : <span aria-hidden="true" className={cx('size-3 rounded-full', LAMP[l.tone])} />}
      </span>
      <div className="min-w-0 flex-1 text-[0.9375rem] leading-snug">
        <p className="font-semibold text-asphalt-100">{l.title}</p>
        <p className="mt-0.5 text-asphalt-300">{l.body}</p>
        {l.todo && <p className="mt-1 font-medium text-asphalt-100">{l.todo}</p>}
      </div>
    </section>
  );
}
