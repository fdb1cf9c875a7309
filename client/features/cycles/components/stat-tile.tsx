import type { ReactNode } from 'react';

/** One figure with its label and a line under it. */
export function StatTile({ label, value, detail }: { label: string; value: ReactNode; detail?: ReactNode }) {
  return (
    <div className="rounded-tile bg-asphalt-800 px-4 py-3 ring-1 ring-asphalt-700">
      <p className="text-xs font-semibold tracking-[0.12em] text-asphalt-400 uppercase">{label}</p>
      <p className="num mt-1 text-2xl font-semibold text-asphalt-100">{value}</p>
      {detail && <p className="mt-0.5 text-sm text-asphalt-400">{detail}</p>}
    </div>
  );
}
