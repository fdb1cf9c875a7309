import { cx } from '../../../lib/cx';
import { sortState, type SortField } from '../model/list-query';
import type { RecordingSort } from '../../../../shared/schemas/recording';

type SortHeaderProps = { label: string; field: SortField; sort: RecordingSort; onSort: (field: SortField) => void; isEnd?: boolean };

/** A column header that sorts the list on the server; `aria-sort` tells assistive tech which way. */
export function SortHeader({ label, field, sort, onSort, isEnd = false }: SortHeaderProps) {
  const state = sortState(sort, field);
  return (
    <th scope="col" aria-sort={state} className={cx('px-2.5 py-1 font-semibold whitespace-nowrap', isEnd && 'text-right')}>
      <button
        type="button"
        onClick={() => onSort(field)}
        className={cx(
          'inline-flex min-h-9 items-center gap-1 rounded-md px-1 -mx-1 tracking-[0.12em] uppercase hover:text-asphalt-100',
          state !== 'none' && 'text-signal-300',
        )}
      >
        {label}
        <svg viewBox="0 0 12 12" aria-hidden="true" className="size-3">
          <path d="M3 5 6 2l3 3" fill="none" stroke="currentColor" strokeWidth="1.5" opacity={state === 'ascending' ? 1 : 0.3} />
          <path d="M3 7 6 10l3-3" fill="none" stroke="currentColor" strokeWidth="1.5" opacity={state === 'descending' ? 1 : 0.3} />
        </svg>
      </button>
    </th>
  );
}

/** A header of a column the server can't sort by. */
export function PlainHeader({ label, isEnd = false }: { label: string; isEnd?: boolean }) {
  return (
    <th scope="col" className={cx('px-2.5 py-2.5 font-semibold tracking-[0.12em] whitespace-nowrap uppercase', isEnd && 'text-right')}>
      {label}
    </th>
  );
}
