// Pure: imports only zod and shared files; no clocks, no Math.random (a random source is passed in).
// A drill's calls: what the operator is asked to select, drawn at random from a target set or scripted.
import { z } from 'zod';
import { BRANCH_LETTERS, branchLetterSchema, coralStationChoiceSchema, type BranchLetter } from '../channels';
import { REEF_LEVELS, reefLevelSchema, type ReefLevel } from '../season/season-profile';

export type CoralStation = z.infer<typeof coralStationChoiceSchema>;
export const CORAL_STATIONS: readonly CoralStation[] = coralStationChoiceSchema.options;

/** The parts of a selection a call can ask for, each answered on its own standard op/ channel. */
export const CALL_PARTS = ['branch', 'level', 'station'] as const;
export type CallPart = (typeof CALL_PARTS)[number];

export const CALL_PART_CHANNELS: Record<CallPart, 'op/reef/branch' | 'op/reef/level' | 'op/station'> = {
  branch: 'op/reef/branch',
  level: 'op/reef/level',
  station: 'op/station',
};

/**
 * One call: a reef target (a branch, a level or both) or a coral station. Never both kinds at once: an
 * operator selects where to score and where to load at different moments of a cycle.
 */
export const drillCallSchema = z
  .object({
    branch: branchLetterSchema.optional(),
    level: reefLevelSchema.optional(),
    station: coralStationChoiceSchema.optional(),
  })
  .strict()
  .refine((c) => c.branch !== undefined || c.level !== undefined || c.station !== undefined, 'A call asks for at least one part')
  .refine((c) => c.station === undefined || (c.branch === undefined && c.level === undefined), 'A call is a reef target or a station, not both');
export type DrillCall = z.infer<typeof drillCallSchema>;

/** The targets a random drill draws from. Choosing a face in the editor adds both of its branches. */
export const drillTargetSetSchema = z
  .object({
    branches: z.array(branchLetterSchema).max(12),
    levels: z.array(reefLevelSchema).max(4),
    stations: z.array(coralStationChoiceSchema).max(2),
  })
  .refine((t) => t.branches.length + t.levels.length + t.stations.length > 0, 'Choose at least one target');
export type DrillTargetSet = z.infer<typeof drillTargetSetSchema>;

/** A random source returning numbers in [0, 1), e.g. `seededRandom(seed)`. */
export type RandomSource = () => number;

/** Mulberry32: a small deterministic generator, so one seed always gives the same drill. */
export function seededRandom(seed: number): RandomSource {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const pick = <T>(items: readonly T[], random: RandomSource): T => items[Math.min(items.length - 1, Math.floor(random() * items.length))]!;

const sameCall = (a: DrillCall, b: DrillCall) => a.branch === b.branch && a.level === b.level && a.station === b.station;

/** Every distinct call a target set can produce (reef targets are branch × level when both are chosen). */
export function possibleCalls(targets: DrillTargetSet): DrillCall[] {
  const branches = sortedBranches(targets.branches);
  const levels = sortedLevels(targets.levels);
  const reef: DrillCall[] =
    branches.length && levels.length
      ? branches.flatMap((branch) => levels.map((level) => ({ branch, level })))
      : [...branches.map((branch) => ({ branch })), ...levels.map((level) => ({ level }))];
  const stations = CORAL_STATIONS.filter((s) => targets.stations.includes(s)).map((station) => ({ station }));
  return [...reef, ...stations];
}

/**
 * `count` calls drawn from the target set with `random`. Reef and station calls are equally likely when both
 * are chosen; a call never repeats the one before it (unless the set has only one call), because an
 * operator whose selection already matches would have nothing to tap.
 */
export function randomCalls(targets: DrillTargetSet, count: number, random: RandomSource): DrillCall[] {
  const all = possibleCalls(targets);
  if (all.length === 0 || count <= 0) return [];
  const reef = all.filter((c) => c.station === undefined);
  const stations = all.filter((c) => c.station !== undefined);
  const calls: DrillCall[] = [];
  for (let i = 0; i < count; i++) {
    const previous = calls[i - 1];
    const pool = reef.length && stations.length ? (random() < 0.5 ? reef : stations) : reef.length ? reef : stations;
    const fresh = previous ? pool.filter((c) => !sameCall(c, previous)) : pool;
    const fromAll = previous ? all.filter((c) => !sameCall(c, previous)) : all;
    calls.push(pick(fresh.length ? fresh : fromAll.length ? fromAll : all, random));
  }
  return calls;
}

/** Branches in A–L order without duplicates. */
export function sortedBranches(branches: readonly BranchLetter[]): BranchLetter[] {
  return BRANCH_LETTERS.filter((b) => branches.includes(b));
}

/** Levels in L1–L4 order without duplicates. */
export function sortedLevels(levels: readonly ReefLevel[]): ReefLevel[] {
  return REEF_LEVELS.filter((l) => levels.includes(l));
}

/** The parts a call asks for, in the order the operator usually taps them. */
export function callParts(call: DrillCall): CallPart[] {
  return CALL_PARTS.filter((p) => call[p] !== undefined);
}

const STATION_WORDS: Record<CoralStation, string> = { left: 'Left station', right: 'Right station' };

/** The call in large type, e.g. "L4 · C" or "Left station". */
export function callText(call: DrillCall): string {
  if (call.station) return STATION_WORDS[call.station];
  return [call.level, call.branch].filter(Boolean).join(' · ');
}

/** The call as words for speech synthesis, e.g. "Level 4, branch C". */
export function callSpeech(call: DrillCall): string {
  if (call.station) return `${STATION_WORDS[call.station]}`;
  const words: string[] = [];
  if (call.level) words.push(`Level ${call.level.slice(1)}`);
  if (call.branch) words.push(`branch ${call.branch}`);
  return words.join(', ');
}
