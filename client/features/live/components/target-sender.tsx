import { useId } from 'react';
import { BRANCH_LETTERS } from '../../../../shared/domain/channels';
import { REEF_LEVELS } from '../../../../shared/domain/season/season-profile';
import type { ChannelValue } from '../../../../shared/protocol/messages';
import { Spinner } from '../../../components/ui/spinner';
import type { PublishTrack } from '../../../lib/relay-client';
import { cx } from '../../../lib/cx';
import { sendStatus, type SendPermission } from '../model/live-view';

const STATIONS = [
  { value: 'left', label: 'Left' },
  { value: 'right', label: 'Right' },
] as const;

const STATUS_TONE = { pending: 'text-asphalt-300', go: 'text-go', caution: 'text-signal-300', stop: 'text-stop' };

type GroupProps = {
  legend: string;
  channel: string;
  options: readonly { value: string; label: string }[];
  columns: string;
  current: ChannelValue | undefined;
  track: PublishTrack | undefined;
  isDisabled: boolean;
  onSend: (channel: string, value: string) => void;
};

function ChoiceGroup({ legend, channel, options, columns, current, track, isDisabled, onSend }: GroupProps) {
  const statusId = useId();
  const status = sendStatus(track);
  return (
    <fieldset aria-describedby={statusId} disabled={isDisabled} className="min-w-0">
      <legend className="mb-1.5 flex w-full items-baseline justify-between text-sm font-semibold text-asphalt-200">
        {legend}
        <code className="text-2xs font-normal text-asphalt-500">{channel}</code>
      </legend>
      <div className={cx('grid gap-1.5', columns)}>
        {options.map((o) => {
          const isCurrent = current === o.value;
          return (
            <button
              key={o.value}
              type="button"
              aria-pressed={isCurrent}
              aria-label={`${legend} ${o.label}`}
              onClick={() => onSend(channel, o.value)}
              className={cx(
                'min-h-12 min-w-11 rounded-lg text-lg font-bold transition-colors select-none',
                'disabled:cursor-not-allowed disabled:bg-asphalt-800 disabled:text-asphalt-500 disabled:ring-asphalt-750',
                isCurrent
                  ? 'bg-signal-500 text-asphalt-950 ring-2 ring-signal-300 ring-inset hover:bg-signal-400'
                  : 'bg-asphalt-750 text-asphalt-100 ring-1 ring-asphalt-600 ring-inset hover:bg-asphalt-700 active:bg-asphalt-600',
              )}
            >
              {o.label}
            </button>
          );
        })}
      </div>
      <p id={statusId} aria-live="polite" className={cx('mt-1.5 flex min-h-5 items-center gap-1.5 text-sm font-medium', status && STATUS_TONE[status.tone])}>
        {status?.tone === 'pending' && <Spinner className="size-3.5" />}
        {status?.text}
      </p>
    </fieldset>
  );
}

type TargetSenderProps = {
  permission: SendPermission;
  hasRobot: boolean;
  current: (channel: string) => ChannelValue | undefined;
  track: (channel: string) => PublishTrack | undefined;
  onSend: (channel: string, value: string) => void;
};

/** Branch, level and station buttons that publish to the standard op/ channels and follow each tap to the robot. */
export function TargetSender({ permission, hasRobot, current, track, onSend }: TargetSenderProps) {
  const isDisabled = !permission.canSend;
  const groups: Omit<GroupProps, 'current' | 'track' | 'isDisabled' | 'onSend'>[] = [
    { legend: 'Branch', channel: 'op/reef/branch', options: BRANCH_LETTERS.map((b) => ({ value: b, label: b })), columns: 'grid-cols-6' },
    { legend: 'Level', channel: 'op/reef/level', options: [...REEF_LEVELS].reverse().map((l) => ({ value: l, label: l })), columns: 'grid-cols-4' },
    { legend: 'Coral station', channel: 'op/station', options: STATIONS, columns: 'grid-cols-2' },
  ];
  return (
    <div className="flex flex-col gap-4">
      {!permission.canSend && (
        <p className="rounded-lg bg-asphalt-900 px-3 py-2 text-sm text-asphalt-300 ring-1 ring-asphalt-700">{permission.reason}</p>
      )}
      {permission.canSend && !hasRobot && (
        <p className="rounded-lg bg-asphalt-900 px-3 py-2 text-sm text-asphalt-300 ring-1 ring-asphalt-700">
          No robot is connected: the relay keeps what you send, but nothing will acknowledge it.
        </p>
      )}
      {groups.map((g) => (
        <ChoiceGroup key={g.channel} {...g} current={current(g.channel)} track={track(g.channel)} isDisabled={isDisabled} onSend={onSend} />
      ))}
    </div>
  );
}
