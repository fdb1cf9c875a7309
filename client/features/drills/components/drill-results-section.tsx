import { useMemo, useState } from 'react';
import type { Drill } from '../../../../shared/schemas/drill';
import { EmptyState } from '../../../components/ui/empty-state';
import { Loading } from '../../../components/ui/loading';
import { QueryError } from '../../../components/ui/query-error';
import { SelectField } from '../../../components/ui/select-field';
import { useDrillResults, usePersonalBests } from '../api/drills';
import { defaultOperatorId, resultOperators } from '../model/results-series';
import { BestsTable } from './bests-table';
import { ResultsChart } from './results-chart';
import { ResultsTable } from './results-table';

/** Results per operator over time (chart and table) and personal bests, filtered by operator and drill. */
export function DrillResultsSection({ drills, myUserId }: { drills: readonly Drill[]; myUserId: string }) {
  const all = useDrillResults({});
  const operators = useMemo(() => resultOperators(all.data?.results ?? []), [all.data]);
  const [chosenOperator, setOperatorId] = useState<string | null>(null);
  const [drillId, setDrillId] = useState('');
  const operatorId = chosenOperator ?? defaultOperatorId(operators, myUserId);
  const filtered = useDrillResults({ operatorId: operatorId || undefined, drillId: drillId || undefined });
  const bests = usePersonalBests({ operatorId: operatorId || undefined, drillId: drillId || undefined });

  if (all.isPending) return <Loading label="Loading results…" />;
  if (all.isError) return <QueryError title="The results could not be loaded" error={all.error} onRetry={() => all.refetch()} isRetrying={all.isFetching} />;
  if (all.data.results.length === 0)
    return (
      <EmptyState icon="drills" title="No drill runs yet">
        Run a drill and its reaction times appear here, per operator over time.
      </EmptyState>
    );
  const results = filtered.data?.results ?? [];
  return (
    <div className="flex flex-col gap-5">
      <div className="flex flex-wrap gap-4">
        <div className="w-60">
          <SelectField label="Operator" name="operator" value={operatorId} onChange={(e) => setOperatorId(e.target.value)}>
            <option value="">Everyone</option>
            {operators.map((o) => (
              <option key={o.id} value={o.id}>
                {o.name}
                {o.id === myUserId ? ' (you)' : ''}
              </option>
            ))}
          </SelectField>
        </div>
        <div className="w-72">
          <SelectField label="Drill" name="drill" value={drillId} onChange={(e) => setDrillId(e.target.value)}>
            <option value="">Every drill</option>
            {drills.map((d) => (
              <option key={d.id} value={d.id}>
                {d.name}
              </option>
            ))}
          </SelectField>
        </div>
      </div>
      {filtered.isError ? (
        <QueryError title="The results could not be loaded" error={filtered.error} onRetry={() => filtered.refetch()} isRetrying={filtered.isFetching} />
      ) : results.length === 0 && !filtered.isPending ? (
        <EmptyState icon="drills" title="No runs match">
          Choose another operator or drill.
        </EmptyState>
      ) : (
        <>
          <ResultsChart results={results} />
          {bests.data && bests.data.bests.length > 0 && (
            <div className="flex flex-col gap-2">
              <h3 className="text-base font-semibold">Personal bests</h3>
              <BestsTable bests={bests.data.bests} />
            </div>
          )}
          <div className="flex flex-col gap-2">
            <h3 className="text-base font-semibold">Recent runs</h3>
            <ResultsTable results={results} />
          </div>
        </>
      )}
    </div>
  );
}
