import { useCallback, useEffect, useMemo, useState, type ReactNode } from 'react';
import type { ChannelValue } from '../../../../shared/protocol/messages';
import type { Tile } from '../../../../shared/schemas/panel';
import type { RunPanel } from '../api/run-panel';
import { useRunRelay } from '../hooks/run-relay';
import { useFullscreen, useMediaQuery, useNowMs, useRunPageLock, useWakeLock, type OfflineState } from '../hooks/use-run-screen';
import { useRunSettings } from '../hooks/use-run-settings';
import { panelLive, relayLinkView, robotLinkView } from '../model/run-view';
import { RunCanvas } from './run-canvas';
import { RunStatusStrip } from './run-status-strip';
import { SafetyGate } from './safety-gate';
import { SeatChooser } from './seat-chooser';
import { TurnOverlay } from './turn-overlay';

type RunScreenProps = {
  panel: RunPanel;
  /** The safety caution shown before the panel goes live to a real robot. */
  caution: ReactNode;
  backHref: string;
  /** Whether the service worker keeps this panel for opening with no network (only /run registers it). */
  offline?: OfflineState;
  /** A version published after this one opened, and how to switch to it. */
  newerVersion?: { versionNumber: number; onLoad: () => void };
};

declare global {
  interface Window {
    /** Diagnostics and browser tests: drop run mode's relay socket as a pulled cable would. */
    pitwallRunRelay?: { dropConnection(): void };
  }
}

/** Run mode: the panel full screen, live over the relay. */
export function RunScreen({ panel, caution, backHref, offline, newerVersion }: RunScreenProps) {
  useRunPageLock();
  const fullscreen = useFullscreen();
  const wakeLock = useWakeLock();
  const [settings, updateSettings] = useRunSettings();
  const { state, publish, client } = useRunRelay();
  const nowMs = useNowMs();
  const doc = panel.document;
  const [pageId, setPageId] = useState(doc.pages[0]!.id);
  const page = doc.pages.find((p) => p.id === pageId) ?? doc.pages[0]!;
  const isPortraitScreen = useMediaQuery('(orientation: portrait)');
  const wants = doc.device.orientation;
  const isTurnedWrong = wants === 'landscape' ? isPortraitScreen : !isPortraitScreen;

  const relay = relayLinkView(state);
  const robot = robotLinkView(state, nowMs);
  const live = useMemo(() => panelLive(page.tiles, state, nowMs), [page.tiles, state, nowMs]);
  const seat = useMemo(() => ({ alliance: settings.alliance, driverStation: settings.driverStation }), [settings.alliance, settings.driverStation]);

  const robotSession = robot.isRealRobot ? robot.sessionId : undefined;
  const [confirmedFor, setConfirmedFor] = useState<string | undefined>(undefined);
  const needsCaution = robotSession !== undefined && confirmedFor !== robotSession;

  useEffect(() => {
    window.pitwallRunRelay = { dropConnection: () => client.dropConnection() };
    return () => {
      delete window.pitwallRunRelay;
    };
  }, [client]);

  const canVibrate = typeof navigator.vibrate === 'function';
  const onPress = useCallback(
    (tile: Tile, value: ChannelValue) => {
      if (tile.kind === 'caption' || tile.kind === 'target-echo') return;
      publish(tile.channel, value);
      if (settings.isVibrationOn && canVibrate) navigator.vibrate(12);
    },
    [publish, settings.isVibrationOn, canVibrate],
  );
  const onRelease = useCallback(
    (tile: Tile, value: ChannelValue) => {
      if (tile.kind === 'push-pad') publish(tile.channel, value);
    },
    [publish],
  );

  const theme = doc.theme;
  const pages =
    doc.pages.length > 1 ? (
      <nav aria-label="Panel pages" className="ml-3 flex gap-1.5">
        {doc.pages.map((p) => (
          <button
            key={p.id}
            type="button"
            aria-current={p.id === page.id ? 'page' : undefined}
            onPointerDown={(e) => e.button === 0 && setPageId(p.id)}
            onKeyDown={(e) => (e.key === 'Enter' || e.key === ' ') && setPageId(p.id)}
            className="min-h-10 rounded-lg px-3 text-[15px] font-bold"
            style={p.id === page.id ? { background: theme.accent, color: theme.accentText } : { color: theme.text, boxShadow: `inset 0 0 0 1.5px ${theme.muted}` }}
          >
            {p.name}
          </button>
        ))}
      </nav>
    ) : undefined;

  return (
    <div className="fixed inset-0 flex flex-col overflow-hidden select-none" style={{ background: theme.canvas, color: theme.text, touchAction: 'none' }} data-testid="run-mode" data-offline={offline}>
      {robot.isSimulated || robot.isRealRobot ? (
        // A band across the whole top edge, so simulator and real-robot sessions differ at a glance from afar.
        <div
          aria-hidden="true"
          data-testid={robot.isSimulated ? 'simulator-edge' : 'live-robot-edge'}
          className="h-1.5 shrink-0"
          style={{
            background: robot.isSimulated ? `repeating-linear-gradient(-45deg, ${theme.accent} 0 10px, ${theme.canvas} 10px 20px)` : theme.danger,
          }}
        />
      ) : null}
      <RunStatusStrip
        theme={theme}
        panelName={panel.name}
        versionNumber={panel.versionNumber}
        isDraft={panel.isDraft}
        relay={relay}
        robot={robot}
        backHref={backHref}
        pages={pages}
        newerVersion={newerVersion}
        seat={<SeatChooser settings={settings} theme={theme} wakeLock={wakeLock} offline={offline} canVibrate={canVibrate} onChange={updateSettings} />}
        isFullscreen={fullscreen.isFullscreen}
        canFullscreen={fullscreen.isSupported}
        onFullscreen={fullscreen.enter}
      />
      <RunCanvas document={doc} page={page} live={live} seat={seat} isLinkDown={relay.state === 'down' || relay.state === 'refused'} onPress={onPress} onRelease={onRelease} />
      {needsCaution ? <SafetyGate theme={theme} robotName={robot.name ?? 'robot'} caution={caution} onConfirm={() => setConfirmedFor(robotSession)} /> : null}
      {isTurnedWrong ? <TurnOverlay theme={theme} to={wants} /> : null}
    </div>
  );
}
