import { Link } from 'react-router-dom';
import type { PanelSummary } from '../../../../shared/schemas/panel';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { buttonClasses } from '../../../components/ui/button-styles';
import { cx } from '../../../lib/cx';
import { formatDateTime, formatRelative } from '../../../lib/format-time';
import { exportPanelUrl } from '../api/panels';
import { deviceName, exportFileName, publishedState } from '../model/library';

type PanelsTableProps = {
  panels: readonly PanelSummary[];
  canEdit: boolean;
  /** Operators, programmers and leads open a panel in run mode from here. */
  canRun: boolean;
  nowMs: number;
  highlightId: string | null;
  onRename: (panel: PanelSummary) => void;
  onDuplicate: (panel: PanelSummary) => void;
  onDelete: (panel: PanelSummary) => void;
  duplicatingId: string | null;
};

/** The team's panels, newest change first, with what the driver station runs. */
export function PanelsTable({ panels, canEdit, canRun, nowMs, highlightId, onRename, onDuplicate, onDelete, duplicatingId }: PanelsTableProps) {
  const sorted = [...panels].sort((a, b) => b.latestVersion.createdAt.localeCompare(a.latestVersion.createdAt));
  return (
    <div className="overflow-x-auto rounded-tile ring-1 ring-asphalt-700">
      <table className="w-full text-left text-[0.9375rem]">
        <caption className="sr-only">Panels of the team, one row each</caption>
        <thead className="bg-asphalt-800 text-xs tracking-[0.12em] text-asphalt-400 uppercase">
          <tr>
            <th scope="col" className="px-4 py-2.5 font-semibold">Panel</th>
            <th scope="col" className="px-3 py-2.5 font-semibold">Target device</th>
            <th scope="col" className="px-3 py-2.5 font-semibold">Last change</th>
            <th scope="col" className="px-3 py-2.5 font-semibold">Published</th>
            <th scope="col" className="px-4 py-2.5 text-right font-semibold">
              <span className="sr-only">Actions</span>
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-asphalt-750">
          {sorted.map((p) => (
            <PanelRow
              key={p.id}
              panel={p}
              canEdit={canEdit}
              canRun={canRun}
              nowMs={nowMs}
              isHighlighted={p.id === highlightId}
              isDuplicating={p.id === duplicatingId}
              onRename={() => onRename(p)}
              onDuplicate={() => onDuplicate(p)}
              onDelete={() => onDelete(p)}
            />
          ))}
        </tbody>
      </table>
    </div>
  );
}

type PanelRowProps = {
  panel: PanelSummary;
  canEdit: boolean;
  /** Operators, programmers and leads open a panel in run mode from here. */
  canRun: boolean;
  nowMs: number;
  isHighlighted: boolean;
  isDuplicating: boolean;
  onRename: () => void;
  onDuplicate: () => void;
  onDelete: () => void;
};

function PanelRow({ panel: p, canEdit, canRun, nowMs, isHighlighted, isDuplicating, onRename, onDuplicate, onDelete }: PanelRowProps) {
  const published = publishedState(p);
  const latest = p.latestVersion;
  return (
    <tr data-panel-id={p.id} className={cx('bg-asphalt-850 hover:bg-asphalt-800/60', isHighlighted && 'bg-go-950 outline-2 -outline-offset-2 outline-go')}>
      <th scope="row" className="px-4 py-3 font-normal">
        <div className="flex flex-wrap items-center gap-2">
          <Link
            to={`/panels/${p.id}/edit`}
            className="font-semibold text-asphalt-100 underline decoration-asphalt-600 underline-offset-4 hover:text-signal-300 hover:decoration-signal-400"
          >
            {p.name}
          </Link>
          {p.isTeamPanel && <Badge tone="signal">Driver station panel</Badge>}
          {isHighlighted && <Badge tone="go">Just added</Badge>}
        </div>
        <p className="mt-0.5 text-sm text-asphalt-400">
          {p.tileCount === 1 ? '1 tile' : `${p.tileCount} tiles`}
        </p>
      </th>
      <td className="px-3 py-3 whitespace-nowrap text-asphalt-200">
        {deviceName(p.device)}
        <span className="block text-sm text-asphalt-400">{p.device.orientation === 'portrait' ? 'Portrait' : 'Landscape'}</span>
      </td>
      <td className="px-3 py-3">
        <p className="whitespace-nowrap text-asphalt-200">
          <span className="num text-asphalt-100">v{latest.number}</span> · <time dateTime={latest.createdAt} title={formatDateTime(latest.createdAt)}>{formatRelative(latest.createdAt, nowMs)}</time>
        </p>
        <p className="text-sm whitespace-nowrap text-asphalt-400">by {latest.author.name}</p>
      </td>
      <td className="px-3 py-3 whitespace-nowrap" data-testid="published-cell">
        {published.kind === 'none' ? (
          <span className="text-asphalt-500">Not published</span>
        ) : published.kind === 'latest' ? (
          <Badge tone="go">v{published.number} published</Badge>
        ) : (
          <span className="flex flex-col items-start gap-0.5">
            <Badge tone="go">v{published.number} published</Badge>
            <span className="text-xs text-asphalt-400">newer edits in v{published.latest}</span>
          </span>
        )}
      </td>
      <td className="px-4 py-2">
        <div className="flex flex-nowrap justify-end gap-0.5">
          <Link to={`/panels/${p.id}/edit`} className={buttonClasses(canEdit ? 'primary' : 'secondary', 'sm')} aria-label={`${canEdit ? 'Edit' : 'View'} ${p.name}`}>
            {canEdit ? 'Edit' : 'View'}
          </Link>
          {canRun && (
            // A whole page load: run mode is its own light page.
            <a href={`/panels/${p.id}/run`} className={buttonClasses('secondary', 'sm')} aria-label={`Run ${p.name}`} title={p.publishedVersion ? `Runs the published v${p.publishedVersion.number}` : 'Runs the newest version as a draft'}>
              Run
            </a>
          )}
          {canEdit && (
            <>
              <Button size="sm" variant="ghost" onClick={onRename} aria-label={`Rename ${p.name}`}>
                Rename
              </Button>
              <Button size="sm" variant="ghost" onClick={onDuplicate} isPending={isDuplicating} aria-label={`Duplicate ${p.name}`}>
                Duplicate
              </Button>
            </>
          )}
          <a href={exportPanelUrl(p.id)} download={exportFileName(p.name)} className={buttonClasses('ghost', 'sm')} aria-label={`Export ${p.name} as a file`}>
            Export
          </a>
          {canEdit && (
            <Button size="sm" variant="ghost" onClick={onDelete} aria-label={`Delete ${p.name}`} className="text-stop hover:text-stop">
              Delete
            </Button>
          )}
        </div>
      </td>
    </tr>
  );
}
