import { Spinner } from './spinner';

/** A placeholder while data loads; the label is what a screen reader hears. */
export function Loading({ label = 'Loading…' }: { label?: string }) {
  return (
    <div role="status" className="flex min-h-24 items-center justify-center gap-2.5 text-asphalt-400">
      <Spinner className="size-5 text-signal-500" />
      <span className="text-sm font-medium">{label}</span>
    </div>
  );
}
