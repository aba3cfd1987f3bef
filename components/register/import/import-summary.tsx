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
  const noteId = useId();
  const valid = report.valid_rows;
  const clean = report.problems.length === 0 && report.total_rows > 0;
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap items-center gap-3">
        <button type="button" disabled={busy !== null || valid === 0} onClick={() => onImport('valid-only')} className={buttonStyles.primary}>
          {busy === 'valid-only' ? 'Importing…' : `Import the ${valid} valid ${valid === 1 ? 'row' : 'rows'}`}
        </button>
        <button
          type="button"
          disabled={busy !== null || !clean}
          aria-describedby={clean ? undefined : noteId}
          onClick={() => onImport('all-or-nothing')}
          className={buttonStyles.quiet}
        >
          {busy === 'all-or-nothing' ? 'Importing…' : `Import all ${report.total_rows} ${report.total_rows === 1 ? 'row' : 'rows'}`}
        </button>
        <button type="button" disabled={busy !== null} onClick={onChooseAnother} className={buttonStyles.quiet}>
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
