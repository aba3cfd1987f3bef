import type { Metadata } from 'next';
import { can } from '@/lib/auth/policy';
import { Calculator } from '@/components/calculator/calculator';
import { fromSearchParams, ignoredNames } from '@/lib/calculator/url-state';
import { requireRole } from '@/lib/auth';

export const metadata: Metadata = { title: 'Drop calculator' };

export default async function CalculatorPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const me = await requireRole('any');
  const params = await searchParams;
  const units = params.units === 'us' || params.units === 'si' ? params.units : me.unitSystem;
  const { values: initial, ignored } = fromSearchParams(params, units);
  const { names, more } = ignoredNames(ignored);
  return (
    <div className="flex flex-col gap-6">
      <header className="flex flex-col gap-1">
        <h1 className="text-2xl font-bold tracking-tight">Drop calculator</h1>
        <p className="max-w-3xl text-sm text-ink-muted">
          Describe the object, what it falls through and how it leaves; the results follow as you type. The link in the
          address bar reproduces this calculation for anyone in your organisation.
        </p>
      </header>
      {names.length ? (
        <p role="status" data-testid="link-ignored" className="max-w-3xl rounded-md border-l-4 border-cord-500 bg-cord-50 px-4 py-3 text-sm text-ink-soft">
          This link carried values the calculator cannot use, so those fields start from their defaults instead:{' '}
          {names.map((n, i) => (
            <span key={`${i}-${n}`}>
              {i ? ', ' : ''}
              <code className="num">{n}</code>
            </span>
          ))}
          {more ? ` and ${more} more` : ''}. Check them before relying on the results.
        </p>
      ) : null}
      <Calculator initial={initial} canRegister={can(me, 'register.edit')} />
    </div>
  );
}
