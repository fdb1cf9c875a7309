import { ButtonLink } from '../../components/ui/button-link';
import { Icon } from '../../components/ui/icon';
import { PageHeader } from '../../components/ui/page-header';
import { QueryGate } from '../../components/ui/query-gate';
import { useRobotProfile } from '../../features/robot/api/robot-profile';
import { SeasonSources } from '../../features/season/components/season-sources';
import { SeasonTargets } from '../../features/season/components/season-targets';
import { useSeason } from '../../features/season/api/season';

export function Component() {
  const season = useSeason();
  const robot = useRobotProfile();

  return (
    <>
      <PageHeader
        eyebrow={season.data ? season.data.name : 'Season'}
        title="Season"
        description="Where the robot’s centre stands, and which way it points, to score on each of the 12 reef branches. Computed from the field’s AprilTags and the team’s robot profile."
        actions={
          <ButtonLink to="/settings/robot" variant="secondary">
            <Icon name="robot" className="size-4" />
            Robot profile
          </ButtonLink>
        }
      />
      <QueryGate query={season} loadingLabel="Loading the season…" errorTitle="Couldn’t load the season profile">
        {(seasonProfile) => (
          <QueryGate query={robot} loadingLabel="Loading the robot profile…" errorTitle="Couldn’t load the robot profile">
            {(stored) => (
              <div className="flex flex-col gap-5">
                <SeasonTargets season={seasonProfile} robot={stored.profile} profileVersion={stored.updatedAt} />
                <SeasonSources season={seasonProfile} />
              </div>
            )}
          </QueryGate>
        )}
      </QueryGate>
    </>
  );
}
