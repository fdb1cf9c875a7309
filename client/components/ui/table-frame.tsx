import type { ReactNode } from 'react';
import { cx } from '../../lib/cx';

export type TableColumn = {
  label: string;
  /** A unit after the label, e.g. "m"; read as part of the header. */
  unit?: string;
  isLabelHidden?: boolean;
  isEnd?: boolean;
};

type TableFrameProps = {
  caption: string;
  columns: readonly TableColumn[];
  /** Tighter header cells, for tables of numbers with many columns. */
  isDense?: boolean;
  children: ReactNode;
};

/** A data table's frame: caption for assistive tech, a header row, and a scrolling body. */
export function TableFrame({ caption, columns, isDense = false, children }: TableFrameProps) {
  return (
    <div className="overflow-x-auto rounded-tile ring-1 ring-asphalt-700">
      <table className="w-full text-left text-[0.9375rem]">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-asphalt-800 text-xs tracking-[0.12em] text-asphalt-400 uppercase">
          <tr>
            {columns.map((c) => (
              <th
                key={c.label}
                scope="col"
                className={cx('py-2.5 font-semibold whitespace-nowrap', isDense ? 'px-2' : 'px-4', c.isEnd && 'text-right')}
              >
                {c.isLabelHidden ? <span className="sr-only">{c.label}</span> : c.label}
                {c.unit && <span className="ml-1 tracking-normal text-asphalt-500 normal-case">{c.unit}</span>}
              </th>
            ))}
          </tr>
        </thead>
        <tbody className="divide-y divide-asphalt-750">{children}</tbody>
      </table>
    </div>
  );
}
