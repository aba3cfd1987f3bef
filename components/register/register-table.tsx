'use client';

import Link from 'next/link';
import { useDeferredValue, useEffect, useId, useMemo, useRef, useState, type ReactNode } from 'react';
import { CATEGORY_LABELS, type ConsequenceLevel, type RegisterViewRow, SECURING, SECURING_LABELS, SHAPE_LABELS, type SiteLevelRef, type UnitSystem } from '@/lib/domain';
import {
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getPaginationRowModel,
  getSortedRowModel,
  useReactTable,
  type Cell,
  type Column,
  type ColumnDef,
  type FilterFn,
  type Row,
  type SortingFn,
} from '@tanstack/react-table';
import { formatQuantity, unitLabel, type Quantity } from '@/lib/units';
import { ConsequenceBadge } from './consequence-badge';
import { ladderById, ladderInOrder } from './ladder';

interface Props {
  rows: RegisterViewRow[];
  ladder: ConsequenceLevel[];
  levels: SiteLevelRef[];
  units: UnitSystem;
  /** Editing happens on the item page; the table only links there. */
  canEdit: boolean;
}

/** The filter value that picks rows with no consequence level (failed, floating or not yet computed). */
const UNCLASSIFIED = '__unclassified';
const PAGE_SIZES = [25, 50, 100] as const;

/** Columns that show the stored result; a row without one writes its reason across them instead. */
const RESULT_COLUMNS = new Set(['fall_time', 'impact_speed', 'energy', 'drift', 'consequence']);
const NUMERIC_COLUMNS = new Set(['quantity', 'mass', 'height', 'fall_time', 'impact_speed', 'energy', 'drift']);
/** Stays in view while the table scrolls sideways on narrow screens, so a row is always identifiable. */
const PINNED_COLUMN = 'tag';
const PINNED_CELL = 'sticky left-0 z-10 border-r bg-paper-raised group-hover:bg-paper';

// Natural order, so tag T-2 comes before T-10; one collator serves every comparison instead of one per call.
const collator = new Intl.Collator('en-GB', { numeric: true, sensitivity: 'base' });
const textSort: SortingFn<RegisterViewRow> = (a, b, id) => collator.compare(a.getValue<string>(id) ?? '', b.getValue<string>(id) ?? '');

const matchesSearch: FilterFn<RegisterViewRow> = (row, id, value: string) => row.getValue<string>(id).toLowerCase().includes(value);
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

/** Why a row has no numbers to show, or null when it has them. */
function noResultReason(row: RegisterViewRow): { text: string; failed: boolean } | null {
  if (row.compute_error !== null) return { text: row.compute_error, failed: true };
  if (row.sinks === false) return { text: 'Floats: it does not reach the seabed, so there is no impact to classify.', failed: false };
  return null;
}

