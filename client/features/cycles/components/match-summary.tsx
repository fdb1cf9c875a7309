import type { MatchSummary } from '../../../../shared/schemas/cycle';
import { Badge } from '../../../components/ui/badge';
import { TableFrame } from '../../../components/ui/table-frame';
import { formatSeconds } from '../model/cycles-view';
import { StatTile } from './stat-tile';

const CATEGORIES = [
  { key: 'leave', label: 'Leave' },
  { key: 'coral', label: 'Coral' },
  { key: 'algae', label: 'Algae' },
  { key: 'barge', label: 'Barge' },
] as const;
const LEVELS = ['L1', 'L2', 'L3', 'L4'] as const;

function Progress({ label, have, need, unit }: { label: string; have: number; need: number; unit?: string }) {
  const isMet = have >= need;
  return (
    <div className="flex items-center justify-between gap-3 text-sm">
      <span className="text-asphalt-300">{label}</span>
      <span className={isMet ? 'num font-semibold text-go' : 'num text-asphalt-100'}>
        {have} / {need}
        {unit && <span className="ml-1 text-asphalt-500">{unit}</span>}
      </span>
    </div>
  );
}

function RpCard({ title, isEarned, fromMemory, children }: { title: string; isEarned: boolean; fromMemory: boolean; children: React.ReactNode }) {
  return (
    <div className="flex flex-col gap-1.5 rounded-tile bg-asphalt-800 p-3.5 ring-1 ring-asphalt-700">
      <div className="flex flex-wrap items-center gap-2">
        <p className="font-semibold text-asphalt-100">{title}</p>
        {isEarned ? <Badge tone="go">Earned</Badge> : <Badge>Not yet</Badge>}
        {fromMemory && (
          <Badge tone="signal" className="ml-auto">
            Rule from memory
          </Badge>
        )}
      </div>
      {children}
    </div>
  );
}

/** The match summary: headline figures, points by category and phase, and ranking-point progress. */
export function MatchSummaryPanel({ summary }: { summary: MatchSummary }) {
  const { points, outcomes, rankingPoints: rp } = summary;
  const others = [outcomes.missed && `${outcomes.missed} missed`, outcomes.dropped && `${outcomes.dropped} dropped`, outcomes.unfinished && `${outcomes.unfinished} unfinished`].filter(Boolean);
  return (
    <div className="flex flex-col gap-4">
      <div className="grid grid-cols-2 gap-3 md:grid-cols-5">
        <StatTile label="Cycles" value={summary.cycleCount} detail={`${outcomes.scored} scored${others.length ? ` · ${others.join(' · ')}` : ''}`} />
        <StatTile label="Median cycle" value={formatSeconds(summary.cycleTime.medianS)} detail={`over ${summary.cycleTime.count} place attempts`} />
        <StatTile label="p90 cycle" value={formatSeconds(summary.cycleTime.p90S)} detail="9 in 10 were this fast or faster" />
        <StatTile label="Call to place" value={formatSeconds(summary.callToPlace.medianS)} detail="median, call → piece placed" />
        <StatTile label="Points" value={points.total} detail={`auto ${points.byPhase.auto} · teleop ${points.byPhase.teleop}`} />
      </div>
      <div className="grid items-start gap-4 lg:grid-cols-2">
        <div className="flex flex-col gap-3">
          <TableFrame caption="Points by category and phase" isDense columns={[{ label: 'Category' }, { label: 'Auto', isEnd: true }, { label: 'Teleop', isEnd: true }, { label: 'Total', isEnd: true }]}>
            {CATEGORIES.map((c) => (
              <tr key={c.key}>
                <th scope="row" className="px-2 py-2 font-medium text-asphalt-200">
                  {c.label}
                </th>
                <td className="num px-2 py-2 text-right">{points.byCategoryAndPhase.auto[c.key]}</td>
                <td className="num px-2 py-2 text-right">{points.byCategoryAndPhase.teleop[c.key]}</td>
                <td className="num px-2 py-2 text-right font-semibold">{points.byCategory[c.key]}</td>
              </tr>
            ))}
            <tr className="bg-asphalt-800/60">
              <th scope="row" className="px-2 py-2 font-semibold text-asphalt-100">
                Total
              </th>
              <td className="num px-2 py-2 text-right">{points.byPhase.auto}</td>
              <td className="num px-2 py-2 text-right">{points.byPhase.teleop}</td>
              <td className="num px-2 py-2 text-right font-semibold text-signal-300">{points.total}</td>
            </tr>
          </TableFrame>
          <TableFrame caption="Coral by level" isDense columns={[{ label: 'Level' }, ...LEVELS.map((l) => ({ label: l, isEnd: true }))]}>
            <tr>
              <th scope="row" className="px-2 py-2 font-medium text-asphalt-200">
                Coral placed
              </th>
              {LEVELS.map((l) => (
                <td key={l} className="num px-2 py-2 text-right">
                  {points.coralCountByLevel[l]}
                </td>
              ))}
            </tr>
            <tr>
              <th scope="row" className="px-2 py-2 font-medium text-asphalt-200">
                Points
              </th>
              {LEVELS.map((l) => (
                <td key={l} className="num px-2 py-2 text-right">
                  {points.coralByLevel[l]}
                </td>
              ))}
            </tr>
          </TableFrame>
        </div>
        <div className="flex flex-col gap-3">
          <p className="text-sm text-asphalt-400">
            Ranking-point progress from this robot’s events alone: alliance partners and the other alliance’s processor (coopertition) are not in this
            recording. Bonus ranking points earned: <span className="num font-semibold text-asphalt-100">{rp.bonusRankingPoints}</span>.
          </p>
          <RpCard title="Coral RP" isEarned={rp.coral.isEarned} fromMemory={rp.coral.fromMemory}>
            <p className="text-sm text-asphalt-400">
              {rp.coral.neededPerLevel} coral on each of {rp.coral.levelsNeeded} levels · {rp.coral.levelsMet.length} met
            </p>
            {LEVELS.map((l) => (
              <Progress key={l} label={l} have={rp.coral.countByLevel[l]} need={rp.coral.neededPerLevel} />
            ))}
          </RpCard>
          <RpCard title="Auto RP" isEarned={rp.auto.isEarned} fromMemory={rp.auto.fromMemory}>
            <Progress label="Robots left the start" have={rp.auto.leaves} need={rp.auto.leavesNeeded} />
            <Progress label="Coral in auto" have={rp.auto.autoCoral} need={rp.auto.autoCoralNeeded} />
          </RpCard>
          <RpCard title="Barge RP" isEarned={rp.barge.isEarned} fromMemory={rp.barge.fromMemory}>
            <Progress label="Barge points" have={rp.barge.points} need={rp.barge.pointsNeeded} />
          </RpCard>
        </div>
      </div>
    </div>
  );
}
