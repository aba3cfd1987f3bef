import type { ReactNode } from 'react';
import { AppHeader } from '@/components/layout/app-header';
import { requireRole } from '@/lib/auth';

export default async function AppLayout({ children }: { children: ReactNode }) {
  const member = await requireRole('any');
  return (
    <div className="flex min-h-screen flex-col">
      <AppHeader member={member} />
      <main className="mx-auto w-full max-w-6xl flex-1 px-5 py-8">{children}</main>
      <footer className="border-t border-paper-rule px-5 py-4 text-center text-xs text-ink-muted">
        Plumbline plans; it does not certify. Follow local codes, site rules and a competent person&apos;s judgement.
      </footer>
    </div>
  );
}
