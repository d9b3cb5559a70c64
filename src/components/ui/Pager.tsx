import { pageCount } from '../../lib/list-params';
import { Button } from './Button';

/** Props of {@link Pager}. */
export interface PagerProps {
  page: number;
  pageSize: number;
  total: number;
  onPage: (page: number) => void;
}

/** "Rows 26–50 of 112" with previous/next buttons. */
export function Pager({ page, pageSize, total, onPage }: PagerProps) {
  const pages = pageCount(total, pageSize);
  const first = total === 0 ? 0 : (page - 1) * pageSize + 1;
  const last = Math.min(total, page * pageSize);
  return (
    <nav
      aria-label="Pages"
      className="flex flex-wrap items-center justify-between gap-3 border-t border-sand-200 px-4 py-3 text-sm text-sand-700"
    >
      <span>
        {total === 0 ? 'No rows' : `Rows ${first}–${last} of ${total}`} · Page {page} of {pages}
      </span>
      <span className="flex gap-2">
        <Button size="sm" variant="secondary" disabled={page <= 1} onClick={() => onPage(page - 1)}>
          Previous
        </Button>
        <Button
          size="sm"
          variant="secondary"
          disabled={page >= pages}
          onClick={() => onPage(page + 1)}
        >
          Next
        </Button>
      </span>
    </nav>
  );
}
