import { useState } from 'react';
import type { Drill } from '../../../../shared/schemas/drill';
import { Button } from '../../../components/ui/button';
import { ButtonLink } from '../../../components/ui/button-link';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { useDeleteDrill } from '../api/drills';
import { paceSummary, planSummary } from '../model/drill-form';

type DrillListProps = {
  drills: readonly Drill[];
  canRun: boolean;
  canEdit: boolean;
  onEdit: (drill: Drill) => void;
};

/** The team's drills with what each member may do with them. */
export function DrillList({ drills, canRun, canEdit, onEdit }: DrillListProps) {
  const [doomed, setDoomed] = useState<Drill | null>(null);
  const remove = useDeleteDrill();
  return (
    <>
      <ul className="grid gap-3 md:grid-cols-2 xl:grid-cols-3">
        {drills.map((d) => (
          <li key={d.id} className="flex min-w-0 flex-col gap-3 rounded-tile bg-asphalt-850 p-4 ring-1 ring-asphalt-700" aria-label={d.name}>
            <div className="min-w-0">
              <div className="flex items-start gap-2">
                <h3 className="min-w-0 flex-1 truncate pt-2 text-lg font-semibold text-asphalt-50">{d.name}</h3>
                {canEdit && (
                  <div className="-mr-2 flex shrink-0">
                    <Button size="sm" variant="ghost" onClick={() => onEdit(d)} aria-label={`Edit ${d.name}`}>
                      Edit
                    </Button>
                    <Button size="sm" variant="ghost" onClick={() => setDoomed(d)} aria-label={`Delete ${d.name}`}>
                      Delete
                    </Button>
                  </div>
                )}
              </div>
              <p className="text-sm text-asphalt-300">{planSummary(d.plan)}</p>
              <p className="text-sm text-asphalt-400">
                {paceSummary(d.pace)} · {d.resultCount} run{d.resultCount === 1 ? '' : 's'}
              </p>
            </div>
            <div className="mt-auto flex flex-wrap gap-2">
              {canRun && (
                <ButtonLink to={`/drills/${d.id}/run`} variant="primary" size="sm" aria-label={`Run ${d.name}`}>
                  Run drill
                </ButtonLink>
              )}
              {canEdit && (
                <ButtonLink to={`/drills/${d.id}/send`} size="sm" aria-label={`Send calls of ${d.name}`}>
                  Send calls
                </ButtonLink>
              )}
            </div>
          </li>
        ))}
      </ul>
      <ConfirmDialog
        isOpen={doomed !== null}
        title={`Delete “${doomed?.name ?? ''}”?`}
        confirmLabel="Delete drill"
        isPending={remove.isPending}
        error={remove.error?.message}
        onCancel={() => {
          setDoomed(null);
          remove.reset();
        }}
        onConfirm={() => doomed && remove.mutate(doomed.id, { onSuccess: () => setDoomed(null) })}
      >
        Its {doomed?.resultCount ?? 0} stored run{doomed?.resultCount === 1 ? '' : 's'} stay in the results under the drill’s name.
      </ConfirmDialog>
    </>
  );
}
