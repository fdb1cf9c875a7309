import { can } from '../../../shared/domain/roles';
import { ButtonLink } from '../../components/ui/button-link';
import { Notice } from '../../components/ui/notice';
import { PageHeader } from '../../components/ui/page-header';
import { Section } from '../../components/ui/section';
import { useMe } from '../../features/auth/api/me';
import { RobotSummary } from '../../features/robot/components/robot-summary';
import { InviteForm } from '../../features/team/components/invite-form';
import { MembersTable } from '../../features/team/components/members-table';
import { PendingInvites } from '../../features/team/components/pending-invites';
import { RobotKeys } from '../../features/team/components/robot-keys';
import { DevInboxHint } from '../dev-inbox-hint';

export function Component() {
  const { data: me } = useMe();
  if (!me) return null;
  const role = me.role;

  return (
    <>
      <PageHeader
        eyebrow={<span className="num">Team {me.team.number}</span>}
        title="Team settings"
        description={`Members, invites, the robot profile and robot keys for ${me.team.name}.`}
      />
      <div className="flex flex-col gap-5">
        <Section
          title="Members"
          description={
            can(role, 'members.manage')
              ? 'Change a role and it applies on the member’s next request. The team always keeps at least one lead.'
              : 'Everyone on the team and what they do. A lead changes roles.'
          }
        >
          <MembersTable viewerRole={role} viewerId={me.user.id} />
        </Section>

        <Section
          title="Robot profile"
          description="Size, scoring side and speeds of the robot. Scoring targets, the simulator and cycle estimates follow it."
          actions={
            <ButtonLink to="/settings/robot">{can(role, 'robotProfile.edit') ? 'Edit robot profile' : 'View robot profile'}</ButtonLink>
          }
        >
          <RobotSummary />
        </Section>

        {can(role, 'invites.manage') ? (
          <div className="grid gap-5 lg:grid-cols-2">
            <Section title="Invite a member" description="They get an e-mail with a link to join with the role you pick.">
              <InviteForm afterSent={<DevInboxHint>Open it in the dev inbox</DevInboxHint>} />
            </Section>
            <Section title="Pending invites">
              <PendingInvites />
            </Section>
          </div>
        ) : (
          <Notice tone="info" title="Invites and robot keys are managed by a lead">
            Ask a lead to invite someone or to create a key for the robot.
          </Notice>
        )}

        {can(role, 'robotKeys.manage') && (
          <div id="robot-keys" className="scroll-mt-24">
            <Section
              title="Robot keys"
              description="A robot connects to the relay with a key. It may publish robot/ channels and read what the operator taps on op/ channels — nothing else."
            >
              <RobotKeys />
            </Section>
          </div>
        )}
      </div>
    </>
  );
}
