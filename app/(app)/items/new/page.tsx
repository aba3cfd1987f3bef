import type { Metadata } from 'next';
import Link from 'next/link';
import { rolesFor } from '@/lib/auth/policy';
import { SITE_KIND_LABELS } from '@/lib/domain';
import { listSites } from '@/db/sites';
import { requireRole } from '@/lib/auth';

export const metadata: Metadata = { title: 'Add to register' };

/** The calculator's "Add to register" lands here to choose the site; the case travels on in the query. */
export default async function ChooseSitePage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const member = await requireRole(rolesFor('register.edit'));
  const [sites, query] = await Promise.all([listSites(member.organisationId), searchParams]);
  const carried = new URLSearchParams();
  for (const [k, v] of Object.entries(query)) if (typeof v === 'string') carried.set(k, v);
  carried.set('from', 'calculator');
  const usable = sites.filter((s) => s.level_count > 0);
  return (
    <div className="flex flex-col gap-6">
      <header className="flex flex-col gap-1">
        <h1 className="text-2xl font-bold tracking-tight">Add to a site&apos;s register</h1>
        <p className="text-sm text-ink-muted">Choose the site the item belongs to; its form opens with the calculator&apos;s object filled in.</p>
      </header>
      <section className="rounded-card bg-paper-raised p-5 shadow-card">
        {usable.length ? (
          <ul className="flex flex-col divide-y divide-paper-rule" aria-label="Sites">
            {usable.map((s) => (
              <li key={s.id} className="flex flex-wrap items-baseline justify-between gap-2 py-3">
                <span>
                  <span className="font-semibold">{s.name}</span>{' '}
                  <span className="text-sm text-ink-muted">
                    {SITE_KIND_LABELS[s.kind]} · {s.level_count} level{s.level_count === 1 ? '' : 's'}
                  </span>
                </span>
                <Link href={`/sites/${s.id}/items/new?${carried.toString()}`} className="rounded-md bg-cord-600 px-3 py-1.5 text-sm font-semibold text-white hover:bg-cord-700">
                  Add to {s.name}
                </Link>
              </li>
            ))}
          </ul>
        ) : (
          <p className="text-sm">
            No site with levels yet.{' '}
            <Link href="/sites" className="font-semibold text-cord-600 underline">
              Create a site
            </Link>{' '}
            and give it a level first.
          </p>
        )}
      </section>
    </div>
  );
}
