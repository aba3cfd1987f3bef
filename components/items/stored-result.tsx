import type { ConsequenceLevel, UnitSystem } from '@/lib/domain';
import { ConsequenceBadge } from '@/components/register/consequence-badge';
import type { ItemRow } from '@/db/types';
import { formatQuantity } from '@/lib/units';

function Figure({ label, value, testId }: { label: string; value: string; testId: string }) {
  return (
    <div className="flex flex-col gap-0.5">
      <dt className="text-xs font-semibold uppercase tracking-wide text-ink-muted">{label}</dt>
      <dd className="num text-xl font-semibold" data-testid={testId}>
        {value}
      </dd>
    </div>
  );
}

const at = (d: Date) => d.toISOString().slice(0, 16).replace('T', ' ');

/** The result kept in the register, with what it was computed from and when. */
export function StoredResult({ item, level, units, upToDate }: { item: ItemRow; level: ConsequenceLevel | null; units: UnitSystem; upToDate: boolean }) {
  const q = (quantity: Parameters<typeof formatQuantity>[0], v: number | null) => (v === null ? '—' : formatQuantity(quantity, v, units));
  const inWater = item.effective_energy_j !== null && item.impact_energy_j !== null && item.effective_energy_j !== item.impact_energy_j;
  return (
    <section className="flex flex-col gap-4 rounded-card border-t-4 border-cord-500 bg-paper-raised p-5 shadow-card" aria-labelledby="stored-heading">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 id="stored-heading" className="text-lg font-bold">
          Stored in the register
        </h2>
        <ConsequenceBadge level={level} />
      </div>
      {item.compute_error ? (
        <p role="alert" className="rounded-md bg-flare-50 px-3 py-2 text-sm text-flare-700">
          No result could be computed: {item.compute_error}
        </p>
      ) : (
        <dl className="grid grid-cols-2 gap-4 sm:grid-cols-3 lg:grid-cols-5">
          <Figure label="Fall time" value={q('time', item.fall_time_s)} testId="stored-fall-time" />
          <Figure label="Impact speed" value={q('speed', item.impact_speed_m_s)} testId="stored-impact-speed" />
          <Figure label={inWater ? 'Impact energy (body alone)' : 'Impact energy'} value={q('energy', item.impact_energy_j)} testId="stored-impact-energy" />
          {inWater ? <Figure label="Effective energy in water" value={q('energy', item.effective_energy_j)} testId="stored-effective-energy" /> : null}
          <Figure label="Drift at design wind" value={q('length', item.drift_m)} testId="stored-drift" />
        </dl>
      )}
      {level?.guidance ? (
        <p className="text-sm text-ink-soft">
          <strong className="font-semibold text-ink">{level.name}:</strong> {level.guidance}
        </p>
      ) : null}
      <p className="text-xs text-ink-muted">
        Computed {item.computed_at ? at(item.computed_at) : '—'} UTC with {item.model_version ?? '—'}; inputs{' '}
        <span className="num" title={item.inputs_hash ?? undefined}>
          {item.inputs_hash?.slice(0, 12) ?? '—'}
        </span>
        .{' '}
        {upToDate ? (
          <span className="text-moss-700">Matches the item&apos;s current inputs.</span>
        ) : (
          <span className="font-semibold text-flare-700">Out of date with the current inputs: save the item to recompute.</span>
        )}
      </p>
    </section>
  );
}
