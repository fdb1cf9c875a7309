import type { Cycle } from '../../../../shared/schemas/cycle';
import { Badge, type BadgeTone } from '../../../components/ui/badge';
import { TableFrame } from '../../../components/ui/table-frame';
import { cx } from '../../../lib/cx';
import { END_LABELS, formatClock, formatSeconds, OUTCOME_LABELS, targetLabel } from '../model/cycles-view';

const OUTCOME_TONES: Record<Cycle['outcome'], BadgeTone> = { scored: 'go', missed: 'stop', dropped: 'stop', unfinished: 'neutral' };
const COLUMNS = [
  { label: 'Cycle' },
  { label: 'Piece' },
  { label: 'Start' },
  { label: 'Duration', isEnd: true },
  { label: 'Acquire', isEnd: true },
  { label: 'Travel', isEnd: true },
  { label: 'Align', isEnd: true },
  { label: 'Place', isEnd: true },
  { label: 'Target called' },
  { label: 'Outcome' },
  { label: 'Points', isEnd: true },
  { label: 'Call → place', isEnd: true },
];

type CyclesTableProps = { cycles: readonly Cycle[]; currentIndex: number | null; onPick: (index: number) => void };

/** Every cycle of the match; the cycle under the timeline cursor is marked, and each row's button moves the cursor to it. */
export function CyclesTable({ cycles, currentIndex, onPick }: CyclesTableProps) {
  return (
    <TableFrame caption="Cycles of this recording" isDense columns={COLUMNS}>
      {cycles.map((c, i) => (
        <tr
          key={c.index}
          aria-current={i === currentIndex ? 'true' : undefined}
          data-cycle-row={c.index}
          className={cx('cursor-pointer hover:bg-asphalt-800 [&>td]:whitespace-nowrap', i === currentIndex && 'bg-signal-950/60 ring-1 ring-inset ring-signal-500/40')}
          onClick={() => onPick(i)}
        >
          <td className="px-2 py-1.5">
            <button
              type="button"
              className="num min-h-11 min-w-11 rounded-md px-1 font-semibold text-signal-300 underline-offset-2 hover:underline focus-visible:outline-2 focus-visible:outline-signal-400"
              aria-label={`Go to cycle ${c.index + 1} at ${formatClock(c.startS)}`}
              onClick={(e) => {
                e.stopPropagation();
                onPick(i);
              }}
            >
              {c.index + 1}
            </button>
          </td>
          <td className="px-2 py-1.5">
            <span className="capitalize">{c.piece}</span>
            <span className="block text-xs text-asphalt-400">{c.isPreload ? 'preload' : c.station === 'reef' ? 'from reef' : c.station ? `${c.station} station` : ''}</span>
          </td>
          <td className="num px-2 py-1.5 whitespace-nowrap">
            {formatClock(c.startS)}
            <span className="block text-xs text-asphalt-500" title={c.crossesPhase ? 'Started in auto, placed in teleop' : undefined}>
              {c.crossesPhase ? 'auto → teleop' : c.phase}
            </span>
          </td>
          <td className="num px-2 py-1.5 text-right font-semibold">{formatSeconds(c.durationS)}</td>
          <td className="num px-2 py-1.5 text-right text-asphalt-300">{formatSeconds(c.segments.acquireS)}</td>
          <td className="num px-2 py-1.5 text-right text-asphalt-300">{formatSeconds(c.segments.travelS)}</td>
          <td className="num px-2 py-1.5 text-right text-asphalt-300">{formatSeconds(c.segments.alignS)}</td>
          <td className="num px-2 py-1.5 text-right text-asphalt-300">{formatSeconds(c.segments.placeS)}</td>
          <td className="num px-2 py-1.5">
            {targetLabel(c.called)}
            {c.isOnTarget === false && (
              <Badge tone="stop" className="ml-1.5">
                reached {targetLabel(c.reached)}
              </Badge>
            )}
          </td>
          <td className="px-2 py-1.5 whitespace-nowrap">
            <Badge tone={OUTCOME_TONES[c.outcome]}>{OUTCOME_LABELS[c.outcome]}</Badge>
            {(c.outcome === 'dropped' || c.outcome === 'unfinished') && <span className="ml-1.5 text-xs text-asphalt-400">{END_LABELS[c.endedBy]}</span>}
          </td>
          <td className="num px-2 py-1.5 text-right">{c.points}</td>
          <td className="num px-2 py-1.5 text-right">{formatSeconds(c.callToPlaceS)}</td>
        </tr>
      ))}
    </TableFrame>
  );
}
