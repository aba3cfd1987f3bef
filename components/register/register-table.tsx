'use client';

import { useDeferredValue, useId, useMemo, useState } from 'react';
import {
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getPaginationRowModel,
  getSortedRowModel,
  useReactTable,
} from '@tanstack/react-table';
import { SECURING, SECURING_LABELS, type ConsequenceLevel, type RegisterViewRow, type SiteLevelRef, type UnitSystem } from '@/lib/domain';
import { buttonStyles } from '@/components/ui/button';
import { controlStyle, Labelled } from '@/components/ui/labelled';
import { Pager } from '@/components/ui/pager';
import { ladderInOrder } from './ladder';
import { BodyCells, NUMERIC_COLUMNS, PINNED_COLUMN } from './table/body-cells';
import { matchesSearch, UNCLASSIFIED, useColumns } from './table/columns';
import { ColumnChooser, FilterSelect } from './table/toolbar';
import { usePrintEveryRow } from './table/use-print-every-row';

interface Props {
  rows: RegisterViewRow[];
  ladder: ConsequenceLevel[];
  levels: SiteLevelRef[];
  units: UnitSystem;
  /** Editing happens on the item page; the table only links there. */
  canEdit: boolean;
}

const PAGE_SIZES = [25, 50, 100] as const;

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

  usePrintEveryRow(table);
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
    <section aria-labelledby={headingId} className="flex flex-col gap-4 rounded-card bg-paper-raised p-5 shadow-card print:p-0 print:shadow-none">
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
          <div className="flex flex-wrap items-end gap-3 print:hidden" role="search" aria-label="Search and filter the register">
            <Labelled label="Search tag or description" className="min-w-48 flex-[2_1_16rem]">
              {(id) => (
                <input id={id} type="search" value={search} onChange={(e) => setSearch(e.target.value)} placeholder="e.g. T-104 or spanner" className={controlStyle} />
              )}
            </Labelled>
            <FilterSelect column={table.getColumn('level')} label="Level" options={levelOptions} />
            <FilterSelect column={table.getColumn('consequence')} label="Consequence level" options={consequenceOptions} />
            <FilterSelect column={table.getColumn('securing')} label="Securing" options={securingOptions} />
            <div className="ml-auto flex items-end gap-2">
              <button type="button" onClick={clear} disabled={!narrowed} className={buttonStyles.small}>
                Clear
              </button>
              <ColumnChooser columns={table.getAllLeafColumns()} />
            </div>
          </div>

          <p className="text-xs text-ink-muted">
            Impact energy is the effective energy the consequence ladder classifies: in water it includes the water carried
            along with the object. Heights marked “from level” use the level’s floor height.
          </p>

          <div className="overflow-x-auto rounded-md border border-paper-rule print:overflow-visible">
            {/* Separate borders, because collapsed ones stay behind when the pinned column's cells slide. */}
            <table className="w-full min-w-max border-separate border-spacing-0 text-left text-sm print:min-w-0 print:text-[10px]">
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

          <div className="print:hidden">
          <Pager
            label="Register pages"
            page={pageIndex}
            pageCount={table.getPageCount()}
            onPage={(page) => table.setPageIndex(page)}
            summary={
              <>
                Rows <span className="num">{n(firstShown)}</span>–<span className="num">{n(lastShown)}</span> of{' '}
                <span className="num">{n(filtered)}</span>
                {filtered !== rows.length ? (
                  <span className="text-ink-muted">
                    {' '}
                    (filtered from <span className="num">{n(rows.length)}</span>)
                  </span>
                ) : null}
              </>
            }
          >
            <Labelled label="Rows per page" inline>
              {(id) => (
                <select id={id} className={controlStyle} value={pageSize} onChange={(e) => table.setPageSize(Number(e.target.value))}>
                  {PAGE_SIZES.map((size) => (
                    <option key={size} value={size}>
                      {size}
                    </option>
                  ))}
                </select>
              )}
            </Labelled>
          </Pager>
          </div>
        </>
      )}

    </section>
  );
}
