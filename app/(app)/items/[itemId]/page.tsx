import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { can } from '@/lib/auth/policy';
import { SURFACE_LABELS } from '@/lib/domain';
import { DropResults } from '@/components/calculator/drop-results';
import { ConfirmForm } from '@/components/forms/confirm-form';
import { ItemFacts } from '@/components/items/item-facts';
import { ItemForm } from '@/components/items/item-form';
import { ItemHistory } from '@/components/items/item-history';
import { historyEntries } from '@/lib/register/history';
import { StoredResult } from '@/components/items/stored-result';
import { listLadder } from '@/db/consequence-levels';
import { findItem, itemHistory } from '@/db/items';
import { listLevels } from '@/db/levels';
import { deleteItemAction } from '@/lib/actions/register';
import { requireRole } from '@/lib/auth';
import { simulateDrop } from '@/lib/physics';
import { inputsHash, itemDropCase } from '@/lib/register/compute';
import { itemValues } from '@/lib/register/form-values';
import { formatQuantity } from '@/lib/units';

export const metadata: Metadata = { title: 'Item at height' };

const PLOT_SAMPLES = 240;

/** The stored result could not have been computed here; the detail view runs the same case again with plot samples. */
function detail(item: NonNullable<Awaited<ReturnType<typeof findItem>>>) {
  const dropCase = itemDropCase(item, item, PLOT_SAMPLES);
  try {
    return { dropCase, result: simulateDrop(dropCase) };
  } catch {
    return null;
  }
}

export default async function ItemPage({ params, searchParams }: { params: Promise<{ itemId: string }>; searchParams: Promise<{ added?: string }> }) {
  const member = await requireRole('any');
  const [{ itemId }, query] = await Promise.all([params, searchParams]);
  const item = await findItem(member.organisationId, itemId);
  if (!item) notFound();
  const canEdit = can(member, 'register.edit');
  const units = member.unitSystem;
  const [ladder, history, levels] = await Promise.all([
    listLadder(member.organisationId),
    itemHistory(member.organisationId, item),
    listLevels(member.organisationId, item.site_id),
  ]);
  const entries = historyEntries(history, units, new Map(levels.map((l) => [l.id, l.name])));
  const level = ladder.find((l) => l.id === item.consequence_level_id) ?? null;
  const upToDate = item.inputs_hash === inputsHash(itemDropCase(item, item));
  const computed = detail(item);
  const path =
    item.surface === 'water' && item.water_depth_m !== null
      ? `over the sea, ${formatQuantity('length', item.water_depth_m, units)} deep`
      : `over ${SURFACE_LABELS[item.surface].toLowerCase()}`;

  return (
    <div className="flex flex-col gap-6">
      <header className="flex flex-col gap-1">
        <nav aria-label="Breadcrumb" className="text-sm">
          <Link href={`/sites/${item.site_id}`} className="font-semibold text-cord-600 hover:underline">
            ← {item.site_name}
          </Link>
          <span className="text-ink-muted"> · {item.level_name}</span>
        </nav>
        <h1 className="text-2xl font-bold tracking-tight">
          <span className="num">{item.tag}</span> — {item.description}
        </h1>
        <p className="text-sm text-ink-muted">
          Falls from rest {path}, in the site&apos;s design wind; Newton&apos;s quadratic drag law.
        </p>
      </header>
      {query.added ? (
        <p role="status" className="rounded-md bg-moss-50 px-4 py-2 text-sm text-moss-700">
          Added to the register; its fall was computed and stored.
        </p>
      ) : null}

      <StoredResult item={item} level={level} units={units} upToDate={upToDate} />

      {computed ? (
        <details className="rounded-card bg-paper p-1" open>
          <summary className="cursor-pointer px-4 py-2 text-lg font-bold">The fall in detail</summary>
          <div className="px-1 pb-2">
            <DropResults result={computed.result} dropCase={computed.dropCase} units={units} description={`${item.tag} (${item.description})`} updating={false} />
          </div>
        </details>
      ) : null}

      <section className="rounded-card bg-paper-raised p-5 shadow-card" aria-labelledby="inputs-heading">
        <h2 id="inputs-heading" className="mb-3 text-lg font-bold">
          {canEdit ? 'Edit the item' : 'The item'}
        </h2>
        {canEdit ? <ItemForm siteId={item.site_id} id={item.id} initial={itemValues(item, units)} units={units} levels={levels} /> : <ItemFacts item={item} units={units} />}
      </section>

      <section className="rounded-card bg-paper-raised p-5 shadow-card" aria-labelledby="history-heading">
        <h2 id="history-heading" className="mb-3 text-lg font-bold">
          Change history
        </h2>
        <ItemHistory entries={entries} />
      </section>

      {canEdit ? (
        <ConfirmForm action={deleteItemAction} fields={{ id: item.id, site_id: item.site_id }} question={`Delete ${item.tag} from the register?`}>
          Delete this item
        </ConfirmForm>
      ) : null}
    </div>
  );
}
