import { countIssues, type PanelIssue } from '../../../../shared/domain/panels/check';
import type { PanelDocument } from '../../../../shared/schemas/panel';
import { cx } from '../../../lib/cx';

type CheckListProps = {
  issues: readonly PanelIssue[];
  doc: PanelDocument;
  /** Null when no robot is connected to the relay, so the "robot does not read" rule could not run. */
  robotNote: string;
  onPick: (issue: PanelIssue) => void;
};

/** The panel check as it stands after the latest edit; picking an issue selects its tiles on their page. */
export function CheckList({ issues, doc, robotNote, onPick }: CheckListProps) {
  const { errors, warnings } = countIssues(issues);
  const pageName = (id: string) => doc.pages.find((p) => p.id === id)?.name ?? '';
  return (
    <section aria-labelledby="panel-check-heading" className="flex flex-col gap-2">
      <div className="flex items-center justify-between gap-2">
        <h3 id="panel-check-heading" className="text-sm font-semibold tracking-wide text-asphalt-100">
          Panel check
        </h3>
        <p aria-live="polite" data-testid="check-summary" className="text-sm">
          {issues.length === 0 ? (
            <span className="font-semibold text-go">No problems</span>
          ) : (
            <>
              {errors > 0 && <span className="font-semibold text-stop">{errors === 1 ? '1 error' : `${errors} errors`}</span>}
              {errors > 0 && warnings > 0 && <span className="text-asphalt-500"> · </span>}
              {warnings > 0 && <span className="font-semibold text-signal-300">{warnings === 1 ? '1 warning' : `${warnings} warnings`}</span>}
            </>
          )}
        </p>
      </div>
      {issues.length > 0 && (
        <ul className="flex max-h-72 flex-col gap-1 overflow-y-auto pr-1" aria-label="Problems found">
          {issues.map((issue) => (
            <li key={issue.id}>
              <button
                type="button"
                data-issue-rule={issue.rule}
                onClick={() => onPick(issue)}
                className={cx(
                  'flex w-full items-start gap-2 rounded-lg px-2.5 py-2 text-left text-sm ring-1 ring-inset hover:bg-asphalt-750',
                  issue.severity === 'error' ? 'ring-stop/40' : 'ring-signal-600/50',
                )}
              >
                <span
                  aria-hidden="true"
                  className={cx('mt-0.5 grid size-4 shrink-0 place-items-center rounded-full text-[10px] font-bold text-asphalt-950', issue.severity === 'error' ? 'bg-stop' : 'bg-signal-400')}
                >
                  {issue.severity === 'error' ? '!' : '·'}
                </span>
                <span className="min-w-0">
                  <span className="sr-only">{issue.severity === 'error' ? 'Error: ' : 'Warning: '}</span>
                  <span className="text-asphalt-100">{issue.message}</span>
                  {doc.pages.length > 1 && <span className="block text-xs text-asphalt-400">Page “{pageName(issue.pageId)}”</span>}
                </span>
              </button>
            </li>
          ))}
        </ul>
      )}
      <p className="text-xs text-asphalt-400">{robotNote}</p>
    </section>
  );
}
