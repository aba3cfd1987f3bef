import { useId } from 'react';
import { buttonStyles } from '@/components/ui/button';
import { n, plural, type ImportReport, type Mode } from './import-client';

export function ImportSummary({ report }: { report: ImportReport }) {
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

export function ImportActions({ report, busy, onImport, onChooseAnother }: {
  report: ImportReport;
  busy: Mode | null;
  onImport: (mode: Mode) => void;
  onChooseAnother: () => void;
}) {
  const validNoteId = useId();
  const allNoteId = useId();
  const valid = report.valid_rows;
  const bad = report.invalid_rows;
  const clean = report.problems.length === 0 && report.total_rows > 0;
  const validNote =
    valid === 0
      ? 'No row is valid yet, so there is nothing to import: fix the problems below and choose the file again.'
      : `${validButton(valid)} writes ${plural(valid, 'valid row')}${bad > 0 ? ` and skips ${plural(bad, 'row')} with problems` : ''}.`;
  const allNote = clean
    ? `${allButton(report.total_rows)} writes every row in one go, or none if the write fails.`
    : `${allButton(report.total_rows)} writes every row or none, so it is unavailable while ${plural(bad, 'row')} ${bad === 1 ? 'has' : 'have'} problems.`;
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap items-center gap-3">
        <button type="button" disabled={busy !== null || valid === 0} aria-describedby={validNoteId} onClick={() => onImport('valid-only')} className={buttonStyles.primary}>
          {busy === 'valid-only' ? 'Importing…' : validButton(valid)}
        </button>
        <button
          type="button"
          disabled={busy !== null || !clean}
          aria-describedby={allNoteId}
          onClick={() => onImport('all-or-nothing')}
          className={buttonStyles.quiet}
        >
          {busy === 'all-or-nothing' ? 'Importing…' : allButton(report.total_rows)}
        </button>
        <button type="button" disabled={busy !== null} onClick={onChooseAnother} className={buttonStyles.quiet}>
          Choose another file
        </button>
      </div>
      <ul className="flex flex-col gap-1 text-xs text-ink-muted" data-testid="import-button-notes">
        <li id={validNoteId}>{validNote}</li>
        <li id={allNoteId}>{allNote}</li>
      </ul>
    </div>
  );
}

function validButton(valid: number): string {
  return `Import the ${valid} valid ${valid === 1 ? 'row' : 'rows'}`;
}

function allButton(total: number): string {
  return `Import all ${total} ${total === 1 ? 'row' : 'rows'}`;
}
