import type { ReactNode } from 'react';
import { Icon, type IconName } from './icon';

type EmptyStateProps = { icon: IconName; title: string; children?: ReactNode; action?: ReactNode };

/** What goes where a list or area has nothing to show yet. */
export function EmptyState({ icon, title, children, action }: EmptyStateProps) {
  return (
    <div className="flex flex-col items-center rounded-tile border border-dashed border-asphalt-600 px-6 py-8 text-center">
      <span className="mb-3 grid size-11 place-items-center rounded-full bg-asphalt-800 text-signal-400 ring-1 ring-asphalt-600">
        <Icon name={icon} />
      </span>
      <p className="font-semibold text-asphalt-100">{title}</p>
      {children && <div className="mt-1 max-w-md text-[0.9375rem] text-asphalt-400">{children}</div>}
      {action && <div className="mt-4">{action}</div>}
    </div>
  );
}
