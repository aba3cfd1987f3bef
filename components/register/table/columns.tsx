import Link from 'next/link';
import { useMemo } from 'react';
import type { ColumnDef, FilterFn, SortingFn } from '@tanstack/react-table';
import { CATEGORY_LABELS, SECURING_LABELS, SHAPE_LABELS, type ConsequenceLevel, type RegisterViewRow, type SiteLevelRef, type UnitSystem } from '@/lib/domain';
import { formatQuantity, unitLabel, type Quantity } from '@/lib/units';
import { ConsequenceBadge } from '../consequence-badge';
import { ladderById } from '../ladder';

/** The filter value that picks rows with no consequence level (failed, floating or not yet computed). */
export const UNCLASSIFIED = '__unclassified';

// Natural order, so tag T-2 comes before T-10; one collator serves every comparison instead of one per call.
const collator = new Intl.Collator('en-GB', { numeric: true, sensitivity: 'base' });
const textSort: SortingFn<RegisterViewRow> = (a, b, id) => collator.compare(a.getValue<string>(id) ?? '', b.getValue<string>(id) ?? '');

export const matchesSearch: FilterFn<RegisterViewRow> = (row, id, value: string) => row.getValue<string>(id).toLowerCase().includes(value);
matchesSearch.resolveFilterValue = (value: string) => value.trim().toLowerCase();

function equalsKey(key: (row: RegisterViewRow) => string | null): FilterFn<RegisterViewRow> {
  return (row, _id, value: string) => (key(row.original) ?? UNCLASSIFIED) === value;
}

/** In UTC, so the server's first render and the browser's agree whatever the time zones. */
function formatStamp(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : date.toISOString().slice(0, 16).replace('T', ' ');
}

function formatDay(value: string): string {
  return /^\d{4}-\d{2}-\d{2}/.test(value) ? value.slice(0, 10) : value;
}

function Missing() {
  return (
    <>
      <span aria-hidden className="text-ink-faint">
        —
      </span>
      <span className="sr-only">none</span>
    </>
  );
}

