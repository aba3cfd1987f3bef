import { LoadingState } from '@/components/layout/page-states';

export default function Loading() {
  return (
    <main className="mx-auto max-w-xl px-5 py-10">
      <LoadingState />
    </main>
  );
}
