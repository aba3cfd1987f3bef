'use client';

import { useCallback, useId, useState } from 'react';
import type { UnitSystem } from '@/lib/domain';
import { CSV_LIMITS } from '@/lib/register/csv-limits';
import { SafetyNote } from '@/components/layout/safety-note';
import { buttonStyles } from '@/components/ui/button';
import { useFileDrop } from '@/components/ui/use-file-drop';
import { formatSize, MAX_MB, n, pickCsv, plural, type ImportReport, type Mode } from './import/import-client';
import { NoticeView } from './import/import-notice';
import { ImportPreview } from './import/import-preview';
import { ImportActions, ImportSummary } from './import/import-summary';
import { ProblemList } from './import/problem-list';
import { TemplateHelp } from './import/template-help';
import { useImportUpload } from './import/use-import-upload';

export function ImportPanel({ siteId, siteName, units, levelNames }: { siteId: string; siteName: string; units: UnitSystem; levelNames: string[] }) {
  const headingId = useId();
  const [file, setFile] = useState<File | null>(null);
  const [rejection, setRejection] = useState<string | null>(null);
  const { report, reportVersion, busy, notice, noticeRef, run, showReport } = useImportUpload(siteId);

  const choose = useCallback(
    (files: File[]) => {
      const picked = pickCsv(files);
      if ('rejection' in picked) {
        setRejection(picked.rejection);
        return;
      }
      setRejection(null);
      setFile(picked.file);
      showReport(null);
      void run(picked.file, 'check');
    },
    [run, showReport],
  );

  const { rootRef, rootProps, inputProps, open, isDragActive } = useFileDrop({ onFiles: choose, accept: 'text/csv,.csv', disabled: busy !== null });

  const fatal = notice?.kind === 'unreadable';
  const imported = notice?.kind === 'imported';
  const status = statusText(busy, file, report, fatal);
  const rejectionId = `${headingId}-rejection`;
  const chooseAnother = (
    <div>
      <button type="button" onClick={open} disabled={busy !== null} className={buttonStyles.quiet}>
        Choose another file
      </button>
    </div>
  );

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
        ref={rootRef}
        {...rootProps}
        role="group"
        aria-label="Drop zone for the CSV file"
        aria-describedby={rejection ? rejectionId : undefined}
        className={`flex flex-col items-center gap-3 rounded-card border-2 border-dashed px-5 py-8 text-center transition ${
          isDragActive ? 'border-cord-500 bg-cord-50' : rejection ? 'border-flare-500 bg-flare-50' : 'border-paper-rule bg-paper'
        } ${busy ? 'opacity-70' : ''}`}
      >
        <input {...inputProps} aria-label="CSV file to import" />
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
        <button type="button" onClick={open} disabled={busy !== null} className={buttonStyles.primary}>
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
          <ImportSummary report={report} />
          {!imported ? (
            <ImportActions
              report={report}
              busy={busy}
              onImport={(mode) => {
                if (file) void run(file, mode);
              }}
              onChooseAnother={open}
            />
          ) : (
            chooseAnother
          )}
          <ImportPreview report={report} />
          <ProblemList key={reportVersion} problems={report.problems} invalidRows={report.invalid_rows} />
        </>
      ) : null}

      {fatal ? chooseAnother : null}

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