function useColumns(ladder: ConsequenceLevel[], levels: SiteLevelRef[], units: UnitSystem): ColumnDef<RegisterViewRow, unknown>[] {
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

const control = 'rounded-md border border-paper-rule bg-paper-raised px-2.5 py-1.5 text-sm text-ink outline-none focus:border-cord-500 focus:ring-2 focus:ring-cord-100';
const button =
  'rounded-md border border-paper-rule bg-paper-raised px-3 py-1.5 text-sm font-semibold text-ink hover:bg-paper-sunk disabled:cursor-not-allowed disabled:opacity-50';

function Labelled({ label, inline = false, className = '', children }: {
  label: string;
  /** Label beside the control rather than above it. */
  inline?: boolean;
  className?: string;
  children: (id: string) => ReactNode;
}) {
  const id = useId();
  return (
    <div className={`flex ${inline ? 'items-center gap-2' : 'flex-col gap-1'} ${className}`}>
      <label htmlFor={id} className="text-xs font-semibold text-ink-soft">
        {label}
      </label>
      {children(id)}
    </div>
  );
}

function FilterSelect({ column, label, options }: { column: Column<RegisterViewRow, unknown> | undefined; label: string; options: { value: string; label: string }[] }) {
  return (
    <Labelled label={label} className="min-w-40 flex-[1_1_10rem]">
      {(id) => (
        <select
          id={id}
          className={control}
          value={(column?.getFilterValue() as string | undefined) ?? ''}
          onChange={(e) => column?.setFilterValue(e.target.value || undefined)}
        >
          <option value="">All</option>
          {options.map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </select>
      )}
    </Labelled>
  );
}

function ColumnChooser({ columns }: { columns: Column<RegisterViewRow, unknown>[] }) {
  const [open, setOpen] = useState(false);
  const box = useRef<HTMLDetailsElement>(null);
  const summary = useRef<HTMLElement>(null);
  // A native disclosure stays open until its summary is pressed again; a menu-like panel should also close when the
  // user carries on elsewhere on the page.
  useEffect(() => {
    if (!open) return;
    const away = (e: PointerEvent) => {
      if (!box.current?.contains(e.target as Node)) setOpen(false);
    };
    document.addEventListener('pointerdown', away);
    return () => document.removeEventListener('pointerdown', away);
  }, [open]);
  const hideable = columns.filter((c) => c.getCanHide());
  const shown = hideable.filter((c) => c.getIsVisible()).length;
  return (
    <details
      ref={box}
      className="relative"
      open={open}
      onToggle={(e) => setOpen(e.currentTarget.open)}
      onKeyDown={(e) => {
        if (e.key === 'Escape' && open) {
          setOpen(false);
          summary.current?.focus();
        }
      }}
    >
      <summary ref={summary} className={`${button} cursor-pointer list-none whitespace-nowrap [&::-webkit-details-marker]:hidden`}>
        Columns <span className="num font-normal text-ink-muted">({shown}/{hideable.length})</span>
      </summary>
      <fieldset className="absolute right-0 z-20 mt-1 flex w-64 flex-col gap-1.5 rounded-md border border-paper-rule bg-paper-raised p-3 shadow-card">
        <legend className="sr-only">Columns to show</legend>
        <p className="text-xs text-ink-muted">Tag and impact energy are always shown.</p>
        {hideable.map((c) => (
          <label key={c.id} className="flex items-center gap-2 text-sm">
            <input type="checkbox" checked={c.getIsVisible()} onChange={c.getToggleVisibilityHandler()} className="accent-cord-600" />
            {c.columnDef.header as string}
          </label>
        ))}
      </fieldset>
    </details>
  );
}

function BodyCells({ row }: { row: Row<RegisterViewRow> }) {
  const cells = row.getVisibleCells();
  const reason = noResultReason(row.original);
  const td = (cell: Cell<RegisterViewRow, unknown>) => (
    <td
      key={cell.id}
      className={`border-t border-paper-rule px-3 py-2 align-top ${NUMERIC_COLUMNS.has(cell.column.id) ? 'num whitespace-nowrap text-right' : ''} ${
        cell.column.id === PINNED_COLUMN ? PINNED_CELL : ''
      }`}
    >
      {flexRender(cell.column.columnDef.cell, cell.getContext())}
    </td>
  );
  if (!reason) return cells.map(td);
  const span = cells.filter((c) => RESULT_COLUMNS.has(c.column.id)).length;
  const first = cells.findIndex((c) => RESULT_COLUMNS.has(c.column.id));
  return cells.map((cell, i) => {
    if (!RESULT_COLUMNS.has(cell.column.id)) return td(cell);
    if (i !== first) return null;
    return (
      <td key={cell.id} colSpan={span} className={`border-t border-paper-rule px-3 py-2 align-top text-sm ${reason.failed ? 'text-flare-700' : 'text-cord-700'}`}>
        {reason.failed ? <strong className="font-semibold">No result: </strong> : null}
        {reason.text}
      </td>
    );
  });
}

export function RegisterTable({ rows, ladder, levels, units, canEdit }: Props) {
  const [search, setSearch] = useState('');
  // Typing stays responsive on a long register: the filter runs on the deferred value, behind the keystrokes.
  const deferredSearch = useDeferredValue(search);
  const columns = useColumns(ladder, levels, units);
  const ordered = useMemo(() => ladderInOrder(ladder), [ladder]);
  const levelOptions = useMemo(
    () => [...levels].sort((a, b) => b.floor_height_m - a.floor_height_m).map((l) => ({ value: l.id, label: l.name })),
    [levels],
  );
  const consequenceOptions = useMemo(
    () => [...ordered.map((l) => ({ value: l.id, label: l.name })), { value: UNCLASSIFIED, label: 'Not classified' }],
    [ordered],
  );
  const securingOptions = useMemo(() => SECURING.map((s) => ({ value: s, label: SECURING_LABELS[s] })), []);

  const table = useReactTable({
    data: rows,
    columns,
    state: { globalFilter: deferredSearch },
    globalFilterFn: matchesSearch,
    initialState: {
      pagination: { pageIndex: 0, pageSize: PAGE_SIZES[0] },
      // What decides a barricade first: where it is, how hard it lands and how far it drifts; the rest on demand.
      columnOrder: ['tag', 'description', 'level', 'height', 'energy', 'consequence', 'fall_time', 'drift', 'securing', 'impact_speed', 'quantity', 'mass', 'category', 'shape', 'last_inspected', 'computed_at'],
      columnVisibility: { shape: false, category: false, impact_speed: false, mass: false },
    },
    getRowId: (r) => r.id,
    getCoreRowModel: getCoreRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getPaginationRowModel: getPaginationRowModel(),
  });

  const headingId = useId();
  const filtered = table.getFilteredRowModel().rows.length;
  const { pageIndex, pageSize } = table.getState().pagination;
  const firstShown = filtered === 0 ? 0 : pageIndex * pageSize + 1;
  const lastShown = Math.min(filtered, (pageIndex + 1) * pageSize);
  const narrowed = search.trim() !== '' || table.getState().columnFilters.length > 0;
  const visibleCount = table.getVisibleLeafColumns().length;
  const n = (x: number) => x.toLocaleString('en-GB');

  const clear = () => {
    setSearch('');
    table.resetColumnFilters();
  };

  return (
    <section aria-labelledby={headingId} className="flex flex-col gap-4 rounded-card bg-paper-raised p-5 shadow-card">
      <div className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1">
        <h2 id={headingId} className="text-lg font-bold">
          Items at height
        </h2>
        <p className="text-sm text-ink-muted">
          <span className="num">{n(rows.length)}</span> register line{rows.length === 1 ? '' : 's'}
        </p>
      </div>

      {rows.length === 0 ? (
        <p className="rounded-md bg-paper-sunk px-4 py-6 text-center text-sm text-ink-soft">
          No items on the register yet.{' '}
          {canEdit ? 'Items you add to this site appear here with their fall results.' : 'Items an engineer adds to this site appear here with their fall results.'}
        </p>
      ) : (
        <>
          <div className="flex flex-wrap items-end gap-3" role="search" aria-label="Search and filter the register">
            <Labelled label="Search tag or description" className="min-w-48 flex-[2_1_16rem]">
              {(id) => (
                <input id={id} type="search" value={search} onChange={(e) => setSearch(e.target.value)} placeholder="e.g. T-104 or spanner" className={control} />
              )}
            </Labelled>
            <FilterSelect column={table.getColumn('level')} label="Level" options={levelOptions} />
            <FilterSelect column={table.getColumn('consequence')} label="Consequence level" options={consequenceOptions} />
            <FilterSelect column={table.getColumn('securing')} label="Securing" options={securingOptions} />
            <div className="ml-auto flex items-end gap-2">
              <button type="button" onClick={clear} disabled={!narrowed} className={button}>
                Clear
              </button>
              <ColumnChooser columns={table.getAllLeafColumns()} />
            </div>
          </div>

          <p className="text-xs text-ink-muted">
            Impact energy is the effective energy the consequence ladder classifies: in water it includes the water carried
            along with the object. Heights marked “from level” use the level’s floor height.
          </p>

          <div className="overflow-x-auto rounded-md border border-paper-rule">
            {/* Separate borders, because collapsed ones stay behind when the pinned column's cells slide. */}
            <table className="w-full min-w-max border-separate border-spacing-0 text-left text-sm">
              <caption className="sr-only">
                Register of items at height, {n(filtered)} of {n(rows.length)} lines; column headers sort the table.
              </caption>
              <thead className="bg-paper text-xs text-ink-soft">
                {table.getHeaderGroups().map((group) => (
                  <tr key={group.id}>
                    {group.headers.map((header) => {
                      const sorted = header.column.getIsSorted();
                      const numeric = NUMERIC_COLUMNS.has(header.column.id);
                      return (
                        <th
                          key={header.id}
                          scope="col"
                          aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : 'none'}
                          className={`border-paper-rule px-3 py-2 font-semibold ${numeric ? 'text-right' : ''} ${
                            header.column.id === PINNED_COLUMN ? 'sticky left-0 z-10 border-r bg-paper' : ''
                          }`}
                        >
                          <button
                            type="button"
                            onClick={header.column.getToggleSortingHandler()}
                            className={`inline-flex items-center gap-1 whitespace-nowrap rounded hover:text-ink ${numeric ? 'flex-row-reverse' : ''}`}
                          >
                            {flexRender(header.column.columnDef.header, header.getContext())}
                            <span aria-hidden className={`w-3 text-center ${sorted ? 'text-cord-600' : 'text-ink-faint'}`}>
                              {sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : '↕'}
                            </span>
                          </button>
                        </th>
                      );
                    })}
                  </tr>
                ))}
              </thead>
              <tbody>
                {filtered === 0 ? (
                  <tr>
                    <td colSpan={visibleCount} className="border-t border-paper-rule px-3 py-8 text-center text-ink-soft">
                      No items match the search and filters.{' '}
                      <button type="button" onClick={clear} className="font-semibold text-cord-600 underline">
                        Clear them
                      </button>
                    </td>
                  </tr>
                ) : (
                  table.getRowModel().rows.map((row) => (
                    <tr key={row.id} className="group hover:bg-paper">
                      <BodyCells row={row} />
                    </tr>
                  ))
                )}
              </tbody>
            </table>
          </div>

          <nav aria-label="Register pages" className="flex flex-wrap items-center justify-between gap-3 text-sm">
            <p aria-live="polite" className="text-ink-soft">
              Rows <span className="num">{n(firstShown)}</span>–<span className="num">{n(lastShown)}</span> of{' '}
              <span className="num">{n(filtered)}</span>
              {filtered !== rows.length ? (
                <span className="text-ink-muted">
                  {' '}
                  (filtered from <span className="num">{n(rows.length)}</span>)
                </span>
              ) : null}
            </p>
            <div className="flex flex-wrap items-center gap-2">
              <Labelled label="Rows per page" inline>
                {(id) => (
                  <select id={id} className={control} value={pageSize} onChange={(e) => table.setPageSize(Number(e.target.value))}>
                    {PAGE_SIZES.map((size) => (
                      <option key={size} value={size}>
                        {size}
                      </option>
                    ))}
                  </select>
                )}
              </Labelled>
              <button type="button" className={button} onClick={() => table.firstPage()} disabled={!table.getCanPreviousPage()}>
                First
              </button>
              <button type="button" className={button} onClick={() => table.previousPage()} disabled={!table.getCanPreviousPage()}>
                Previous
              </button>
              <span className="px-1 text-ink-soft">
                Page <span className="num">{n(filtered === 0 ? 0 : pageIndex + 1)}</span> of <span className="num">{n(table.getPageCount())}</span>
              </span>
              <button type="button" className={button} onClick={() => table.nextPage()} disabled={!table.getCanNextPage()}>
                Next
              </button>
              <button type="button" className={button} onClick={() => table.lastPage()} disabled={!table.getCanNextPage()}>
                Last
              </button>
            </div>
          </nav>
        </>
      )}

    </section>
  );
}
