import type { ItemInput } from '@/lib/validation/item';

/**
 * CSV import and export of the register of items at height: what the browser may know of it (the limits and the
 * shapes of an import's answer) without loading the parser. Units travel in the header ("mass_lb"), so a file says
 * what its numbers mean and each quantity column may use either system. The columns are in csv-columns.ts, reading
 * rows and the header in csv-read.ts, turning rows into items in csv-import.ts, writing in csv-write.ts.
 */
export const CSV_LIMITS = { maxBytes: 5 * 1024 * 1024, maxRows: 20_000 } as const;

export interface CsvProblem {
  /** Physical line in the file, 1-based (1 is the header); 0 for the file as a whole. */
  line: number;
  /** The header name as given, or '' for whole-row and file problems. */
  column: string;
  message: string;
}

export interface CsvImport {
  columns: string[];
  total_rows: number;
  valid: { line: number; item: ItemInput }[];
  problems: CsvProblem[];
  invalid_lines: number;
  preview: { line: number; cells: Record<string, string> }[];
  fatal: boolean;
}
