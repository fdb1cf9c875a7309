import type { TeamAction } from '../../shared/domain/roles';
import type { IconName } from '../components/ui/icon';

export type AreaId = 'panels' | 'live' | 'recordings' | 'cycles' | 'drills';

export type Area = {
  id: AreaId;
  path: `/${AreaId}`;
  label: string;
  icon: IconName;
  /** One line for the nav and the team home. */
  tagline: string;
  /** What the area will do, for its empty state. */
  description: string;
  /** Who on the subteam works here. */
  usedBy: string;
  /** The action that decides what this member will be able to do here. */
  action: TeamAction;
  canLine: string;
  cannotLine: string;
  /** Built and usable; areas without it are shown as coming soon. */
  isAvailable?: boolean;
};

export const AREAS: readonly Area[] = [
  {
    id: 'panels',
    path: '/panels',
    label: 'Panels',
    icon: 'panels',
    isAvailable: true,
    tagline: 'Lay out the operator’s touch panel',
    description:
      'Place tiles on a grid — reef picker, level picker, station and cage pickers, pads, lamps and readouts — and bind each one to a channel the robot code reads. Every save is a version; one version is published for the driver station.',
    usedBy: 'Programmers build panels; operators run the published one.',
    action: 'panels.edit',
    canLine: 'You will be able to create, edit and publish panels.',
    cannotLine: 'You will see the published panel. Programmers and leads edit it.',
  },
  {
    id: 'live',
    path: '/live',
    label: 'Live',
    icon: 'live',
    isAvailable: true,
    tagline: 'Watch the robot over the relay and send it a target',
    description:
      'The published panel runs full-screen in the tablet’s browser. Each tap travels over the relay to the robot, which acknowledges it; lamps and readouts show the robot’s telemetry. The simulator stands in for the robot for rehearsal and demos, and every simulator session is marked as one.',
    usedBy: 'Operators at the driver station; programmers testing against the simulator.',
    action: 'panels.run',
    canLine: 'You will be able to run the published panel.',
    cannotLine: 'You will be able to watch a live session; operators, programmers and leads run the panel.',
  },
  {
    id: 'recordings',
    path: '/recordings',
    label: 'Recordings',
    icon: 'recordings',
    isAvailable: true,
    tagline: 'Every match and practice run, ready to replay',
    description:
      'Telemetry, operator selections and robot events from each match are stored as a recording. Replay one on a single timeline with traces, the field map, the event strip and values at the cursor, and leave timestamped notes for the pit.',
    usedBy: 'Software leads debugging in the pit; coaches reviewing a match.',
    action: 'recordings.manage',
    canLine: 'You will be able to upload, rename and manage recordings.',
    cannotLine: 'You will be able to replay recordings; programmers and leads manage them.',
  },
  {
    id: 'cycles',
    path: '/cycles',
    label: 'Cycles',
    icon: 'cycles',
    isAvailable: true,
    tagline: 'Cycle times per match and across an event',
    description:
      'Each cycle is split into acquire, travel, align and place, with the target that was called and the one reached. Per match: count, median and p90 cycle time, points by level, call-to-place latency. Across matches: trends by level, face, station and operator — each linked back into the replay.',
    usedBy: 'Coaches, and leads planning practice.',
    action: 'notes.write',
    canLine: 'You will be able to review cycles and write notes on them.',
    cannotLine: 'You will be able to review cycles.',
  },
  {
    id: 'drills',
    path: '/drills',
    label: 'Drills',
    icon: 'drills',
    isAvailable: true,
    tagline: 'Rehearse target calls before the match',
    description:
      'A drill is a sequence of calls — “L4, branch C” — that the operator answers by tapping the panel. Every answer is timed and checked, so the drive team can see selection speed improve over a build season.',
    usedBy: 'Coaches send calls; operators answer them.',
    action: 'drills.send',
    canLine: 'You will be able to run drills and send calls.',
    cannotLine: 'You will be able to take part in drills that a coach runs.',
  },
];

export function areaById(id: AreaId): Area {
  const area = AREAS.find((a) => a.id === id);
  if (!area) throw new Error(`unknown area ${id}`);
  return area;
}
