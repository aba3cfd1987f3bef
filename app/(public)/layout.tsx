import type { ReactNode } from 'react';
import { Wordmark } from '@/components/brand/plumbline-mark';
import { SafetyNote } from '@/components/layout/safety-note';

export default function PublicLayout({ children }: { children: ReactNode }) {
  return (
    <main className="mx-auto grid min-h-screen max-w-5xl items-center gap-10 px-5 py-10 md:grid-cols-[1.1fr_1fr]">
      <section className="flex flex-col gap-5">
        <Wordmark />
        <h1 className="text-3xl font-bold leading-tight tracking-tight text-ink md:text-4xl">
          Know what a dropped object does before it drops.
        </h1>
        <p className="text-ink-soft">
          Plumbline works out how long a tool, fitting or load takes to fall, how hard it lands, and how far wind or a
          swing carries it — in air, and on through seawater — so exclusion zones, lift plans and hazard sheets rest
          on numbers rather than rules of thumb.
        </p>
        <SafetyNote compact />
      </section>
      <section className="rounded-card bg-paper-raised p-6 shadow-card md:p-8">{children}</section>
    </main>
  );
}
