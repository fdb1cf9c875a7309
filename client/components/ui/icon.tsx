import { cx } from '../../lib/cx';

export type IconName =
  | 'home'
  | 'panels'
  | 'live'
  | 'recordings'
  | 'cycles'
  | 'drills'
  | 'team'
  | 'inbox'
  | 'signOut'
  | 'key'
  | 'mail'
  | 'field'
  | 'robot';

const PATHS: Record<IconName, string> = {
  home: 'M4 11 12 4l8 7M6 9.5V20h4.5v-5h3v5H18V9.5',
  panels: 'M4 4h7v7H4zM13 4h7v4h-7zM13 10h7v10h-7zM4 13h7v7H4z',
  live: 'M12 12h.01M8.5 8.5a5 5 0 0 0 0 7M15.5 8.5a5 5 0 0 1 0 7M5.6 5.6a9 9 0 0 0 0 12.8M18.4 5.6a9 9 0 0 1 0 12.8',
  recordings: 'M3 12h3l2-5 3 10 3-7 2 2h5M3 5v14M21 5v14',
  cycles: 'M20 12a8 8 0 0 1-14.3 4.9M4 12A8 8 0 0 1 18.3 7.1M18.5 3v4.5H14M5.5 21v-4.5H10',
  drills: 'M12 3v3M12 18v3M3 12h3M18 12h3M12 8a4 4 0 1 0 0 8 4 4 0 0 0 0-8Z',
  team: 'M9 11a3.5 3.5 0 1 0 0-7 3.5 3.5 0 0 0 0 7ZM2.5 20a6.5 6.5 0 0 1 13 0M16 4.5a3.5 3.5 0 0 1 0 6.5M18 14.5a6.5 6.5 0 0 1 3.5 5.5',
  inbox: 'M3 13h5l1.5 3h5L16 13h5M5 5h14l2 8v6H3v-6z',
  signOut: 'M15 4h4v16h-4M10 8l-4 4 4 4M6 12h10',
  key: 'M14.5 9.5a4.5 4.5 0 1 1-1.3-3.2M13.2 10.8 20 17.5V20h-2.5v-2h-2v-2h-2',
  mail: 'M3 6h18v12H3zM3 7l9 6.5L21 7',
  field: 'M3 5h18v14H3zM12 5v14M8.5 9.5 10 12l-1.5 2.5h-3L4 12l1.5-2.5zM15.5 9.5h3L20 12l-1.5 2.5h-3L14 12z',
  robot: 'M5 7h14v12H5zM3 9v8M21 9v8M9 11h.01M15 11h.01M9 15h6M12 7V4',
};

export function Icon({ name, className }: { name: IconName; className?: string }) {
  return (
    <svg
      viewBox="0 0 24 24"
      aria-hidden="true"
      className={cx('size-5 shrink-0', className)}
      fill="none"
      stroke="currentColor"
      strokeWidth="1.75"
      strokeLinecap="round"
      strokeLinejoin="round"
    >
      <path d={PATHS[name]} />
    </svg>
  );
}
