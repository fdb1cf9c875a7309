import type { RecordingMetadata } from '../../../../shared/schemas/recording';
import { cx } from '../../../lib/cx';
import { stationLabel } from '../model/format';

/**
 * Alliance and station as text on the alliance colour, with a different mark per alliance (a square for blue,
 * a diamond for red), so it reads without telling the colours apart.
 */
export function AllianceChip({ metadata }: { metadata: Pick<RecordingMetadata, 'alliance' | 'station'> }) {
  const label = stationLabel(metadata);
  if (label === null) return <span className="text-asphalt-500">—</span>;
  const isBlue = metadata.alliance === 'blue';
  return (
    <span
      className={cx(
        'inline-flex items-center gap-1.5 rounded-md px-2 py-0.5 text-xs font-semibold tracking-wide whitespace-nowrap ring-1 ring-inset',
        isBlue ? 'bg-alliance-blue/20 text-sky ring-alliance-blue/70' : 'bg-alliance-red/20 text-signal-200 ring-alliance-red/70',
      )}
    >
      <span
        aria-hidden="true"
        className={cx('size-2 shrink-0', isBlue ? 'rounded-[2px] bg-alliance-blue' : 'rotate-45 bg-alliance-red')}
      />
      {label}
    </span>
  );
}
