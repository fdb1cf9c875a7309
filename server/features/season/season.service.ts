import { DEFAULT_ROBOT_PROFILE, scoringDepthM } from '../../../shared/domain/robot-profile';
import { season2025 } from '../../../shared/domain/season/season-2025';
import type { SeasonProfile } from '../../../shared/domain/season/season-profile';
import { branchTargets, type BranchTargets } from '../../../shared/domain/season/targets';
import type { RobotProfile, StoredRobotProfile } from '../../../shared/schemas/robot-profile';
import type { TargetsQuery } from '../../../shared/schemas/season';
import type { RobotProfileRepo } from './robot-profile.repo';

export function createSeasonService({ profiles, season = season2025 }: { profiles: RobotProfileRepo; season?: SeasonProfile }) {
  async function robotProfile(teamId: string): Promise<StoredRobotProfile> {
    const row = await profiles.find(teamId);
    const profile = row?.profile ?? DEFAULT_ROBOT_PROFILE;
    return {
      profile,
      scoringDepthM: scoringDepthM(profile),
      updatedAt: row ? row.updatedAt.toISOString() : null,
      updatedByName: row?.updatedByName ?? null,
    };
  }

  return {
    season: () => season,
    robotProfile,

    async saveRobotProfile(teamId: string, userId: string, profile: RobotProfile): Promise<StoredRobotProfile> {
      await profiles.save(teamId, profile, userId);
      return robotProfile(teamId);
    },

    /** The team's 12 branch targets for an alliance; `depth` and `side` override its robot profile. */
    async targets(teamId: string, query: TargetsQuery): Promise<BranchTargets> {
      const { profile } = await robotProfile(teamId);
      const side = query.side ?? profile.scoringSide;
      const depthM = query.depth ?? scoringDepthM({ ...profile, scoringSide: side });
      return branchTargets(season, query.alliance, { depthM, scoringSide: side });
    },
  };
}
export type SeasonService = ReturnType<typeof createSeasonService>;
