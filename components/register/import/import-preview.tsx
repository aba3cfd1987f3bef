import { useId, useMemo } from 'react';
import { plural, type ImportReport } from './import-client';

export function ImportPreview({ report }: { report: ImportReport }) {
  const captionId = useId();
  const problemsByLine = useMemo(() => {
    const counts = new Map<number, number>();
    for (const p of report.problems) counts.set(p.line, (counts.get(p.line) ?? 0) + 1);
    return counts;
  }, [report.problems]);
  if (!report.preview.length) return null;
  return (
    <div className="flex flex-col gap-2">
      <h3 id={captionId} className="font-semibold">
        First {plural(report.preview.length, 'row')} of the file
      </h3>
      <div className="overflow-x-auto rounded-md border border-paper-rule" tabIndex={0} role="region" aria-labelledby={captionId}>
        <table className="w-full min-w-max border-collapse text-left text-sm">
          <caption className="sr-only">First rows of the file as read, with the line number in the file and any problems on that line.</caption>
          <thead className="bg-paper text-xs text-ink-soft">
            <tr>
              <th scope="col" className="border-b border-paper-rule px-3 py-2 text-right font-semibold">
                Line
              </th>
              <th scope="col" className="border-b border-paper-rule px-3 py-2 font-semibold">
                Check
              </th>
              {report.columns.map((c, i) => (
                <th key={`${c}-${i}`} scope="col" className="whitespace-nowrap border-b border-paper-rule px-3 py-2 font-mono font-semibold">
                  {c}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {report.preview.map((row) => {
              const count = problemsByLine.get(row.line) ?? 0;
              return (
                <tr key={row.line} className={`border-t border-paper-rule ${count ? 'bg-flare-50' : ''}`}>
                  <th scope="row" className="num px-3 py-1.5 text-right font-normal text-ink-muted">
                    {row.line}
                  </th>
                  <td className={`whitespace-nowrap px-3 py-1.5 ${count ? 'font-semibold text-flare-700' : 'text-moss-700'}`}>
                    {count ? plural(count, 'problem') : 'OK'}
                  </td>
                  {report.columns.map((c, i) => {
                    const value = row.cells[c] ?? '';
                    return (
                      <td key={`${c}-${i}`} className="max-w-56 truncate px-3 py-1.5" title={value.length > 30 ? value : undefined}>
                        {value}
                      </td>
                    );
                  })}
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
    </div>
  );
}
