import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { rolesFor } from '@/lib/auth/policy';
import { ImportPanel } from '@/components/register/import-panel';
import { listLevels } from '@/db/levels';
import { findSite } from '@/db/sites';
import { requireRole } from '@/lib/auth';

export const metadata: Metadata = { title: 'Import items' };


export default async function ImportPage({ params }: { params: Promise<{ siteId: string }> }) {
  const member = await requireRole(rolesFor('register.edit'));
  const { siteId } = await params;
  const site = await findSite(member.organisationId, siteId);
  if (!site) notFound();
  const levels = await listLevels(member.organisationId, site.id);
  return (
    <div className="flex flex-col gap-6">
      <header className="flex flex-col gap-1">
        <Link href={`/sites/${site.id}`} className="text-sm font-semibold text-cord-600 hover:underline">
          ← {site.name}
        </Link>
        <h1 className="text-2xl font-bold tracking-tight">Add items to {site.name} from a file</h1>
        <ul className="max-w-3xl list-disc pl-5 text-sm text-ink-muted" data-testid="import-steps">
          <li>Choosing a file only checks it: every row is read and nothing is written.</li>
          <li>
            <strong className="font-semibold text-ink-soft">Import the valid rows</strong> writes the rows without
            problems and skips the rows with problems.
          </li>
          <li>
            <strong className="font-semibold text-ink-soft">Import all rows</strong> writes every row or, if any row has
            a problem, none; it is offered only when every row is valid.
          </li>
        </ul>
      </header>
      <ImportPanel siteId={site.id} siteName={site.name} units={member.unitSystem} levelNames={levels.map((l) => l.name)} />
    </div>
  );
}
