import type { HistoryEntry } from '@/lib/register/history';

/** Who changed the item and what, newest first, in the reader's units; recomputations say what caused them. */
export function ItemHistory({ entries }: { entries: HistoryEntry[] }) {
  if (!entries.length) return <p className="text-sm text-ink-muted">No recorded changes.</p>;
  return (
    <ol className="flex flex-col gap-2 text-sm" aria-label="Change history">
      {entries.map((e) => (
        <li key={e.id} className="border-t border-paper-rule pt-2 first:border-t-0 first:pt-0">
          <span className="num text-ink-muted">{e.at.toISOString().slice(0, 16).replace('T', ' ')} UTC</span>{' '}
          <strong className="font-semibold">{e.what}</strong> by {e.by}
          {e.changes.length ? (
            <ul className="mt-1 flex flex-wrap gap-1.5">
              {e.changes.map((c) => (
                <li key={c.label} className="rounded bg-paper-sunk px-1.5 py-0.5 text-xs">
                  {c.label}: <span className="num">{c.from}</span> → <span className="num">{c.to}</span>
                </li>
              ))}
            </ul>
          ) : null}
        </li>
      ))}
    </ol>
  );
}
