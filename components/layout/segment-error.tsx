'use client';

import { useEffect } from 'react';
import { ErrorState } from './page-states';

type Props = { error: Error & { digest?: string }; reset: () => void };

/**
 * Every app/**\/error.tsx re-exports this. It reports the failure in the browser's console with Next's digest: the
 * server logged the same digest beside the request id, so the console line, the reference on the page and the log
 * line all lead to one request.
 */
export function SegmentError({ error, reset }: Props) {
  useEffect(() => {
    console.error(`Page failed${error.digest ? ` (reference ${error.digest})` : ''}`, error);
  }, [error]);
  return <ErrorState error={error} reset={reset} />;
}

/** The same at the root, where no layout gives the page its frame. */
export function RootSegmentError(props: Props) {
  return (
    <main className="mx-auto max-w-xl px-5 py-10">
      <SegmentError {...props} />
    </main>
  );
}
