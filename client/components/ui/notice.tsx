import type { ReactNode } from 'react';
import { cx } from '../../lib/cx';

export type NoticeTone = 'error' | 'info' | 'success' | 'caution';

const TONES: Record<NoticeTone, string> = {
  error: 'bg-stop-950 text-asphalt-100 ring-stop/50 [--notice-accent:var(--color-stop)]',
  info: 'bg-sky-950 text-asphalt-100 ring-sky/40 [--notice-accent:var(--color-sky)]',
  success: 'bg-go-950 text-asphalt-100 ring-go/40 [--notice-accent:var(--color-go)]',
  caution: 'bg-signal-950 text-asphalt-100 ring-signal-500/50 [--notice-accent:var(--color-signal-400)]',
};

type NoticeProps = { tone: NoticeTone; title?: string; children?: ReactNode; action?: ReactNode; className?: string };

/** A message in the flow of the page. Errors are announced as they appear. */
export function Notice({ tone, title, children, action, className }: NoticeProps) {
  return (
    <div
      role={tone === 'error' ? 'alert' : 'status'}
      className={cx('flex gap-3 rounded-tile p-3.5 ring-1 ring-inset', TONES[tone], className)}
    >
      <span aria-hidden="true" className="mt-1 w-1 shrink-0 self-stretch rounded-full bg-(--notice-accent)" />
      <div className="min-w-0 flex-1 text-[0.9375rem] leading-snug">
        {title && <p className="font-semibold">{title}</p>}
        {children && <div className={cx('text-asphalt-200', title && 'mt-0.5')}>{children}</div>}
      </div>
      {action && <div className="shrink-0 self-center">{action}</div>}
    </div>
  );
}
