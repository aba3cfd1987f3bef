'use client';

import { ErrorState } from '@/components/layout/page-states';

export default function SegmentError({ reset }: { error: Error; reset: () => void }) {
  return <ErrorState reset={reset} />;
}
