import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { rolesFor } from '@/lib/auth/policy';
import { ItemForm } from '@/components/items/item-form';
import { listLevels } from '@/db/levels';
import { findSite } from '@/db/sites';
import { requireRole } from '@/lib/auth';
import { fromSearchParams } from '@/lib/calculator/url-state';
import { itemValues, itemValuesFromCalculator } from '@/lib/register/form-values';
import { formatQuantity } from '@/lib/units';

export const metadata: Metadata = { title: 'New item' };


export default async function NewItemPage({
  params,
  searchParams,
}: {
  params: Promise<{ siteId: string }>;
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const member = await requireRole(rolesFor('register.edit'));
  const [{ siteId }, query] = await Promise.all([params, searchParams]);
  const site = await findSite(member.organisationId, siteId);
  if (!site) notFound();
  const levels = await listLevels(member.organisationId, site.id);
  const fromCalculator = query.from === 'calculator';
  const calcUnits = query.units === 'us' || query.units === 'si' ? query.units : member.unitSystem;
  const units = fromCalculator ? calcUnits : member.unitSystem;
  const initial = fromCalculator ? itemValuesFromCalculator(fromSearchParams(query, units).values) : itemValues(null, units);
  if (levels.length === 1) initial.level_id = levels[0].id;

  return (
    <div className="flex flex-col gap-6">
      <header className="flex flex-col gap-1">
        <Link href={`/sites/${site.id}`} className="text-sm font-semibold text-cord-600 hover:underline">
          ← {site.name}
        </Link>
        <h1 className="text-2xl font-bold tracking-tight">New item at height</h1>
        <p className="max-w-3xl text-sm text-ink-muted">
          The fall is computed when you save: from rest at the item&apos;s height, in {site.name}&apos;s design wind of{' '}
          <span className="num">{formatQuantity('speed', site.design_wind_m_s, units)}</span>, onto what is below its level.
        </p>
      </header>
      {fromCalculator ? (
        <p role="status" className="rounded-md border-l-4 border-cord-500 bg-cord-50 px-4 py-3 text-sm text-ink-soft">
          Filled from the drop calculator: the object, its mass and its height. The calculator&apos;s medium, wind and release
          speed are not carried over; a register item falls in its site&apos;s conditions. Give it a tag, a description and a level.
        </p>
      ) : null}
      {levels.length ? (
        <section className="rounded-card bg-paper-raised p-5 shadow-card">
          <ItemForm siteId={site.id} initial={initial} units={units} levels={levels} />
        </section>
      ) : (
        <p className="rounded-card bg-paper-raised p-5 text-sm shadow-card">
          {site.name} has no levels yet.{' '}
          <Link href={`/sites/${site.id}`} className="font-semibold text-cord-600 underline">
            Add a level first
          </Link>
          : every item is registered against one.
        </p>
      )}
    </div>
  );
}
