import type { Metadata } from 'next';
import { can } from '@/lib/auth/policy';
import { Calculator } from '@/components/calculator/calculator';
import { fromSearchParams } from '@/lib/calculator/url-state';
import { requireRole } from '@/lib/auth';

export const metadata: Metadata = { title: 'Drop calculator' };

export default async function CalculatorPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const me = await requireRole('any');
  const params = await searchParams;
  const units = params.units === 'us' || params.units === 'si' ? params.units : me.unitSystem;
  const initial = fromSearchParams(params, units);
  return (
    <div className="flex flex-col gap-6">
      <header className="flex flex-col gap-1">
        <h1 className="text-2xl font-bold tracking-tight">Drop calculator</h1>
        <p className="max-w-3xl text-sm text-ink-muted">
          Describe the object, what it falls through and how it leaves; the results follow as you type. The link in the
          address bar reproduces this calculation for anyone in your organisation.
        </p>
      </header>
      <Calculator initial={initial} canRegister={can(me, 'register.edit')} />
    </div>
  );
}
