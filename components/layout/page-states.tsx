'use client';

import Link from 'next/link';

export function LoadingState({ label = 'Loading…' }: { label?: string }) {
  return (
    <div role="status" aria-live="polite" className="flex items-center gap-3 py-10 text-ink-muted">
      <span className="h-4 w-4 animate-spin rounded-full border-2 border-cord-500 border-t-transparent" aria-hidden />
      {label}
    </div>
  );
}

/**
 * A failed page or action. Next hands the browser only the error's digest, never the server's message; the server
 * logs the same digest beside the request id, so the reference shown here finds the request in the log.
 */
export function ErrorState({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <div role="alert" className="flex flex-col items-start gap-3 rounded-card bg-paper-raised p-6 shadow-card">
      <h1 className="text-xl font-bold">Something went wrong on our side</h1>
      <p className="text-sm text-ink-soft">Nothing you saved has been lost. Try again, or go back to the overview.</p>
      {error.digest ? (
        <p className="text-xs text-ink-muted">
          Reference <span className="num" data-testid="error-reference">{error.digest}</span>: quote it if you report this.
        </p>
      ) : null}
      <div className="flex gap-3">
        <button onClick={reset} className="rounded-md bg-cord-600 px-4 py-2 text-sm font-semibold text-white">
          Try again
        </button>
        <Link href="/" className="rounded-md border border-paper-rule px-4 py-2 text-sm font-semibold">
          Overview
        </Link>
      </div>
    </div>
  );
}
