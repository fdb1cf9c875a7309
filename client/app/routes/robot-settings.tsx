import { can } from '../../../shared/domain/roles';
import { PageHeader } from '../../components/ui/page-header';
import { QueryGate } from '../../components/ui/query-gate';
import { Section } from '../../components/ui/section';
import { useMe } from '../../features/auth/api/me';
import { useRobotProfile } from '../../features/robot/api/robot-profile';
import { RobotProfileForm } from '../../features/robot/components/robot-profile-form';
import { TextLink } from '../text-link';

export function Component() {
  const { data: me } = useMe();
  const robot = useRobotProfile();
  if (!me) return null;

  return (
    <>
      <PageHeader
        eyebrow={<span className="num">Team {me.team.number}</span>}
        title="Robot profile"
        description="The robot’s size, how it scores and how fast it moves. Scoring targets on the season page, the simulator and cycle estimates all follow these numbers."
        actions={<TextLink to="/settings/team">Team settings</TextLink>}
      />
      <QueryGate query={robot} loadingLabel="Loading the robot profile…" errorTitle="Couldn’t load the robot profile">
        {(stored) => (
          <Section
            title={stored.profile.name}
            description="Metres, seconds and metres per second. A decimal point or a decimal comma both work."
          >
            <RobotProfileForm
              stored={stored}
              role={me.role}
              canEdit={can(me.role, 'robotProfile.edit')}
              afterSaved={<TextLink to="/season">See the targets</TextLink>}
            />
          </Section>
        )}
      </QueryGate>
    </>
  );
}
