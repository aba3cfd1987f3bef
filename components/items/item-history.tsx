import type { AuditRow } from '@/db/types';

const ACTIONS: Record<string, string> = { 'item.created': 'Added', 'item.updated': 'Changed', 'item.deleted': 'Deleted' };

function changes(before: unknown, after: unknown): string[] {
  if (!before || !after || typeof before !== 'object' || typeof after !== 'object') return [];
  const b = before as Record<string, unknown>;
  const a = after as Record<string, unknown>;
  return Object.keys(a).filter((k) => JSON.stringify(a[k] ?? null) !== JSON.stringify(b[k] ?? null));
}

/** Who changed the item and which inputs, newest first; stored SI values, as the audit log keeps them. */
export function ItemHistory({ rows }: { rows: (AuditRow & { actor_name: string | null })[] }) {
  if (!rows.length) return <p className="text-sm text-ink-muted">No recorded changes.</p>;
  return (
    <ol className="flex flex-col gap-2 text-sm" aria-label="Change history">
      {rows.map((r) => {
        const changed = changes(r.before, r.after);
        return (
          <li key={r.id} className="border-t border-paper-rule pt-2 first:border-t-0 first:pt-0">
            <span className="num text-ink-muted">{r.created_at.toISOString().slice(0, 16).replace('T', ' ')}</span>{' '}
            <strong className="font-semibold">{ACTIONS[r.action] ?? r.action}</strong> by {r.actor_name ?? 'a former member'}
            {changed.length ? (
              <ul className="mt-1 flex flex-wrap gap-1.5">
                {changed.map((k) => (
                  <li key={k} className="rounded bg-paper-sunk px-1.5 py-0.5 text-xs">
                    {k}: <span className="num">{JSON.stringify((r.before as Record<string, unknown>)[k] ?? null)}</span> →{' '}
                    <span className="num">{JSON.stringify((r.after as Record<string, unknown>)[k] ?? null)}</span>
                  </li>
                ))}
              </ul>
            ) : null}
          </li>
        );
      })}
    </ol>
  );
}
