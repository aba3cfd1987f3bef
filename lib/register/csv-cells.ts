/**
 * Formula escaping for CSV cells. A spreadsheet runs a cell that starts with = + - @ (or their full-width forms,
 * which some spreadsheets fold to ASCII), | (DDE), a tab or a line break as a formula, and it skips leading spaces
 * first; OWASP's advice ("CSV Injection") is to prefix such a cell with an apostrophe, which spreadsheets show as text.
 * The export writes no number with a sign (every one is 0 or more), so only text is ever escaped.
 *
 * Stored text is kept exactly as typed and escaped only on the way out. So that an export reads back exactly, a cell
 * that already starts with apostrophes before a formula character gets one more: `unescapeCell` undoes
 * `escapeCell` for every text, and changes no cell `escapeCell` could not have written.
 */
const RUNS_AS_FORMULA = /^'*\s*[=+\-@|\uFF1D\uFF0B\uFF0D\uFF20\uFF5C\t\r\n]/;

export function escapeCell(cell: string): string {
  return RUNS_AS_FORMULA.test(cell) ? `'${cell}` : cell;
}

/** The text `escapeCell` was given, for a cell `escapeCell` wrote; any other cell as it is. */
export function unescapeCell(cell: string): string {
  return cell.startsWith("'") && RUNS_AS_FORMULA.test(cell.slice(1)) ? cell.slice(1) : cell;
}
