import { Button } from '../../../components/ui/button';
import { pageCount, rangeLabel } from '../model/list-query';

type PagerProps = { page: number; pageSize: number; total: number; onPage: (page: number) => void };

export function Pager({ page, pageSize, total, onPage }: PagerProps) {
  const pages = pageCount(total, pageSize);
  return (
    <nav aria-label="Pages of recordings" className="mt-3 flex flex-wrap items-center justify-between gap-3">
      <p className="num text-sm text-asphalt-400" aria-live="polite">
        {rangeLabel(page, pageSize, total)}
      </p>
      <div className="flex items-center gap-2">
        <Button size="sm" disabled={page <= 1} onClick={() => onPage(page - 1)}>
          Previous
        </Button>
        <span className="num px-1 text-sm text-asphalt-300">
          Page {page} of {pages}
        </span>
        <Button size="sm" disabled={page >= pages} onClick={() => onPage(page + 1)}>
          Next
        </Button>
      </div>
    </nav>
  );
}
