import { NavLink } from 'react-router-dom';
import { Icon, type IconName } from '../components/ui/icon';
import { cx } from '../lib/cx';

type NavItemProps = { to: string; icon: IconName; label: string; isSoon?: boolean; end?: boolean; isCompact?: boolean };

export function NavItem({ to, icon, label, isSoon = false, end = false, isCompact = false }: NavItemProps) {
  return (
    <NavLink
      to={to}
      end={end}
      className={({ isActive }) =>
        cx(
          'group flex min-h-11 items-center gap-3 rounded-lg px-3 text-[0.9375rem] font-semibold transition-colors',
          isCompact && 'shrink-0',
          isActive
            ? 'bg-asphalt-750 text-asphalt-100 shadow-[inset_3px_0_0_0_var(--color-signal-500)]'
            : 'text-asphalt-300 hover:bg-asphalt-800 hover:text-asphalt-100',
        )
      }
    >
      {({ isActive }) => (
        <>
          <Icon name={icon} className={isActive ? 'text-signal-400' : 'text-asphalt-400 group-hover:text-asphalt-200'} />
          <span>{label}</span>
          {isSoon && !isCompact && (
            <span className="ml-auto text-2xs font-semibold tracking-[0.12em] text-asphalt-500 uppercase">Soon</span>
          )}
        </>
      )}
    </NavLink>
  );
}
