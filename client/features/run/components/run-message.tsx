import type { ReactNode } from 'react';
import { LogoMark } from '../../../components/ui/logo';
import { Spinner } from '../../../components/ui/spinner';

type RunMessageProps = {
  title: string;
  children?: ReactNode;
  tone?: 'neutral' | 'problem';
  isBusy?: boolean;
  action?: ReactNode;
  backHref?: string;
};

/** Run mode's full-screen loading, error and nothing-to-run states. */
export function RunMessage({ title, children, tone = 'neutral', isBusy = false, action, backHref = '/' }: RunMessageProps) {
  return (
    <main className="fixed inset-0 grid place-items-center bg-asphalt-950 p-8 select-none" role={isBusy ? 'status' : undefined}>
      <div className="flex max-w-xl flex-col items-center gap-5 text-center">
        <LogoMark className="size-14" />
        <h1 className={`flex items-center gap-3 text-3xl font-bold ${tone === 'problem' ? 'text-stop' : 'text-asphalt-100'}`}>
          {isBusy ? <Spinner className="size-6 text-signal-500" /> : null}
          {title}
        </h1>
        {children ? <div className="text-lg leading-relaxed text-asphalt-300">{children}</div> : null}
        <div className="mt-2 flex flex-wrap items-center justify-center gap-3">
          {action}
          <a href={backHref} className="inline-flex min-h-12 items-center rounded-lg px-5 text-lg font-semibold text-asphalt-200 ring-1 ring-asphalt-600 hover:bg-asphalt-800">
            Back to Pitwall
          </a>
        </div>
      </div>
    </main>
  );
}
