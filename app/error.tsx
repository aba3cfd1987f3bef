'use client';

import { ErrorState } from '@/components/layout/page-states';

export default function RootError({ reset }: { error: Error; reset: () => void }) {
  return (
    <main className="mx-auto max-w-xl px-5 py-10">
      <ErrorState reset={reset} />
    </main>
  );
}
