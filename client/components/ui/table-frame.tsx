import type { ReactNode } from 'react';
import { cx } from '../../lib/cx';

export type TableColumn = { label: string; isLabelHidden?: boolean; isEnd?: boolean };

type TableFrameProps = { caption: string; columns: readonly TableColumn[]; children: ReactNode };

/** A data table's frame: caption for assistive tech, a header row, and a scrolling body. */
export function TableFrame({ caption, columns, children }: TableFrameProps) {
  return (
    <div className="overflow-x-auto rounded-tile ring-1 ring-asphalt-700">
      <table className="w-full text-left text-[0.9375rem]">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-asphalt-800 text-xs tracking-[0.12em] text-asphalt-400 uppercase">
          <tr>
            {columns.map((c) => (
              <th key={c.label} scope="col" className={cx('px-4 py-2.5 font-semibold', c.isEnd && 'text-right')}>
                {c.isLabelHidden ? <span className="sr-only">{c.label}</span> : c.label}
              </th>
            ))}
          </tr>
        </thead>
        <tbody className="divide-y divide-asphalt-750">{children}</tbody>
      </table>
    </div>
  );
}
