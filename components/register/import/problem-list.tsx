'use client';

import { useId, useState } from 'react';
import type { CsvProblem } from '@/lib/register/csv-limits';
import { Pager } from '@/components/ui/pager';
import { n, plural } from './import-client';

const PROBLEMS_PER_PAGE = 100;

export function ProblemList({ problems, invalidRows }: { problems: CsvProblem[]; invalidRows: number }) {
  const headingId = useId();
  const [page, setPage] = useState(0);
  if (!problems.length) {
    return <p className="rounded-md bg-moss-50 px-3 py-2 text-sm text-moss-700">No problems found: every row can be imported.</p>;
  }
  const pages = Math.ceil(problems.length / PROBLEMS_PER_PAGE);
  const first = page * PROBLEMS_PER_PAGE;
  const shown = problems.slice(first, first + PROBLEMS_PER_PAGE);
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap items-baseline justify-between gap-x-4">
        <h3 id={headingId} className="font-semibold">
          Problems
        </h3>
        <p className="text-sm text-ink-muted">
          {plural(problems.length, 'problem')}
          {invalidRows ? ` on ${plural(invalidRows, 'row')}` : ''}
        </p>
      </div>
      <div className="max-h-[28rem] overflow-auto rounded-md border border-paper-rule" tabIndex={0} role="region" aria-labelledby={headingId}>
        <table data-testid="import-problems" className="w-full border-collapse text-left text-sm">
          <caption className="sr-only">
            Problems found in the file, {n(first + 1)} to {n(first + shown.length)} of {n(problems.length)}.
          </caption>
          <thead className="sticky top-0 z-10 bg-paper text-xs text-ink-soft">
            <tr>
              <th scope="col" className="border-b border-paper-rule px-3 py-2 text-right font-semibold">
                Line
              </th>
              <th scope="col" className="border-b border-paper-rule px-3 py-2 font-semibold">
                Column
              </th>
              <th scope="col" className="border-b border-paper-rule px-3 py-2 font-semibold">
                Problem
              </th>
            </tr>
          </thead>
          <tbody>
            {shown.map((p, i) => (
              <tr key={first + i} className="border-t border-paper-rule align-top">
                <td className="num whitespace-nowrap px-3 py-1.5 text-right">{p.line ? p.line : <span className="font-sans text-ink-muted">File</span>}</td>
                <td className="px-3 py-1.5 font-mono text-xs">{p.column ? p.column : <span className="font-sans text-ink-muted">Whole row</span>}</td>
                <td className="px-3 py-1.5">{p.message}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {pages > 1 ? (
        <Pager
          label="Problem pages"
          page={page}
          pageCount={pages}
          onPage={setPage}
          summary={
            <>
              Problems <span className="num">{n(first + 1)}</span>–<span className="num">{n(first + shown.length)}</span> of{' '}
              <span className="num">{n(problems.length)}</span>
            </>
          }
        />
      ) : null}
    </div>
  );
}
