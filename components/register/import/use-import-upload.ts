'use client';

import { useRouter } from 'next/navigation';
import { useCallback, useEffect, useRef, useState } from 'react';
import { sendImport, type Answer, type ImportReport, type Issue, type Mode } from './import-client';

export type Notice =
  | { kind: 'unreadable'; issues: Issue[] }
  | { kind: 'imported'; count: number; skipped: number }
  | { kind: 'not-written'; issues: Issue[]; problemCount: number }
  | { kind: 'session' }
  | { kind: 'role' }
  | { kind: 'failed'; message: string; during: Mode };

/**
 * Sends the file to the import route, one request at a time (a new one aborts the last), and turns the answer into the
 * report and the notice the panel shows.
 */
export function useImportUpload(siteId: string) {
  const router = useRouter();
  const [report, setReport] = useState<ImportReport | null>(null);
  // Bumped with every new report, so the problem list starts again at its first page.
  const [reportVersion, setReportVersion] = useState(0);
  const [busy, setBusy] = useState<Mode | null>(null);
  const [notice, setNotice] = useState<Notice | null>(null);
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
        answer = await sendImport(siteId, target, mode, controller.signal);
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

  return { report, reportVersion, busy, notice, noticeRef, run, showReport };
}
