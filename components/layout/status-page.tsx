import Link from 'next/link';
import { Wordmark } from '@/components/brand/plumbline-mark';

export function StatusPage({ code, title, body }: { code: number; title: string; body: string }) {
  return (
    <main className="mx-auto flex min-h-[60vh] max-w-xl flex-col items-start justify-center gap-4 px-5 py-10">
      <Wordmark />
      <p className="num text-sm text-ink-muted">{code}</p>
      <h1 className="text-2xl font-bold">{title}</h1>
      <p className="text-ink-soft">{body}</p>
      <Link href="/" className="rounded-md bg-cord-600 px-4 py-2 text-sm font-semibold text-white">
        Back to the overview
      </Link>
    </main>
  );
}
