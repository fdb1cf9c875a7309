import type { ReactNode } from 'react';
import type { Theme } from '../../../../shared/schemas/panel';
import type { RelayLinkView, RobotLinkView } from '../model/run-view';
import { LinkPill, type PillTone } from './link-pill';

type RunStatusStripProps = {
  theme: Theme;
  panelName: string;
  versionNumber: number;
  isDraft: boolean;
  relay: RelayLinkView;
  robot: RobotLinkView;
  backHref: string;
  pages?: ReactNode;
  newerVersion?: { versionNumber: number; onLoad: () => void };
  seat: ReactNode;
  isFullscreen: boolean;
  canFullscreen: boolean;
  onFullscreen: () => void;
};

const RELAY_TONE: Record<RelayLinkView['state'], PillTone> = { up: 'ok', connecting: 'warn', down: 'danger', refused: 'danger' };
const ROBOT_TONE: Record<RobotLinkView['state'], PillTone> = { live: 'ok', quiet: 'warn', none: 'danger' };

/** The one line of chrome above the panel: the way back, what runs, both links, simulator or live robot, seat. */
export function RunStatusStrip(props: RunStatusStripProps) {
  const { theme, relay, robot } = props;
  return (
    <header className="flex h-14 shrink-0 items-center gap-2 px-2" style={{ background: theme.surface, color: theme.text, boxShadow: `0 1px 0 ${theme.muted}44` }}>
      <a
        href={props.backHref}
        aria-label="Leave run mode, back to Pitwall"
        className="inline-flex min-h-10 items-center gap-1 rounded-lg px-2.5 text-[15px] font-semibold"
        style={{ color: theme.muted }}
      >
        <span aria-hidden="true">‹</span> <span className="max-[1150px]:sr-only">Pitwall</span>
      </a>
      <div className="flex min-w-0 shrink flex-col leading-tight">
        <span className="truncate text-[15px] font-bold">{props.panelName}</span>
        <span className="text-xs" style={{ color: theme.muted }}>
          version {props.versionNumber}
          {props.isDraft ? (
            <span className="ml-1.5 rounded px-1 font-bold uppercase" style={{ background: theme.warn, color: theme.canvas }}>
              draft
            </span>
          ) : null}
        </span>
      </div>
      {props.pages}
      {props.newerVersion ? (
        <button
          type="button"
          onClick={props.newerVersion.onLoad}
          className="inline-flex min-h-10 shrink-0 items-center gap-1.5 rounded-lg px-3 text-[15px] font-bold whitespace-nowrap"
          style={{ color: theme.accent, boxShadow: `inset 0 0 0 2px ${theme.accent}` }}
        >
          Version {props.newerVersion.versionNumber} published · Load it
        </button>
      ) : null}
      <div className="ml-auto flex items-center gap-2">
        {robot.isSimulated ? (
          <span
            data-testid="simulator-band"
            className="inline-flex min-h-10 items-center rounded-lg px-3 text-[15px] font-black tracking-[0.2em]"
            style={{
              color: theme.canvas,
              background: `repeating-linear-gradient(-45deg, ${theme.accent} 0 10px, ${theme.warn} 10px 20px)`,
            }}
          >
            SIMULATOR
          </span>
        ) : robot.isRealRobot ? (
          <span
            data-testid="live-robot-band"
            className="inline-flex min-h-10 items-center rounded-lg px-3 text-[15px] font-black tracking-[0.15em]"
            style={{ color: theme.canvas, background: theme.danger }}
          >
            LIVE ROBOT
          </span>
        ) : null}
        <LinkPill name="Relay link" words={relay.words} tone={RELAY_TONE[relay.state]} theme={theme} detail={relay.detail} />
        <LinkPill name="Robot link" words={robot.words} tone={ROBOT_TONE[robot.state]} theme={theme} />
        {props.seat}
        {props.canFullscreen && !props.isFullscreen ? (
          <button
            type="button"
            onClick={props.onFullscreen}
            aria-label="Full screen"
            className="inline-flex min-h-10 items-center gap-1.5 rounded-lg px-3 text-[15px] font-bold"
            style={{ background: theme.accent, color: theme.accentText }}
          >
            <svg viewBox="0 0 20 20" aria-hidden="true" className="size-4" fill="none" stroke="currentColor" strokeWidth="2.2">
              <path d="M3 8V3h5M12 3h5v5M17 12v5h-5M8 17H3v-5" />
            </svg>
            <span className="max-[1150px]:sr-only">Full screen</span>
          </button>
        ) : null}
      </div>
    </header>
  );
}
