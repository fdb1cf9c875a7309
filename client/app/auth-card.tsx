import type { ReactNode } from 'react';

type AuthCardProps = { title: string; subtitle?: ReactNode; children: ReactNode; footer?: ReactNode };

export function AuthCard({ title, subtitle, children, footer }: AuthCardProps) {
  return (
    <div className="w-full max-w-md">
      <div className="rounded-2xl bg-asphalt-850 p-7 shadow-lift ring-1 ring-asphalt-700">
        <h1 className="text-2xl font-bold text-asphalt-100">{title}</h1>
        {subtitle && <p className="mt-1.5 text-[0.9375rem] text-asphalt-400">{subtitle}</p>}
        <div className="mt-6">{children}</div>
      </div>
      {footer && <div className="mt-5 text-center text-[0.9375rem] text-asphalt-400">{footer}</div>}
    </div>
  );
}
