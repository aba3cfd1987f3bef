import type { Metadata } from 'next';
import { can } from '@/lib/auth/policy';
import { SafetyNote } from '@/components/layout/safety-note';
import { SiteForm } from '@/components/sites/site-form';
import { SiteTable } from '@/components/sites/site-table';
import { listLadder } from '@/db/consequence-levels';
import { listSites } from '@/db/sites';
import { requireRole } from '@/lib/auth';
import { siteValues } from '@/lib/register/form-values';

export const metadata: Metadata = { title: 'Sites' };

export default async function SitesPage() {
  const member = await requireRole('any');
  const [sites, ladder] = await Promise.all([listSites(member.organisationId), listLadder(member.organisationId)]);
  const canEdit = can(member, 'register.edit');
  return (
    <div className="flex flex-col gap-6">
      <header className="flex flex-col gap-1">
        <h1 className="text-2xl font-bold tracking-tight">Sites</h1>
        <p className="max-w-3xl text-sm text-ink-muted">
          Each site keeps its register of items at height, level by level, with every item&apos;s fall computed at the
          site&apos;s design wind.
        </p>
      </header>
      <section className="rounded-card bg-paper-raised p-5 shadow-card" aria-label="All sites">
        {sites.length ? (
          <SiteTable sites={sites} ladder={ladder} units={member.unitSystem} />
        ) : (
          <p className="text-sm text-ink-muted">No sites yet.{canEdit ? ' Create the first one below.' : ''}</p>
        )}
      </section>
      {canEdit ? (
        <section className="rounded-card bg-paper-raised p-5 shadow-card">
          <h2 className="mb-3 text-lg font-bold">New site</h2>
          <SiteForm initial={siteValues(null, member.unitSystem)} units={member.unitSystem} />
        </section>
      ) : null}
      <SafetyNote compact />
    </div>
  );
}
