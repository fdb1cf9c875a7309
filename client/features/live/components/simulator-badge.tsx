const SKY_STRIPES = 'repeating-linear-gradient(-45deg, var(--color-sky) 0 6px, var(--color-asphalt-950) 6px 12px)';

/** Marks a simulator session so nobody mistakes it for the real robot. */
export function SimulatorBadge({ robot }: { robot: string }) {
  return (
    <div role="status" className="flex items-stretch overflow-hidden rounded-lg bg-sky-950 ring-2 ring-sky">
      <span aria-hidden="true" className="w-3" style={{ backgroundImage: SKY_STRIPES }} />
      <span className="flex items-center gap-3 px-4 py-2">
        <span className="text-lg font-bold tracking-[0.2em] text-sky uppercase">Simulator</span>
        <span className="text-sm text-asphalt-200">{robot} is the simulator, not a real robot</span>
      </span>
    </div>
  );
}