export function useColumns(ladder: ConsequenceLevel[], levels: SiteLevelRef[], units: UnitSystem): ColumnDef<RegisterViewRow, unknown>[] {
  return useMemo(() => {
    const rungs = ladderById(ladder);
    const floor = new Map(levels.map((l) => [l.id, l.floor_height_m]));
    const unit = (q: Quantity) => unitLabel(q, units);
    const quantityCell = (q: Quantity) =>
      function QuantityCell({ getValue }: { getValue: () => unknown }) {
        const value = getValue() as number | undefined;
        return value === undefined ? <Missing /> : formatQuantity(q, value, units);
      };
    const byLevelHeight: SortingFn<RegisterViewRow> = (a, b) =>
      (floor.get(a.original.level_id) ?? 0) - (floor.get(b.original.level_id) ?? 0) ||
      collator.compare(a.original.level_name, b.original.level_name);
    const shapeLabels: Record<string, string> = SHAPE_LABELS;

    return [
      {
        id: 'tag',
        header: 'Tag',
        accessorFn: (r) => r.tag,
        sortingFn: textSort,
        enableHiding: false,
        cell: ({ row }) => (
          <Link href={`/items/${row.original.id}`} className="whitespace-nowrap font-semibold text-cord-600 underline hover:text-cord-700">
            {row.original.tag}
          </Link>
        ),
      },
      {
        id: 'description',
        header: 'Description',
        accessorFn: (r) => r.description,
        sortingFn: textSort,
        cell: ({ row }) => <span className="line-clamp-2 min-w-48 max-w-80">{row.original.description}</span>,
      },
      {
        id: 'category',
        header: 'Category',
        accessorFn: (r) => CATEGORY_LABELS[r.category],
        sortingFn: textSort,
        enableGlobalFilter: false,
      },
      {
        id: 'level',
        header: 'Level',
        accessorFn: (r) => r.level_name,
        sortingFn: byLevelHeight,
        filterFn: equalsKey((r) => r.level_id),
        enableGlobalFilter: false,
      },
      { id: 'quantity', header: 'Quantity', accessorFn: (r) => r.quantity, sortingFn: 'basic', enableGlobalFilter: false },
      {
        id: 'mass',
        header: `Mass (${unit('mass')})`,
        accessorFn: (r) => r.mass_kg,
        sortingFn: 'basic',
        enableGlobalFilter: false,
        cell: quantityCell('mass'),
      },
      {
        id: 'height',
        header: `Drop height (${unit('length')})`,
        accessorFn: (r) => r.height_m,
        sortingFn: 'basic',
        enableGlobalFilter: false,
        cell: ({ row }) => (
          <>
            {formatQuantity('length', row.original.height_m, units)}
            {row.original.height_overridden ? null : (
              <span
                title="No height of its own: the fall is computed from its level's floor height."
                className="ml-1.5 rounded bg-paper-sunk px-1 py-px font-sans text-[11px] text-ink-muted"
              >
                from level
              </span>
            )}
          </>
        ),
      },
      {
        id: 'securing',
        header: 'Securing',
        accessorFn: (r) => SECURING_LABELS[r.securing],
        sortingFn: textSort,
        filterFn: equalsKey((r) => r.securing),
        enableGlobalFilter: false,
      },
      {
        id: 'shape',
        header: 'Shape',
        accessorFn: (r) => shapeLabels[r.shape] ?? r.shape,
        sortingFn: textSort,
        enableGlobalFilter: false,
      },
      {
        id: 'fall_time',
        header: `Fall time (${unit('time')})`,
        accessorFn: (r) => r.fall_time_s ?? undefined,
        sortingFn: 'basic',
        sortUndefined: 'last',
        enableGlobalFilter: false,
        cell: quantityCell('time'),
      },
      {
        id: 'impact_speed',
        header: `Impact speed (${unit('speed')})`,
        accessorFn: (r) => r.impact_speed_m_s ?? undefined,
        sortingFn: 'basic',
        sortUndefined: 'last',
        enableGlobalFilter: false,
        cell: quantityCell('speed'),
      },
      {
        id: 'energy',
        header: `Impact energy (${unit('energy')})`,
        accessorFn: (r) => r.effective_energy_j ?? undefined,
        sortingFn: 'basic',
        sortUndefined: 'last',
        enableHiding: false,
        enableGlobalFilter: false,
        cell: quantityCell('energy'),
      },
      {
        id: 'drift',
        header: `Drift (${unit('length')})`,
        // The side the object lands on does not matter to the exclusion zone, only how far.
        accessorFn: (r) => (r.drift_m === null ? undefined : Math.abs(r.drift_m)),
        sortingFn: 'basic',
        sortUndefined: 'last',
        enableGlobalFilter: false,
        cell: quantityCell('length'),
      },
      {
        id: 'consequence',
        header: 'Consequence level',
        accessorFn: (r) => (r.consequence_level_id ? rungs.get(r.consequence_level_id)?.rank : undefined),
        sortingFn: 'basic',
        sortUndefined: 'last',
        filterFn: equalsKey((r) => r.consequence_level_id),
        enableGlobalFilter: false,
        cell: ({ row }) => (
          <ConsequenceBadge level={row.original.consequence_level_id ? (rungs.get(row.original.consequence_level_id) ?? null) : null} />
        ),
      },
      {
        id: 'last_inspected',
        header: 'Last inspected',
        accessorFn: (r) => r.last_inspected ?? undefined,
        sortingFn: textSort,
        sortUndefined: 'last',
        enableGlobalFilter: false,
        cell: ({ row }) =>
          row.original.last_inspected ? (
            <time dateTime={row.original.last_inspected} className="whitespace-nowrap">
              {formatDay(row.original.last_inspected)}
            </time>
          ) : (
            <span className="text-ink-muted">Never</span>
          ),
      },
      {
        id: 'computed_at',
        header: 'Computed (UTC)',
        accessorFn: (r) => (r.computed_at ? Date.parse(r.computed_at) : undefined),
        sortingFn: 'basic',
        sortUndefined: 'last',
        enableGlobalFilter: false,
        cell: ({ row }) =>
          row.original.computed_at ? (
            <time dateTime={row.original.computed_at} className="whitespace-nowrap">
              {formatStamp(row.original.computed_at)}
            </time>
          ) : (
            <span className="text-ink-muted">Not yet</span>
          ),
      },
    ];
  }, [ladder, levels, units]);
}

