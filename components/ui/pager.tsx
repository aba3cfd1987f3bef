import type { ReactNode } from 'react';
import { buttonStyles } from './button';

const count = (x: number) => x.toLocaleString('en-GB');

/**
 * First / previous / next / last over zero-based pages. `summary` says which rows are shown (and is announced as it
 * changes); `children` sit before the buttons, for a page-size choice.
 */
export function Pager({ label, summary, page, pageCount, onPage, children }: {
  label: string;
  summary: ReactNode;
  page: number;
  pageCount: number;
  onPage: (page: number) => void;
  children?: ReactNode;
}) {
  const canBack = page > 0;
  const canForward = page < pageCount - 1;
  return (
    <nav aria-label={label} className="flex flex-wrap items-center justify-between gap-3 text-sm">
      <p aria-live="polite" className="text-ink-soft">
        {summary}
      </p>
      <div className="flex flex-wrap items-center gap-2">
        {children}
        <button type="button" className={buttonStyles.small} onClick={() => onPage(0)} disabled={!canBack}>
          First
        </button>
        <button type="button" className={buttonStyles.small} onClick={() => onPage(page - 1)} disabled={!canBack}>
          Previous
        </button>
        <span className="px-1 text-ink-soft">
          Page <span className="num">{count(pageCount === 0 ? 0 : page + 1)}</span> of <span className="num">{count(pageCount)}</span>
        </span>
        <button type="button" className={buttonStyles.small} onClick={() => onPage(page + 1)} disabled={!canForward}>
          Next
        </button>
        <button type="button" className={buttonStyles.small} onClick={() => onPage(pageCount - 1)} disabled={!canForward}>
          Last
        </button>
      </div>
    </nav>
  );
}
