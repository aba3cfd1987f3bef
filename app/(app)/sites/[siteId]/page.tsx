import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { can } from '@/lib/auth/policy';
import { SITE_KIND_LABELS, SURFACE_LABELS } from '@/lib/domain';
import { ConfirmForm } from '@/components/forms/confirm-form';
import { LevelForm } from '@/components/sites/level-form';
import { LevelList } from '@/components/sites/level-list';
import { SiteForm } from '@/components/sites/site-form';
import { SummaryStrip } from '@/components/register/summary-strip';
import { SiteRegisterView } from '@/components/sites/site-register-view';
import { listLadder } from '@/db/consequence-levels';
import { listRegister } from '@/db/items';
import { listLevels } from '@/db/levels';
import { findSite } from '@/db/sites';
import { deleteSiteAction } from '@/lib/actions/register';
import { requireRole } from '@/lib/auth';
import { levelValues, siteValues } from '@/lib/register/form-values';
import { packRegister } from '@/lib/register/model';
import { formatQuantity } from '@/lib/units';

export const metadata: Metadata = { title: 'Site register' };

const button = 'rounded-md px-4 py-2 text-sm font-semibold';

export default async function SitePage({ params }: { params: Promise<{ siteId: string }> }) {
  const member = await requireRole('any');
  const { siteId } = await params;
  const site = await findSite(member.organisationId, siteId);
  if (!site) notFound();
  const [levels, rows, ladder] = await Promise.all([
    listLevels(member.organisationId, site.id),
    listRegister(member.organisationId, site.id),
    listLadder(member.organisationId),
  ]);
  const units = member.unitSystem;
  const canEdit = can(member, 'register.edit');
  const levelEntries = levels.map((l) => ({ ...l, values: levelValues(l, site, units) }));

  return (
    <div className="flex flex-col gap-6">
      <header className="flex flex-wrap items-end justify-between gap-4">
        <div className="flex flex-col gap-1">
          <Link href="/sites" className="text-sm font-semibold text-cord-600 hover:underline print:hidden">
            ← Sites
          </Link>
          <h1 className="text-2xl font-bold tracking-tight">{site.name}</h1>
          <p className="text-sm text-ink-soft">
            {SITE_KIND_LABELS[site.kind]}
            {site.location ? ` · ${site.location}` : ''} · design wind <span className="num">{formatQuantity('speed', site.design_wind_m_s, units)}</span>
            {site.surface === 'water' ? (
              <>
                {' '}
                · current <span className="num">{formatQuantity('speed', site.current_m_s, units)}</span>
              </>
            ) : null}{' '}
            · altitude <span className="num">{formatQuantity('length', site.altitude_m, units)}</span> · usually over{' '}
            {SURFACE_LABELS[site.surface].toLowerCase()}
          </p>
        </div>
        <p className="hidden text-xs text-ink-soft print:block" data-testid="print-caution">
          Register printed {new Date().toISOString().slice(0, 10)}. Planning estimates from idealised physics: they support,
          and never replace, the judgement of a competent person under local codes and site rules.
        </p>
        <nav aria-label="Register actions" className="flex flex-wrap gap-2 print:hidden">
          {canEdit && levels.length ? (
            <Link href={`/sites/${site.id}/items/new`} className={`${button} bg-cord-600 text-white hover:bg-cord-700`}>
              Add item
            </Link>
          ) : null}
          {canEdit && levels.length ? (
            <Link href={`/sites/${site.id}/import`} className={`${button} border border-paper-rule bg-paper-raised hover:bg-paper-sunk`}>
              Import CSV
            </Link>
          ) : null}
          <a href={`/api/v1/sites/${site.id}/items.csv`} download className={`${button} border border-paper-rule bg-paper-raised hover:bg-paper-sunk`}>
            Export CSV ({units === 'si' ? 'SI' : 'US'})
          </a>
        </nav>
      </header>

      <SummaryStrip rows={rows} ladder={ladder} units={units} />
      <SiteRegisterView packed={packRegister(rows, levels, ladder)} ladder={ladder} units={units} canEdit={canEdit} />

      <section className="rounded-card bg-paper-raised p-5 shadow-card print:hidden" aria-labelledby="levels-heading">
        <h2 id="levels-heading" className="mb-2 text-lg font-bold">
          Levels and work areas
        </h2>
        <LevelList siteId={site.id} levels={levelEntries} units={units} canEdit={canEdit} />
        {canEdit ? (
          <div className="mt-4 border-t border-paper-rule pt-4">
            <h3 className="mb-2 font-bold">Add a level</h3>
            <LevelForm siteId={site.id} initial={levelValues(null, site, units)} units={units} />
          </div>
        ) : null}
      </section>

      {canEdit ? (
        <details className="rounded-card bg-paper-raised p-5 shadow-card">
          <summary className="cursor-pointer text-lg font-bold">Site details and conditions</summary>
          <p className="mt-2 text-sm text-ink-muted">
            Changing the design wind, current or altitude recomputes every item of this site before it is saved.
          </p>
          <div className="mt-4">
            <SiteForm id={site.id} initial={siteValues(site, units)} units={units} />
          </div>
          <div className="mt-6 border-t border-paper-rule pt-4">
            <ConfirmForm
              action={deleteSiteAction}
              fields={{ id: site.id }}
              question={`Delete the site ${site.name}${rows.length ? ` and its ${rows.length} register line(s)` : ''}? This cannot be undone.`}
            >
              Delete this site
            </ConfirmForm>
          </div>
        </details>
      ) : null}
    </div>
  );
}
