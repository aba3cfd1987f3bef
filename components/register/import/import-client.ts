import { CSV_LIMITS, type CsvProblem } from '@/lib/register/csv-limits';

// What the import route answers, and how the panel talks about it.

export type Mode = 'check' | 'valid-only' | 'all-or-nothing';

export interface ImportReport {
  mode: Mode;
  file_name: string;
  columns: string[];
  total_rows: number;
  valid_rows: number;
  invalid_rows: number;
  problems: CsvProblem[];
  preview: { line: number; cells: Record<string, string> }[];
  imported: number;
}

export interface Issue {
  path: string;
  message: string;
}

export type Answer =
  | { kind: 'done'; report: ImportReport }
  | { kind: 'refused'; status: number; report: ImportReport | null; issues: Issue[] }
  | { kind: 'session' }
  | { kind: 'role' }
  | { kind: 'failed'; message: string };

export const MAX_MB = CSV_LIMITS.maxBytes / 1024 / 1024;
export const n = (x: number) => x.toLocaleString('en-GB');
export const plural = (count: number, one: string, many = `${one}s`) => `${n(count)} ${count === 1 ? one : many}`;

export function formatSize(bytes: number): string {
  if (bytes >= 1024 * 1024) return `${(bytes / 1024 / 1024).toFixed(1)} MB`;
  if (bytes >= 1024) return `${Math.ceil(bytes / 1024)} KB`;
  return plural(bytes, 'byte');
}

/** The one CSV file to check, or what to tell the user about what they chose instead. */
export function pickCsv(files: File[]): { file: File } | { rejection: string } {
  if (files.length > 1) return { rejection: 'Choose one file at a time: the import reads a single CSV file.' };
  const file = files[0];
  if (file.size > CSV_LIMITS.maxBytes) {
    return {
      rejection: `“${file.name}” is ${formatSize(file.size)}; the limit is ${MAX_MB} MB. Split it into smaller files and import them one after another.`,
    };
  }
  // By type or by name: some systems label CSV files as spreadsheets, or give them no type at all.
  if (file.type !== 'text/csv' && !file.name.toLowerCase().endsWith('.csv')) {
    return {
      rejection: `“${file.name}” is not a CSV file. Save the sheet as CSV (comma-separated values, file name ending in .csv) and choose that.`,
    };
  }
  return { file };
}

function isReport(body: unknown): body is ImportReport {
  const b = body as Partial<ImportReport> | null;
  return !!b && typeof b === 'object' && typeof b.total_rows === 'number' && Array.isArray(b.problems) && Array.isArray(b.columns);
}

function issuesOf(body: unknown): Issue[] {
  const b = body as { errors?: unknown; error?: unknown } | null;
  if (b && Array.isArray(b.errors)) {
    return b.errors.filter((e): e is Issue => !!e && typeof (e as Issue).message === 'string');
  }
  if (b && typeof b.error === 'string') return [{ path: '', message: b.error }];
  return [];
}

function where(p: CsvProblem): string {
  if (!p.line) return '';
  return p.column ? `Line ${p.line}, column ${p.column}` : `Line ${p.line}`;
}

function problemsAsIssues(problems: CsvProblem[]): Issue[] {
  return problems.map((p) => ({ path: where(p), message: p.message }));
}

export async function sendImport(siteId: string, file: File, mode: Mode, signal: AbortSignal): Promise<Answer> {
  const body = new FormData();
  body.append('file', file, file.name);
  body.append('mode', mode);
  let response: Response;
  try {
    response = await fetch(`/api/v1/sites/${encodeURIComponent(siteId)}/items/import`, { method: 'POST', body, signal });
  } catch (error) {
    if (signal.aborted) throw error;
    return { kind: 'failed', message: 'The file could not be sent: check the connection and try again.' };
  }
  if (response.status === 401) return { kind: 'session' };
  if (response.status === 403) return { kind: 'role' };
  const json: unknown = await response.json().catch(() => null);
  if (response.ok && isReport(json)) return { kind: 'done', report: json };
  if (response.status === 400 || response.status === 422) {
    const report = isReport(json) ? json : null;
    const issues = issuesOf(json);
    // When the errors restate the file's problems, the problems say more plainly where each one is.
    const restated = report && report.problems.length > 0 && (issues.length === 0 || issues.length === report.problems.length);
    return { kind: 'refused', status: response.status, report, issues: restated ? problemsAsIssues(report.problems) : issues };
  }
  if (response.status === 413) return { kind: 'failed', message: `The file is larger than the server accepts (${MAX_MB} MB): split it and import the parts.` };
  const said = issuesOf(json)[0]?.message;
  return { kind: 'failed', message: said ?? `The server could not handle the file (status ${response.status}). Try again in a moment.` };
}
