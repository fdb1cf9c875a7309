// Pure: imports only zod and shared files. The branch target list that the API, the CLI and the season page show.
import { z } from 'zod';
import { branchScoringPoses, type RobotScoringProfile } from './scoring-pose';
import { reefFaces } from './reef-faces';
import { REEF_LEVELS, type Alliance, type SeasonProfile } from './season-profile';

export const branchTargetSchema = z.object({
  /** Branch letter, A–L. */
  branch: z.string(),
  /** The face the branch is on, named by its two branch letters (e.g. "AB"). */
  face: z.string(),
  tagId: z.number().int(),
  /** Robot centre in field metres, blue-origin coordinates. */
  x: z.number(),
  y: z.number(),
  headingDeg: z.number(),
  /** Scoring height of each level, metres. */
  levelHeights: z.object(Object.fromEntries(REEF_LEVELS.map((l) => [l, z.number()])) as Record<(typeof REEF_LEVELS)[number], z.ZodNumber>),
});
export type BranchTarget = z.infer<typeof branchTargetSchema>;

export const branchTargetsSchema = z.object({
  alliance: z.enum(['blue', 'red']),
  depthM: z.number(),
  side: z.enum(['front', 'back', 'left', 'right']),
  targets: z.array(branchTargetSchema).length(12),
});
export type BranchTargets = z.infer<typeof branchTargetsSchema>;

const round = (v: number, digits: number) => Number(v.toFixed(digits));

/** The 12 branch targets of an alliance, positions rounded to 0.1 mm and headings to 0.01°. */
export function branchTargets(season: SeasonProfile, alliance: Alliance, robot: RobotScoringProfile): BranchTargets {
  const faces = reefFaces(season, alliance);
  const targets = branchScoringPoses(season, alliance, robot).map((p) => ({
    branch: p.branch,
    face: faces[p.faceIndex]!.branchLetters.join(''),
    tagId: p.tagId,
    x: round(p.xM, 4),
    y: round(p.yM, 4),
    headingDeg: round(p.headingDeg, 2),
    levelHeights: Object.fromEntries(REEF_LEVELS.map((l) => [l, round(p.levelHeightsM[l], 4)])) as BranchTarget['levelHeights'],
  }));
  return { alliance, depthM: robot.depthM, side: robot.scoringSide, targets };
}
