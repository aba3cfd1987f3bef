import Link from 'next/link';
import type { ReactNode } from 'react';
import { n, plural, type Issue } from './import-client';
import type { Notice } from './use-import-upload';

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

export function NoticeView({ notice, siteId, siteName }: { notice: Notice; siteId: string; siteName: string }) {
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
