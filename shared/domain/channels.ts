// Pure: imports only zod and shared files. The standard op/ channels a panel writes and the robot reads.
import { z } from 'zod';
import { reefLevelSchema } from './season/season-profile';

export const BRANCH_LETTERS = ['A', 'B', 'C', 'D', 'E', 'F', 'G', 'H', 'I', 'J', 'K', 'L'] as const;
export const branchLetterSchema = z.enum(BRANCH_LETTERS);
export type BranchLetter = z.infer<typeof branchLetterSchema>;

export const coralStationChoiceSchema = z.enum(['left', 'right']);
export const algaeChoiceSchema = z.enum(['none', 'processor', 'net']);
export const cageChoiceSchema = z.enum(['none', 'park', 'shallow', 'deep']);

/** Channel → the values it carries. The simulator reads all of these; a team's robot code may read fewer. */
export const OP_CHANNELS = {
  'op/reef/branch': branchLetterSchema,
  'op/reef/level': reefLevelSchema,
  'op/station': coralStationChoiceSchema,
  'op/algae': algaeChoiceSchema,
  'op/cage': cageChoiceSchema,
} as const;
export type OpChannel = keyof typeof OP_CHANNELS;
export const OP_CHANNEL_NAMES = Object.keys(OP_CHANNELS) as OpChannel[];

/** The operator's current selection as the robot sees it. */
export interface OperatorSelection {
  branch?: BranchLetter;
  level?: z.infer<typeof reefLevelSchema>;
  station?: z.infer<typeof coralStationChoiceSchema>;
  algae?: z.infer<typeof algaeChoiceSchema>;
  cage?: z.infer<typeof cageChoiceSchema>;
}

const FIELD: Record<OpChannel, keyof OperatorSelection> = {
  'op/reef/branch': 'branch',
  'op/reef/level': 'level',
  'op/station': 'station',
  'op/algae': 'algae',
  'op/cage': 'cage',
};

/**
 * The selection after applying `value` on `channel`, or undefined when the channel is not a standard one
 * or the value is not one it carries (the robot then does not acknowledge it).
 */
export function applySelection(selection: OperatorSelection, channel: string, value: unknown): OperatorSelection | undefined {
  if (!(channel in OP_CHANNELS)) return undefined;
  const parsed = OP_CHANNELS[channel as OpChannel].safeParse(value);
  if (!parsed.success) return undefined;
  return { ...selection, [FIELD[channel as OpChannel]]: parsed.data };
}

/** Robot channels the simulator publishes as retained values. */
export const ROBOT_CHANNELS = {
  mode: 'robot/mode',
  state: 'robot/state',
  target: 'robot/target',
  simulated: 'robot/simulated',
} as const;
