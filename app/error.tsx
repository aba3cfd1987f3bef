'use client';

import { ErrorState } from '@/components/layout/page-states';

export default function RootError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <main className="mx-auto max-w-xl px-5 py-10">
      <ErrorState error={error} reset={reset} />
    </main>
  );
}
