import Link from 'next/link';
import { type ConsequenceLevel, LADDER_COLOURS, type RegisterViewRow, type UnitSystem } from '@/lib/domain';
import { SafetyNote } from '@/components/layout/safety-note';
import { formatQuantity } from '@/lib/units';
import { ConsequenceBadge } from './consequence-badge';
import { boundLabel, ladderById, ladderInOrder } from './ladder';

interface Props {
  rows: RegisterViewRow[];
  ladder: ConsequenceLevel[];
  units: UnitSystem;
}

interface Tally {
  items: number;
  lines: number;
}

const TOP = 10;
const n = (x: number) => x.toLocaleString('en-GB');
const plural = (x: number, word: string) => `${n(x)} ${word}${x === 1 ? '' : 's'}`;

/** One pass over the register: a tally per consequence level, and the highest energies kept as it goes. */
function summarise(rows: RegisterViewRow[]) {
  const byLevel = new Map<string, Tally>();
  const unclassified: Tally = { items: 0, lines: 0 };
  const total: Tally = { items: 0, lines: 0 };
  const top: RegisterViewRow[] = [];
  for (const row of rows) {
    const tally = row.consequence_level_id ? (byLevel.get(row.consequence_level_id) ?? { items: 0, lines: 0 }) : unclassified;
    tally.items += row.quantity;
    tally.lines += 1;
    if (row.consequence_level_id) byLevel.set(row.consequence_level_id, tally);
    total.items += row.quantity;
    total.lines += 1;
    const energy = row.effective_energy_j;
    if (energy === null) continue;
    // Insertion into a list of at most ten: cheaper than sorting a register of thousands.
    if (top.length < TOP || energy > (top[top.length - 1].effective_energy_j ?? 0)) {
      const at = top.findIndex((r) => (r.effective_energy_j ?? 0) < energy);
      top.splice(at === -1 ? top.length : at, 0, row);
      if (top.length > TOP) top.pop();
    }
  }
  return { byLevel, unclassified, total, top };
}

function Segment({ name, tally, total, bound, colour }: { name: string; tally: Tally; total: number; bound: string; colour: string | null }) {
  const share = total > 0 ? (tally.items / total) * 100 : 0;
  return (
    <li
      className={`flex flex-col gap-0.5 border-t-[6px] bg-paper px-3 pt-2 pb-2.5 ${colour ? '' : 'border-dashed border-ink-faint'}`}
      style={colour ? { borderTopColor: colour } : undefined}
    >
      <span className="text-sm font-semibold text-ink">{name}</span>
      <span className="num text-xs text-ink-soft">{bound}</span>
      <span className="num mt-1 text-2xl font-semibold leading-tight text-ink">{n(tally.items)}</span>
      <span className="mb-1.5 text-xs text-ink-muted">
        item{tally.items === 1 ? '' : 's'} in {plural(tally.lines, 'line')}
      </span>
      <span aria-hidden className="mt-auto h-1 w-full overflow-hidden rounded-full bg-paper-sunk">
        <span className="block h-full rounded-full bg-ink-faint" style={{ width: `${share}%` }} />
      </span>
    </li>
  );
}

export function SummaryStrip({ rows, ladder, units }: Props) {
  const ordered = ladderInOrder(ladder);
  const rungs = ladderById(ladder);
  const { byLevel, unclassified, total, top } = summarise(rows);

  return (
    <section aria-label="Register at a glance" className="flex flex-col gap-4 rounded-card bg-paper-raised p-5 shadow-card">
      <div className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1">
        <h2 className="text-lg font-bold">
          Register at a glance
        </h2>
        <p className="text-sm text-ink-soft">
          <strong className="num text-base text-ink">{n(total.items)}</strong> item{total.items === 1 ? '' : 's'} in{' '}
          <strong className="num text-base text-ink">{n(total.lines)}</strong> register line{total.lines === 1 ? '' : 's'}
        </p>
      </div>

      <div className="flex flex-col gap-1.5">
        <h3 className="text-sm font-bold text-ink-soft">Items by consequence level, lowest energies first</h3>
        <ol className="grid grid-cols-[repeat(auto-fit,minmax(7rem,1fr))] gap-1 overflow-hidden rounded-md">
          {ordered.map((level, i) => (
            <Segment
              key={level.id}
              name={level.name}
              tally={byLevel.get(level.id) ?? { items: 0, lines: 0 }}
              total={total.items}
              bound={boundLabel(ordered, i, units)}
              colour={LADDER_COLOURS[level.colour].hex}
            />
          ))}
          {unclassified.lines > 0 ? (
            <Segment name="Not classified" tally={unclassified} total={total.items} bound="no result" colour={null} />
          ) : null}
        </ol>
      </div>

      <div className="flex flex-col gap-1.5">
        <h3 className="text-sm font-bold text-ink-soft">
          {top.length === TOP ? `The ${TOP} highest impact energies` : 'Highest impact energies'}
        </h3>
        {top.length === 0 ? (
          <p className="rounded-md bg-paper-sunk px-3 py-3 text-sm text-ink-soft">
            {rows.length === 0 ? 'No items on the register yet.' : 'No item has a computed result yet.'}
          </p>
        ) : (
          <ol className={`grid gap-x-6 text-sm ${top.length > TOP / 2 ? 'lg:grid-flow-col lg:grid-cols-2 lg:grid-rows-5' : 'lg:max-w-3xl'}`}>
            {top.map((row, i) => (
              <li key={row.id} className="flex min-w-0 flex-wrap items-center gap-x-3 gap-y-0.5 border-t border-paper-rule py-1.5">
                <span className="num w-6 text-right text-ink-muted">{i + 1}</span>
                <Link href={`/items/${row.id}`} className="min-w-16 font-semibold text-cord-600 underline hover:text-cord-700">
                  {row.tag}
                </Link>
                <span className="min-w-0 flex-1 truncate text-ink-muted" title={row.description}>
                  {row.level_name}
                  {row.description ? ` · ${row.description}` : ''}
                </span>
                <ConsequenceBadge level={row.consequence_level_id ? (rungs.get(row.consequence_level_id) ?? null) : null} />
                <span className="num min-w-24 whitespace-nowrap text-right font-semibold">{formatQuantity('energy', row.effective_energy_j ?? 0, units)}</span>
              </li>
            ))}
          </ol>
        )}
      </div>

      <SafetyNote compact />
    </section>
  );
}
