import { Link } from 'react-router-dom';
import { can, ROLE_LABELS, ROLE_SUMMARIES } from '../../../shared/domain/roles';
import { ButtonLink } from '../../components/ui/button-link';
import { Icon } from '../../components/ui/icon';
import { PageHeader } from '../../components/ui/page-header';
import { Section } from '../../components/ui/section';
import { useMe } from '../../features/auth/api/me';
import { MemberRoster } from '../../features/team/components/member-roster';
import { TeamSetup } from '../../features/team/components/team-setup';
import { AREAS } from '../areas';

export function Component() {
  const { data: me } = useMe();
  if (!me) return null;
  const isManager = can(me.role, 'members.manage');

  return (
    <>
      <PageHeader
        eyebrow={<span className="num">Team {me.team.number}</span>}
        title={me.team.name}
        description={
          <>
            Signed in as <span className="font-semibold text-asphalt-100">{me.user.name}</span>,{' '}
            {ROLE_LABELS[me.role].toLowerCase()}. {ROLE_SUMMARIES[me.role]}
          </>
        }
      />
      <div className="grid gap-5 xl:grid-cols-[minmax(0,1fr)_22rem]">
        <Section
          title="What Pitwall does for the team"
          description="Each area says what it does and who on the subteam uses it."
        >
          <ul className="grid gap-3 sm:grid-cols-2">
            {AREAS.map((area) => (
              <li key={area.id}>
                <Link
                  to={area.path}
                  className="flex h-full min-h-20 gap-3 rounded-lg bg-asphalt-900 p-4 ring-1 ring-asphalt-700 transition-colors hover:bg-asphalt-800 hover:ring-asphalt-500"
                >
                  <span className="grid size-10 shrink-0 place-items-center rounded-lg bg-signal-950 text-signal-400 ring-1 ring-signal-500/30">
                    <Icon name={area.icon} />
                  </span>
                  <span className="min-w-0">
                    <span className="flex items-center gap-2 font-semibold text-asphalt-100">
                      {area.label}
                      {!area.isAvailable && (
                        <span className="text-2xs font-semibold tracking-[0.12em] text-asphalt-500 uppercase">Soon</span>
                      )}
                    </span>
                    <span className="mt-0.5 block text-sm text-asphalt-400">{area.tagline}</span>
                  </span>
                </Link>
              </li>
            ))}
          </ul>
        </Section>
        <div className="flex flex-col gap-5">
          {isManager && (
            <Section title="Set up the team" description="Two steps before the first practice.">
              <TeamSetup />
            </Section>
          )}
          {can(me.role, 'panels.run') && (
            <Section title="At the driver station" description="The team’s published panel, full screen on the tablet. After the first visit it opens without a network.">
              <ButtonLink to="/run" variant="primary">
                Open run mode
              </ButtonLink>
            </Section>
          )}
          <Section title="On the team">
            <MemberRoster />
          </Section>
        </div>
      </div>
    </>
  );
}
