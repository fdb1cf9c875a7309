import { can, type Role } from '../../shared/domain/roles';
import { cx } from '../lib/cx';
import { AREAS } from './areas';
import { NavItem } from './nav-item';

function GroupLabel({ children }: { children: string }) {
  return <p className="mt-4 mb-1 px-3 text-2xs font-semibold tracking-[0.16em] text-asphalt-500 uppercase">{children}</p>;
}

type MainNavProps = { role: Role; hasDevInbox: boolean; isCompact?: boolean };

/** The areas of Pitwall. Compact is the horizontal strip used on narrow screens. */
export function MainNav({ role, hasDevInbox, isCompact = false }: MainNavProps) {
  return (
    <nav aria-label="Main" className={cx(isCompact ? 'flex gap-1 overflow-x-auto px-4 pb-2' : 'flex flex-col gap-1')}>
      <NavItem to="/" end icon="home" label="Team home" isCompact={isCompact} />
      {!isCompact && <GroupLabel>Match work</GroupLabel>}
      {AREAS.map((area) => (
        <NavItem key={area.id} to={area.path} icon={area.icon} label={area.label} isSoon={!area.isAvailable} isCompact={isCompact} />
      ))}
      {!isCompact && <GroupLabel>Game</GroupLabel>}
      {can(role, 'team.read') && <NavItem to="/season" icon="field" label="Season" isCompact={isCompact} />}
      {!isCompact && <GroupLabel>Team</GroupLabel>}
      {can(role, 'team.read') && <NavItem to="/settings/team" icon="team" label="Team settings" isCompact={isCompact} />}
      {can(role, 'team.read') && <NavItem to="/settings/robot" icon="robot" label="Robot profile" isCompact={isCompact} />}
      {hasDevInbox && <NavItem to="/dev/inbox" icon="inbox" label="Dev inbox" isCompact={isCompact} />}
    </nav>
  );
}
