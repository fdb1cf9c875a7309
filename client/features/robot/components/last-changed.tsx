import type { StoredRobotProfile } from '../../../../shared/schemas/robot-profile';
import { cx } from '../../../lib/cx';
import { formatDateTime, formatRelative } from '../../../lib/format-time';

/** Who saved the profile last and when; or that nobody has, so these are Pitwall's starting values. */
export function LastChanged({ stored, className }: { stored: StoredRobotProfile; className?: string }) {
  if (stored.updatedAt === null) {
    return (
      <p className={cx('text-sm text-asphalt-400', className)}>
        Not saved yet: these are Pitwall’s starting values, not your robot’s.
      </p>
    );
  }
  return (
    <p className={cx('text-sm text-asphalt-400', className)}>
      Last changed by <span className="font-semibold text-asphalt-200">{stored.updatedByName ?? 'a former member'}</span>,{' '}
      <time dateTime={stored.updatedAt}>{formatDateTime(stored.updatedAt)}</time> ({formatRelative(stored.updatedAt, Date.now())})
    </p>
  );
}
