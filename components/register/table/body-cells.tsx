import { flexRender, type Cell, type Row } from '@tanstack/react-table';
import type { RegisterViewRow } from '@/lib/domain';

/** Columns that show the stored result; a row without one writes its reason across them instead. */
const RESULT_CELL_IDS = new Set(['fall_time', 'impact_speed', 'energy', 'drift', 'consequence']);
export const NUMERIC_COLUMNS = new Set(['quantity', 'mass', 'height', 'fall_time', 'impact_speed', 'energy', 'drift']);
/** Stays in view while the table scrolls sideways on narrow screens, so a row is always identifiable. */
export const PINNED_COLUMN = 'tag';
const PINNED_CELL = 'sticky left-0 z-10 border-r bg-paper-raised group-hover:bg-paper';

/** Why a row has no numbers to show, or null when it has them. */
function noResultReason(row: RegisterViewRow): { text: string; failed: boolean } | null {
  if (row.compute_error !== null) return { text: row.compute_error, failed: true };
  if (row.sinks === false) return { text: 'Floats: it does not reach the seabed, so there is no impact to classify.', failed: false };
  return null;
}

export function BodyCells({ row }: { row: Row<RegisterViewRow> }) {
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
  const span = cells.filter((c) => RESULT_CELL_IDS.has(c.column.id)).length;
  const first = cells.findIndex((c) => RESULT_CELL_IDS.has(c.column.id));
  return cells.map((cell, i) => {
    if (!RESULT_CELL_IDS.has(cell.column.id)) return td(cell);
    if (i !== first) return null;
    return (
      <td key={cell.id} colSpan={span} className={`border-t border-paper-rule px-3 py-2 align-top text-sm ${reason.failed ? 'text-flare-700' : 'text-cord-700'}`}>
        {reason.failed ? <strong className="font-semibold">No result: </strong> : null}
        {reason.text}
      </td>
    );
  });
}

