import type { AuditRow } from '@/db/types';

const ACTION_LABELS: Record<string, string> = {
  'organisation.created': 'Organisation set up',
  'organisation.renamed': 'Organisation renamed',
  'member.invited': 'Member invited',
  'member.role_changed': 'Role changed',
  'member.removed': 'Member removed',
  'user.profile_updated': 'Profile updated',
  'user.password_changed': 'Password changed',
  'site.created': 'Site added',
  'site.updated': 'Site changed',
  'site.deleted': 'Site deleted',
  'level.created': 'Level added',
  'level.updated': 'Level changed',
  'level.deleted': 'Level deleted',
  'item.created': 'Item added',
  'item.updated': 'Item changed',
  'item.deleted': 'Item deleted',
  'items.imported': 'Items imported',
  'ladder.changed': 'Consequence ladder changed',
};

const quoted = (v: unknown) => (typeof v === 'string' && v ? `“${v}”` : '');
const recomputed = (after: Record<string, unknown>) =>
  typeof after.recomputed_items === 'number' && after.recomputed_items > 0 ? `, ${after.recomputed_items} result(s) recomputed` : '';

function summary(row: AuditRow): string {
  const before = (row.before ?? {}) as Record<string, unknown>;
  const after = (row.after ?? {}) as Record<string, unknown>;
  if (row.action === 'member.role_changed') return `${before.role} → ${after.role}`;
  if (row.action === 'member.invited') return `${after.email} as ${after.role}`;
  if (row.action === 'organisation.renamed') return `“${before.name}” → “${after.name}”`;
  // The entity by the name it had: after a change, its new name; after a delete, the name it had before.
  if (/^(site|level)\./.test(row.action)) return `${quoted(after.name ?? before.name)}${recomputed(after)}`;
  if (row.action.startsWith('item.')) return quoted(after.tag ?? before.tag);
  if (row.action === 'items.imported') return `${after.imported} from ${quoted(after.file_name)}`;
  if (row.action === 'ladder.changed' && Array.isArray(after.levels)) return `${after.levels.length} levels, ${after.reclassified_items} item(s) reclassified`;
  return '';
}

export function AuditList({ rows, names }: { rows: AuditRow[]; names: Record<string, string> }) {
  if (!rows.length) return <p className="text-sm text-ink-muted">No changes recorded yet.</p>;
  return (
    <ol className="flex flex-col divide-y divide-paper-rule text-sm">
      {rows.map((row) => (
        <li key={row.id} className="flex flex-wrap gap-x-3 py-2">
          <time className="num text-ink-muted" dateTime={new Date(row.created_at).toISOString()}>
            {new Date(row.created_at).toISOString().slice(0, 16).replace('T', ' ')} UTC
          </time>
          <span className="font-semibold">{ACTION_LABELS[row.action] ?? row.action}</span>
          <span className="text-ink-soft">{summary(row)}</span>
          <span className="ml-auto text-ink-muted">by {row.actor_user_id ? names[row.actor_user_id] ?? 'a former member' : 'system'}</span>
        </li>
      ))}
    </ol>
  );
}
