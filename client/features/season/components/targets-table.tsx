import { REEF_LEVELS } from '../../../../shared/domain/season/season-profile';
import type { BranchTarget } from '../../../../shared/domain/season/targets';
import { TableFrame, type TableColumn } from '../../../components/ui/table-frame';
import { cx } from '../../../lib/cx';
import { formatDegrees, formatMetres } from '../../../lib/format-number';

const COLUMNS: readonly TableColumn[] = [
  { label: 'Branch' },
  { label: 'Face' },
  { label: 'x', unit: 'm', isEnd: true },
  { label: 'y', unit: 'm', isEnd: true },
  { label: 'Heading', unit: '°', isEnd: true },
  ...REEF_LEVELS.map((l) => ({ label: l, unit: 'm', isEnd: true })),
];

type TargetsTableProps = {
  targets: readonly BranchTarget[];
  caption: string;
  selectedBranch: string;
  activeBranch: string | null;
  onHover: (branch: string | null) => void;
  onSelect: (branch: string) => void;
};

const numCell = 'num px-2 py-1.5 text-right text-sm whitespace-nowrap';

/** The 12 branch targets. Pointing at a row or focusing its branch button shows it on the field; a click keeps it there. */
export function TargetsTable({ targets, caption, selectedBranch, activeBranch, onHover, onSelect }: TargetsTableProps) {
  return (
    <TableFrame caption={caption} columns={COLUMNS} isDense>
      {targets.map((t) => {
        const isSelected = t.branch === selectedBranch;
        return (
          <tr
            key={t.branch}
            data-branch={t.branch}
            onPointerEnter={() => onHover(t.branch)}
            onPointerLeave={() => onHover(null)}
            onClick={() => onSelect(t.branch)}
            className={cx(
              'cursor-pointer transition-colors',
              t.branch === activeBranch ? 'bg-asphalt-750' : 'bg-asphalt-850 hover:bg-asphalt-800',
              isSelected && 'shadow-[inset_3px_0_0_0_var(--color-signal-500)]',
            )}
          >
            <th scope="row" className="px-1.5 py-1 font-normal">
              <button
                type="button"
                aria-pressed={isSelected}
                aria-label={`Branch ${t.branch}`}
                onFocus={() => onHover(t.branch)}
                onBlur={() => onHover(null)}
                onClick={(e) => {
                  e.stopPropagation();
                  onSelect(t.branch);
                }}
                className={cx(
                  'grid size-9 place-items-center rounded-md text-base font-bold',
                  isSelected ? 'bg-signal-500 text-asphalt-950' : 'text-asphalt-100 ring-1 ring-asphalt-600 ring-inset hover:ring-asphalt-400',
                )}
              >
                {t.branch}
              </button>
            </th>
            <td className="px-2 py-1.5 leading-tight whitespace-nowrap">
              <span className="block text-sm font-semibold text-asphalt-200">{t.face}</span>
              <span className="num block text-2xs text-asphalt-400">tag {t.tagId}</span>
            </td>
            <td className={cx(numCell, 'text-asphalt-100')}>{formatMetres(t.x)}</td>
            <td className={cx(numCell, 'text-asphalt-100')}>{formatMetres(t.y)}</td>
            <td className={cx(numCell, 'text-asphalt-100')}>{formatDegrees(t.headingDeg)}</td>
            {REEF_LEVELS.map((l) => (
              <td key={l} className={cx(numCell, 'text-asphalt-300')}>
                {formatMetres(t.levelHeights[l])}
              </td>
            ))}
          </tr>
        );
      })}
    </TableFrame>
  );
}
