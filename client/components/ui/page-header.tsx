import type { ReactNode } from 'react';

type PageHeaderProps = { eyebrow?: ReactNode; title: string; description?: ReactNode; actions?: ReactNode };

export function PageHeader({ eyebrow, title, description, actions }: PageHeaderProps) {
  return (
    <header className="mb-6 flex flex-wrap items-end justify-between gap-4">
      <div className="min-w-0">
        {eyebrow && <p className="mb-1 text-xs font-semibold tracking-[0.16em] text-signal-400 uppercase">{eyebrow}</p>}
        <h1 className="text-display font-bold text-asphalt-100">{title}</h1>
        {description && <p className="mt-2 max-w-2xl text-base text-asphalt-300">{description}</p>}
      </div>
      {actions}
    </header>
  );
}
