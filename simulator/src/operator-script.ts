// Pure: no I/O, clocks, timers or Math.random; imports only shared/ and sibling kernel files. A seeded stand-in
// operator that taps targets over a match, so a whole match plays without a person.
import { BRANCH_LETTERS, type OpChannel, type OperatorSelection } from '../../shared/domain/channels';
import type { ReefLevel, SeasonProfile } from '../../shared/domain/season/season-profile';
import { matchEndsS, type MatchMode } from './match-clock';
import type { Holding } from './robot-model';
import { createRng } from './rng';
import type { ModelState } from './signals';

/** What the operator can see: the match clock, the robot's state (its target echo) and their own last taps. */
export interface OperatorView {
  matchTimeS: number;
  mode: MatchMode;
  state: ModelState;
  holding: Holding;
  selection: Readonly<OperatorSelection>;
}

export interface OpWrite {
  channel: OpChannel;
  value: string;
}

export interface OperatorScript {
  /** The taps to make now; call once per tick with the current view. */
  decide(view: OperatorView): OpWrite[];
}

export interface OperatorScriptOptions {
  seed: number;
  season: SeasonProfile;
}

// Invented habits of a practised operator (no source).
const LEVEL_WEIGHTS: [ReefLevel, number][] = [
  ['L4', 0.4],
  ['L3', 0.25],
  ['L2', 0.2],
  ['L1', 0.15],
];
const ALGAE_CHANCE = 0.2;
const CHANGE_OF_MIND_CHANCE = 0.15;
const STATION_SWITCH_CHANCE = 0.3;
const CAGE_CALL_BEFORE_END_S = 18;

/** A seeded operator: calls the next target soon after each pickup, sometimes changes its mind, calls a cage near the end. */
export function createOperatorScript(options: OperatorScriptOptions): OperatorScript {
  const rng = createRng(options.seed ^ 0x5eed);
  const { teleopEndS } = matchEndsS(options.season);
  const cageAtS = teleopEndS - CAGE_CALL_BEFORE_END_S + rng.range(-3, 3);
  const queue: { atS: number; writes: OpWrite[] }[] = [];
  let hasStarted = false;
  let hasCalledCage = false;
  let lastHolding: Holding | undefined;

  const level = (): ReefLevel => {
    let r = rng.next();
    for (const [l, w] of LEVEL_WEIGHTS) {
      if (r < w) return l;
      r -= w;
    }
    return 'L4';
  };
  const later = (atS: number, writes: OpWrite[]) => queue.push({ atS, writes });
  const reefCall = (): OpWrite[] => [
    { channel: 'op/reef/branch', value: rng.pick(BRANCH_LETTERS) },
    { channel: 'op/reef/level', value: level() },
    { channel: 'op/algae', value: rng.chance(ALGAE_CHANCE) ? rng.pick(['processor', 'net']) : 'none' },
  ];

  return {
    decide(view) {
      const now = view.matchTimeS;
      if (!hasStarted) {
        hasStarted = true;
        lastHolding = view.holding;
        return [
          { channel: 'op/reef/branch', value: rng.pick(BRANCH_LETTERS) },
          { channel: 'op/reef/level', value: 'L4' },
          { channel: 'op/station', value: rng.pick(['left', 'right']) },
          { channel: 'op/algae', value: 'none' },
          { channel: 'op/cage', value: 'none' },
        ];
      }
      if (view.mode === 'disabled') return [];
      if (lastHolding !== view.holding) {
        if (view.holding === 'coral') {
          const callAtS = now + rng.range(0.2, 1.2);
          later(callAtS, reefCall());
          if (rng.chance(CHANGE_OF_MIND_CHANCE)) {
            later(callAtS + rng.range(0.6, 1.2), [{ channel: 'op/reef/branch', value: rng.pick(BRANCH_LETTERS) }]);
          }
        } else if (view.holding === 'none' && rng.chance(STATION_SWITCH_CHANCE)) {
          later(now + rng.range(0.1, 0.5), [{ channel: 'op/station', value: view.selection.station === 'left' ? 'right' : 'left' }]);
        }
        lastHolding = view.holding;
      }
      if (view.mode === 'teleop' && !hasCalledCage && now >= cageAtS) {
        hasCalledCage = true;
        const r = rng.next();
        later(now, [{ channel: 'op/cage', value: r < 0.5 ? 'deep' : r < 0.8 ? 'shallow' : 'park' }]);
      }
      const due: OpWrite[] = [];
      for (let i = 0; i < queue.length; ) {
        if (queue[i]!.atS <= now) {
          due.push(...queue[i]!.writes);
          queue.splice(i, 1);
        } else {
          i += 1;
        }
      }
      return due;
    },
  };
}
