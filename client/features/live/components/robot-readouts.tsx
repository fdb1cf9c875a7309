import type { ReactNode } from 'react';
import { cx } from '../../../lib/cx';
import type { Readout, RobotTarget } from '../model/live-view';

const TONE = { normal: 'text-asphalt-100', caution: 'text-signal-300', stop: 'text-stop', missing: 'text-asphalt-500' };

function Tile({ label, children, hint }: { label: string; children: ReactNode; hint?: string }) {
  return (
    <div className="min-w-0 rounded-lg bg-asphalt-900 px-3 py-2.5 ring-1 ring-asphalt-750">
      <dt className="text-2xs font-semibold tracking-[0.14em] text-asphalt-400 uppercase">{label}</dt>
      <dd className="mt-0.5 leading-tight break-words">{children}</dd>
      {hint && <dd className="truncate text-2xs text-asphalt-500">{hint}</dd>}
    </div>
  );
}

/** The robot's target and a few numbers a drive team glances at. */
export function RobotReadouts({ readouts, target }: { readouts: readonly Readout[]; target: RobotTarget | undefined }) {
  return (
    <dl className="grid grid-cols-2 gap-2 sm:grid-cols-5">
      <Tile label="Target" hint={target && !target.pose ? 'no position sent' : undefined}>
        <span className={cx('text-lg font-semibold', target ? 'text-go' : 'text-asphalt-500')}>{target?.label ?? '—'}</span>
      </Tile>
      {readouts.map((r) => (
        <Tile key={r.name} label={r.label} hint={r.tone === 'missing' ? 'not sent' : undefined}>
          <span className={cx('font-semibold', r.unit ? 'num text-lg' : 'text-base', TONE[r.tone])}>{r.text}</span>
          {r.unit && <span className="ml-1 text-sm text-asphalt-400">{r.unit}</span>}
        </Tile>
      ))}
    </dl>
  );
}
