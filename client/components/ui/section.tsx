import { useId, type ReactNode } from 'react';
import { cx } from '../../lib/cx';

type SectionProps = { title: string; description?: ReactNode; actions?: ReactNode; children: ReactNode; className?: string };

/** A titled surface on a page; the heading names the region for assistive tech. */
export function Section({ title, description, actions, children, className }: SectionProps) {
  const headingId = useId();
  return (
    <section
      aria-labelledby={headingId}
      className={cx('rounded-xl bg-asphalt-850 p-5 shadow-lift ring-1 ring-asphalt-750', className)}
    >
      <header className="mb-4 flex flex-wrap items-start justify-between gap-3">
        <div className="min-w-0">
          <h2 id={headingId} className="text-lg font-semibold tracking-wide text-asphalt-100">
            {title}
          </h2>
          {description && <p className="mt-1 max-w-prose text-[0.9375rem] text-asphalt-400">{description}</p>}
        </div>
        {actions}
      </header>
      {children}
    </section>
  );
}
