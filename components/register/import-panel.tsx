'use client';

import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useCallback, useEffect, useId, useMemo, useRef, useState, type ReactNode } from 'react';
import { ErrorCode, useDropzone, type FileRejection } from 'react-dropzone';
import { DIMENSIONS } from '@/lib/domain';
import { CSV_LIMITS, type CsvProblem } from '@/lib/register/csv';
import { SafetyNote } from '@/components/layout/safety-note';

type Units = 'si' | 'us';
type Mode = 'check' | 'valid-only' | 'all-or-nothing';

interface ImportReport {
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

interface Issue {
  path: string;
  message: string;
}

type Answer =
  | { kind: 'done'; report: ImportReport }
  | { kind: 'refused'; status: number; report: ImportReport | null; issues: Issue[] }
  | { kind: 'session' }
  | { kind: 'role' }
  | { kind: 'failed'; message: string };

type Notice =
  | { kind: 'unreadable'; issues: Issue[] }
  | { kind: 'imported'; count: number; skipped: number }
  | { kind: 'not-written'; issues: Issue[]; problemCount: number }
  | { kind: 'session' }
  | { kind: 'role' }
  | { kind: 'failed'; message: string; during: Mode };

const PROBLEMS_PER_PAGE = 100;
const MAX_MB = CSV_LIMITS.maxBytes / 1024 / 1024;
const n = (x: number) => x.toLocaleString('en-GB');
const plural = (count: number, one: string, many = `${one}s`) => `${n(count)} ${count === 1 ? one : many}`;

function formatSize(bytes: number): string {
  if (bytes >= 1024 * 1024) return `${(bytes / 1024 / 1024).toFixed(1)} MB`;
  if (bytes >= 1024) return `${Math.ceil(bytes / 1024)} KB`;
  return plural(bytes, 'byte');
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

function problemsAsIssues(problems: CsvProblem[]): Issue[] {
  return problems.map((p) => ({ path: where(p), message: p.message }));
}

function where(p: CsvProblem): string {
  if (!p.line) return '';
  return p.column ? `Line ${p.line}, column ${p.column}` : `Line ${p.line}`;
}

async function send(siteId: string, file: File, mode: Mode, signal: AbortSignal): Promise<Answer> {
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

function rejectionMessage(rejections: FileRejection[]): string {
  if (rejections.length > 1 || rejections[0]?.errors.some((e) => e.code === ErrorCode.TooManyFiles)) {
    return 'Choose one file at a time: the import reads a single CSV file.';
  }
  const { file, errors } = rejections[0];
  if (errors.some((e) => e.code === ErrorCode.FileTooLarge)) {
    return `“${file.name}” is ${formatSize(file.size)}; the limit is ${MAX_MB} MB. Split it into smaller files and import them one after another.`;
  }
  if (errors.some((e) => e.code === ErrorCode.FileInvalidType)) {
    return `“${file.name}” is not a CSV file. Save the sheet as CSV (comma-separated values, file name ending in .csv) and choose that.`;
  }
  return `“${file.name}” could not be used: ${errors.map((e) => e.message).join('; ')}.`;
}

const buttonBase = 'inline-flex items-center justify-center rounded-md px-4 py-2 text-sm font-semibold transition disabled:cursor-not-allowed disabled:opacity-50';
const primaryButton = `${buttonBase} bg-cord-600 text-white hover:bg-cord-700 disabled:hover:bg-cord-600`;
const quietButton = `${buttonBase} border border-paper-rule bg-paper-raised text-ink hover:bg-paper-sunk disabled:hover:bg-paper-raised`;
const smallButton =
  'rounded-md border border-paper-rule bg-paper-raised px-3 py-1.5 text-sm font-semibold text-ink hover:bg-paper-sunk disabled:cursor-not-allowed disabled:opacity-50';

export function ImportPanel({ siteId, siteName, units, levelNames }: { siteId: string; siteName: string; units: Units; levelNames: string[] }) {
  const router = useRouter();
  const headingId = useId();
  const [file, setFile] = useState<File | null>(null);
  const [report, setReport] = useState<ImportReport | null>(null);
  // Bumped with every new report, so the problem list starts again at its first page.
  const [reportVersion, setReportVersion] = useState(0);
  const [busy, setBusy] = useState<Mode | null>(null);
  const [notice, setNotice] = useState<Notice | null>(null);
  const [rejection, setRejection] = useState<string | null>(null);
  const inFlight = useRef<AbortController | null>(null);
  const noticeRef = useRef<HTMLDivElement>(null);
  const focusNotice = useRef(false);

  useEffect(() => () => inFlight.current?.abort(), []);

  useEffect(() => {
    // After an import the button pressed may vanish or be disabled; the outcome takes the focus instead of the page.
    if (notice && focusNotice.current) noticeRef.current?.focus();
    focusNotice.current = false;
  }, [notice]);

  const showReport = useCallback((next: ImportReport | null) => {
    setReport(next);
    setReportVersion((v) => v + 1);
  }, []);

  const run = useCallback(
    async (target: File, mode: Mode) => {
      inFlight.current?.abort();
      const controller = new AbortController();
      inFlight.current = controller;
      setBusy(mode);
      setNotice(null);
      let answer: Answer;
      try {
        answer = await send(siteId, target, mode, controller.signal);
      } catch {
        return;
      } finally {
        if (inFlight.current === controller) {
          inFlight.current = null;
          setBusy(null);
        }
      }
      if (controller.signal.aborted) return;
      focusNotice.current = mode !== 'check';
      switch (answer.kind) {
        case 'done':
          showReport(answer.report);
          if (mode !== 'check') {
            setNotice({ kind: 'imported', count: answer.report.imported, skipped: answer.report.invalid_rows });
            router.refresh();
          }
          return;
        case 'refused': {
          if (answer.report) showReport(answer.report);
          else if (mode === 'check') showReport(null);
          if (mode === 'check') {
            setNotice({ kind: 'unreadable', issues: answer.issues });
          } else {
            setNotice({ kind: 'not-written', issues: answer.issues, problemCount: answer.report?.problems.length ?? 0 });
          }
          return;
        }
        case 'failed':
          setNotice({ kind: 'failed', message: answer.message, during: mode });
          return;
        default:
          setNotice(answer);
      }
    },
    [siteId, router, showReport],
  );

  const choose = useCallback(
    (accepted: File[], rejected: FileRejection[]) => {
      if (rejected.length || accepted.length !== 1) {
        if (rejected.length) setRejection(rejectionMessage(rejected));
        return;
      }
      setRejection(null);
      setFile(accepted[0]);
      showReport(null);
      void run(accepted[0], 'check');
    },
    [run, showReport],
  );

  const { getRootProps, getInputProps, open, isDragActive } = useDropzone({
    onDrop: choose,
    accept: { 'text/csv': ['.csv'] },
    maxSize: CSV_LIMITS.maxBytes,
    multiple: false,
    noClick: true,
    noKeyboard: true,
    useFsAccessApi: false,
    disabled: busy !== null,
  });

  const fatal = notice?.kind === 'unreadable';
  const imported = notice?.kind === 'imported';
  const status = statusText(busy, file, report, fatal);
  const rejectionId = `${headingId}-rejection`;

  return (
    <section aria-labelledby={headingId} className="flex flex-col gap-5 rounded-card bg-paper-raised p-5 shadow-card">
      <div className="flex flex-col gap-1">
        <h2 id={headingId} className="text-lg font-bold">
          Import items from a CSV file
        </h2>
        <p className="text-sm text-ink-soft">
          Plumbline checks the whole file first and writes nothing until you choose how to import it.
        </p>
      </div>

      <div
        {...getRootProps({
          role: 'group',
          'aria-label': 'Drop zone for the CSV file',
          'aria-describedby': rejection ? rejectionId : undefined,
        })}
        className={`flex flex-col items-center gap-3 rounded-card border-2 border-dashed px-5 py-8 text-center transition ${
          isDragActive ? 'border-cord-500 bg-cord-50' : rejection ? 'border-flare-500 bg-flare-50' : 'border-paper-rule bg-paper'
        } ${busy ? 'opacity-70' : ''}`}
      >
        <input {...getInputProps({ 'aria-label': 'CSV file to import' })} />
        <p className="text-sm text-ink-soft">
          {isDragActive ? (
            <strong className="font-semibold text-cord-700">Release to check this file.</strong>
          ) : (
            <>
              Drag and drop a CSV file here, or choose one. Files up to <span className="num">{MAX_MB}</span> MB and{' '}
              <span className="num">{n(CSV_LIMITS.maxRows)}</span> rows.
            </>
          )}
        </p>
        <button type="button" onClick={() => open()} disabled={busy !== null} className={primaryButton}>
          Choose a CSV file
        </button>
        {file ? (
          <p className="text-xs text-ink-muted">
            Current file: <span className="font-semibold text-ink-soft">{file.name}</span> ({formatSize(file.size)})
          </p>
        ) : null}
        {rejection ? (
          <p id={rejectionId} role="alert" className="text-sm font-semibold text-flare-700">
            {rejection}
          </p>
        ) : null}
      </div>

      <TemplateHelp siteId={siteId} units={units} levelNames={levelNames} />

      <p role="status" aria-live="polite" className={status ? 'flex items-center gap-2 text-sm text-ink-soft' : 'sr-only'}>
        {busy ? <span className="h-4 w-4 animate-spin rounded-full border-2 border-cord-500 border-t-transparent" aria-hidden /> : null}
        {status}
      </p>

      {notice ? (
        <div ref={noticeRef} tabIndex={-1} className="outline-none">
          <NoticeView notice={notice} siteId={siteId} siteName={siteName} />
        </div>
      ) : null}

      {report && !fatal ? (
        <>
          <Summary report={report} />
          {!imported ? (
            <ImportActions
              report={report}
              busy={busy}
              onImport={(mode) => {
                if (file) void run(file, mode);
              }}
              onChooseAnother={() => open()}
            />
          ) : (
            <div>
              <button type="button" onClick={() => open()} disabled={busy !== null} className={quietButton}>
                Choose another file
              </button>
            </div>
          )}
          <Preview report={report} />
          <ProblemList key={reportVersion} problems={report.problems} invalidRows={report.invalid_rows} />
        </>
      ) : null}

      {fatal ? (
        <div>
          <button type="button" onClick={() => open()} disabled={busy !== null} className={quietButton}>
            Choose another file
          </button>
        </div>
      ) : null}

      <SafetyNote compact />
    </section>
  );
}

function statusText(busy: Mode | null, file: File | null, report: ImportReport | null, fatal: boolean): string {
  if (busy === 'check') return `Checking ${file?.name ?? 'the file'}…`;
  if (busy) return `Importing ${file?.name ?? 'the file'}…`;
  if (!report || fatal || report.mode !== 'check') return '';
  const withProblems = report.invalid_rows ? `, ${plural(report.invalid_rows, 'row')} with problems` : ', no problems';
  return `Checked ${report.file_name}: ${plural(report.total_rows, 'row')}, ${n(report.valid_rows)} valid${withProblems}.`;
}

function TemplateHelp({ siteId, units, levelNames }: { siteId: string; units: Units; levelNames: string[] }) {
  const either = (si: string, us: string) => (
    <>
      <code className="num">{units === 'si' ? si : us}</code> or <code className="num">{units === 'si' ? us : si}</code>
    </>
  );
  const templates = [
    { units: 'si' as const, label: 'Metric template', detail: 'kg, m' },
    { units: 'us' as const, label: 'US customary template', detail: 'lb, ft' },
  ].sort((a, b) => Number(b.units === units) - Number(a.units === units));
  return (
    <div className="flex flex-col gap-2 rounded-md border border-paper-rule px-4 py-3 text-sm text-ink-soft">
      <p className="flex flex-wrap items-center gap-x-3 gap-y-1">
        <span className="font-semibold text-ink">Start from a template:</span>
        {templates.map((t) => (
          <a key={t.units} href={`/sites/${encodeURIComponent(siteId)}/import/template?units=${t.units}`} download className="font-semibold text-cord-600 underline hover:text-cord-700">
            {t.label} <span className="font-normal text-ink-muted">({t.detail})</span>
          </a>
        ))}
      </p>
      <p>
        The first row names the columns. Required: <code>tag</code>, <code>description</code>, <code>category</code>, mass,{' '}
        <code>shape</code>, <code>level</code> and <code>securing</code>. Optional: <code>quantity</code>, dimensions,{' '}
        <code>cd</code> (drag coefficient), area, volume, height, <code>last_inspected</code> and <code>notes</code>.
      </p>
      <p>
        Units go in the header, so each column says what its numbers mean: {either('mass_kg', 'mass_lb')},{' '}
        {either('height_m', 'height_ft')}, {either('dim_length_m', 'dim_length_ft')} (dimensions are{' '}
        {DIMENSIONS.map((d, i) => (
          <span key={d}>
            {i ? (i === DIMENSIONS.length - 1 ? ' or ' : ', ') : ''}
            <code>dim_{d}</code>
          </span>
        ))}
        ), {either('area_m2', 'area_ft2')}, {either('volume_m3', 'volume_ft3')}. Result columns from an export are accepted and
        ignored: falls are computed again on import.
      </p>
      <p>
        Each tag must be new to this site.{' '}
        {levelNames.length ? (
          <>
            Level names must match this site’s levels (capitals do not matter):{' '}
            <span className="font-semibold text-ink">{levelNames.join(', ')}</span>.
          </>
        ) : (
          <>This site has no levels yet, and every item names the level it is on: add the site’s levels before importing.</>
        )}
      </p>
    </div>
  );
}

function IssueList({ issues, limit, rest = '' }: { issues: Issue[]; limit: number; rest?: string }) {
  if (!issues.length) return null;
  const shown = issues.slice(0, limit);
  return (
    <>
      <ul className="ml-5 list-disc">
        {shown.map((issue, i) => (
          <li key={i}>
            {issue.path && issue.path !== 'file' && issue.path !== '(body)' ? <span className="font-semibold">{issue.path}: </span> : null}
            {issue.message}
          </li>
        ))}
      </ul>
      {issues.length > shown.length ? (
        <p>
          …and {plural(issues.length - shown.length, 'more problem')}
          {rest}.
        </p>
      ) : null}
    </>
  );
}

function Alert({ title, children }: { title: string; children: ReactNode }) {
  return (
    <div role="alert" className="flex flex-col gap-1.5 rounded-md border-l-4 border-flare-500 bg-flare-50 px-4 py-3 text-sm text-flare-700">
      <p className="font-semibold">{title}</p>
      {children}
    </div>
  );
}

function NoticeView({ notice, siteId, siteName }: { notice: Notice; siteId: string; siteName: string }) {
  switch (notice.kind) {
    case 'imported':
      return (
        <div role="status" className="flex flex-col gap-1.5 rounded-md border-l-4 border-moss-500 bg-moss-50 px-4 py-3 text-sm text-moss-700">
          <p className="font-semibold">
            Imported {plural(notice.count, 'item')} into {siteName}; their falls were computed at the site&apos;s design wind.
          </p>
          {notice.skipped ? (
            <p>
              {notice.skipped === 1
                ? '1 row with problems was left out; correct it and import it from a new file.'
                : `${n(notice.skipped)} rows with problems were left out; correct them and import them from a new file.`}
            </p>
          ) : null}
          <p>
            <Link href={`/sites/${encodeURIComponent(siteId)}`} className="font-semibold text-cord-600 underline hover:text-cord-700">
              Open the register
            </Link>
          </p>
        </div>
      );
    case 'unreadable':
      return (
        <Alert title="The file cannot be imported as it is.">
          <IssueList issues={notice.issues} limit={50} />
          <p>Nothing was written. Correct the file and choose it again.</p>
        </Alert>
      );
    case 'not-written':
      return (
        <Alert title="Nothing was written: the import was refused.">
          <IssueList issues={notice.issues} limit={notice.problemCount > 5 ? 5 : 50} rest={notice.problemCount ? ', listed under Problems below' : ''} />
        </Alert>
      );
    case 'session':
      return (
        <Alert title="Your session has ended.">
          <p>
            Nothing was written.{' '}
            <Link href="/sign-in" className="font-semibold underline">
              Sign in again
            </Link>
            , then choose the file again.
          </p>
        </Alert>
      );
    case 'role':
      return (
        <Alert title="Your role cannot import items.">
          <p>Nothing was written. Only an admin or an engineer can add items to a site’s register.</p>
        </Alert>
      );
    case 'failed':
      return (
        <Alert title={notice.during === 'check' ? 'The file could not be checked.' : 'The import did not finish.'}>
          <p>{notice.message}</p>
          {notice.during !== 'check' ? (
            <p>
              It is not certain whether anything was written:{' '}
              <Link href={`/sites/${encodeURIComponent(siteId)}`} className="font-semibold underline">
                open the register
              </Link>{' '}
              to see before trying again.
            </p>
          ) : null}
        </Alert>
      );
  }
}

function Summary({ report }: { report: ImportReport }) {
  const figures = [
    { label: 'Rows', value: n(report.total_rows) },
    { label: 'Valid rows', value: n(report.valid_rows) },
    { label: 'Rows with problems', value: n(report.invalid_rows), warn: report.invalid_rows > 0 },
  ];
  return (
    <div data-testid="import-summary" className="flex flex-col gap-2">
      <p className="text-sm text-ink-soft">
        File: <span className="font-semibold text-ink">{report.file_name}</span>
      </p>
      <dl className="grid grid-cols-3 gap-3">
        {figures.map((f) => (
          <div key={f.label} className="rounded-md bg-paper px-3 py-2">
            <dt className="text-xs font-semibold text-ink-muted">{f.label}</dt>
            <dd className={`num text-xl font-semibold ${f.warn ? 'text-flare-700' : 'text-ink'}`}>{f.value}</dd>
          </div>
        ))}
      </dl>
    </div>
  );
}

function ImportActions({ report, busy, onImport, onChooseAnother }: {
  report: ImportReport;
  busy: Mode | null;
  onImport: (mode: Mode) => void;
  onChooseAnother: () => void;
}) {
  const noteId = useId();
  const valid = report.valid_rows;
  const clean = report.problems.length === 0 && report.total_rows > 0;
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap items-center gap-3">
        <button type="button" disabled={busy !== null || valid === 0} onClick={() => onImport('valid-only')} className={primaryButton}>
          {busy === 'valid-only' ? 'Importing…' : `Import the ${valid} valid ${valid === 1 ? 'row' : 'rows'}`}
        </button>
        <button
          type="button"
          disabled={busy !== null || !clean}
          aria-describedby={clean ? undefined : noteId}
          onClick={() => onImport('all-or-nothing')}
          className={quietButton}
        >
          {busy === 'all-or-nothing' ? 'Importing…' : `Import all ${report.total_rows} ${report.total_rows === 1 ? 'row' : 'rows'}`}
        </button>
        <button type="button" disabled={busy !== null} onClick={onChooseAnother} className={quietButton}>
          Choose another file
        </button>
      </div>
      {clean ? (
        <p className="text-xs text-ink-muted">Every row is valid: either button imports the whole file in one go.</p>
      ) : (
        <p id={noteId} className="text-xs text-ink-muted">
          {valid === 0
            ? 'No row is valid yet, so there is nothing to import: fix the problems below and choose the file again.'
            : `Importing all rows writes every row or none. With ${plural(report.invalid_rows, 'row')} with problems nothing would be written, so that button is disabled; importing the valid rows leaves the rows with problems out.`}
        </p>
      )}
    </div>
  );
}

function Preview({ report }: { report: ImportReport }) {
  const captionId = useId();
  const problemsByLine = useMemo(() => {
    const counts = new Map<number, number>();
    for (const p of report.problems) counts.set(p.line, (counts.get(p.line) ?? 0) + 1);
    return counts;
  }, [report.problems]);
  if (!report.preview.length) return null;
  return (
    <div className="flex flex-col gap-2">
      <h3 id={captionId} className="font-semibold">
        First {plural(report.preview.length, 'row')} of the file
      </h3>
      <div className="overflow-x-auto rounded-md border border-paper-rule" tabIndex={0} role="region" aria-labelledby={captionId}>
        <table className="w-full min-w-max border-collapse text-left text-sm">
          <caption className="sr-only">First rows of the file as read, with the line number in the file and any problems on that line.</caption>
          <thead className="bg-paper text-xs text-ink-soft">
            <tr>
              <th scope="col" className="border-b border-paper-rule px-3 py-2 text-right font-semibold">
                Line
              </th>
              <th scope="col" className="border-b border-paper-rule px-3 py-2 font-semibold">
                Check
              </th>
              {report.columns.map((c, i) => (
                <th key={`${c}-${i}`} scope="col" className="whitespace-nowrap border-b border-paper-rule px-3 py-2 font-mono font-semibold">
                  {c}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {report.preview.map((row) => {
              const count = problemsByLine.get(row.line) ?? 0;
              return (
                <tr key={row.line} className={`border-t border-paper-rule ${count ? 'bg-flare-50' : ''}`}>
                  <th scope="row" className="num px-3 py-1.5 text-right font-normal text-ink-muted">
                    {row.line}
                  </th>
                  <td className={`whitespace-nowrap px-3 py-1.5 ${count ? 'font-semibold text-flare-700' : 'text-moss-700'}`}>
                    {count ? plural(count, 'problem') : 'OK'}
                  </td>
                  {report.columns.map((c, i) => {
                    const value = row.cells[c] ?? '';
                    return (
                      <td key={`${c}-${i}`} className="max-w-56 truncate px-3 py-1.5" title={value.length > 30 ? value : undefined}>
                        {value}
                      </td>
                    );
                  })}
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
    </div>
  );
}

function ProblemList({ problems, invalidRows }: { problems: CsvProblem[]; invalidRows: number }) {
  const headingId = useId();
  const [page, setPage] = useState(0);
  if (!problems.length) {
    return <p className="rounded-md bg-moss-50 px-3 py-2 text-sm text-moss-700">No problems found: every row can be imported.</p>;
  }
  const pages = Math.ceil(problems.length / PROBLEMS_PER_PAGE);
  const first = page * PROBLEMS_PER_PAGE;
  const shown = problems.slice(first, first + PROBLEMS_PER_PAGE);
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap items-baseline justify-between gap-x-4">
        <h3 id={headingId} className="font-semibold">
          Problems
        </h3>
        <p className="text-sm text-ink-muted">
          {plural(problems.length, 'problem')}
          {invalidRows ? ` on ${plural(invalidRows, 'row')}` : ''}
        </p>
      </div>
      <div className="max-h-[28rem] overflow-auto rounded-md border border-paper-rule" tabIndex={0} role="region" aria-labelledby={headingId}>
        <table data-testid="import-problems" className="w-full border-collapse text-left text-sm">
          <caption className="sr-only">
            Problems found in the file, {n(first + 1)} to {n(first + shown.length)} of {n(problems.length)}.
          </caption>
          <thead className="sticky top-0 z-10 bg-paper text-xs text-ink-soft">
            <tr>
              <th scope="col" className="border-b border-paper-rule px-3 py-2 text-right font-semibold">
                Line
              </th>
              <th scope="col" className="border-b border-paper-rule px-3 py-2 font-semibold">
                Column
              </th>
              <th scope="col" className="border-b border-paper-rule px-3 py-2 font-semibold">
                Problem
              </th>
            </tr>
          </thead>
          <tbody>
            {shown.map((p, i) => (
              <tr key={first + i} className="border-t border-paper-rule align-top">
                <td className="num whitespace-nowrap px-3 py-1.5 text-right">{p.line ? p.line : <span className="font-sans text-ink-muted">File</span>}</td>
                <td className="px-3 py-1.5 font-mono text-xs">{p.column ? p.column : <span className="font-sans text-ink-muted">Whole row</span>}</td>
                <td className="px-3 py-1.5">{p.message}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {pages > 1 ? (
        <nav aria-label="Problem pages" className="flex flex-wrap items-center justify-between gap-3 text-sm">
          <p aria-live="polite" className="text-ink-soft">
            Problems <span className="num">{n(first + 1)}</span>–<span className="num">{n(first + shown.length)}</span> of{' '}
            <span className="num">{n(problems.length)}</span>
          </p>
          <div className="flex flex-wrap items-center gap-2">
            <button type="button" className={smallButton} onClick={() => setPage(0)} disabled={page === 0}>
              First
            </button>
            <button type="button" className={smallButton} onClick={() => setPage(page - 1)} disabled={page === 0}>
              Previous
            </button>
            <span className="px-1 text-ink-soft">
              Page <span className="num">{n(page + 1)}</span> of <span className="num">{n(pages)}</span>
            </span>
            <button type="button" className={smallButton} onClick={() => setPage(page + 1)} disabled={page >= pages - 1}>
              Next
            </button>
            <button type="button" className={smallButton} onClick={() => setPage(pages - 1)} disabled={page >= pages - 1}>
              Last
            </button>
          </div>
        </nav>
      ) : null}
    </div>
  );
}
