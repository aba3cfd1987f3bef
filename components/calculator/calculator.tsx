'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import Link from 'next/link';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { useEffect, useMemo, useState, useTransition } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { SHAPE_LABELS, type UnitSystem } from '@/lib/domain';
import { setUnitSystemAction } from '@/lib/actions/profile';
import { toDropCase } from '@/lib/calculator/drop-case';
import { calculatorSchema } from '@/lib/calculator/schema';
import { convertUnits, toSearchParams } from '@/lib/calculator/url-state';
import { defaultValues, type CalculatorValues } from '@/lib/calculator/values';
import type { DropCase } from '@/lib/physics';
import { formatQuantity } from '@/lib/units';
import { DropResults } from './drop-results';
import { ObjectSection } from './object-section';
import { PathSection, ReleaseSection } from './path-section';
import { UnitSwitch } from './unit-switch';
import { useDropResult } from './use-drop-result';

const PLOT_SAMPLES = 240;

export function Calculator({ initial, canRegister }: { initial: CalculatorValues; canRegister: boolean }) {
  const [client] = useState(() => new QueryClient());
  return (
    <QueryClientProvider client={client}>
      <CalculatorBody initial={initial} canRegister={canRegister} />
    </QueryClientProvider>
  );
}

function describe(v: CalculatorValues, c: DropCase): string {
  const height = c.layers ? c.layers.reduce((s, l) => s + l.thickness_m, 0) : (c.release?.height_m ?? 0);
  return `${SHAPE_LABELS[v.shape].toLowerCase()}, ${formatQuantity('mass', c.object.mass_kg, v.units)}, from ${formatQuantity('length', height, v.units)}`;
}

function CalculatorBody({ initial, canRegister }: { initial: CalculatorValues; canRegister: boolean }) {
  const form = useForm<CalculatorValues>({
    resolver: zodResolver(calculatorSchema),
    mode: 'onChange',
    defaultValues: initial,
  });
  const [, startTransition] = useTransition();
  const [ready, setReady] = useState(false);
  // eslint-disable-next-line react-hooks/set-state-in-effect -- the point is one render before mount and one after
  useEffect(() => setReady(true), []);
  const watched = useWatch({ control: form.control }) as CalculatorValues;
  const values = useMemo(() => ({ ...initial, ...watched }), [initial, watched]);
  const valuesKey = JSON.stringify(values);

  // A shared link may carry bad values: show their messages at once rather than on the first keystroke.
  useEffect(() => {
    void form.trigger();
  }, [form]);

  useEffect(() => {
    const query = toSearchParams(JSON.parse(valuesKey)).toString();
    window.history.replaceState(null, '', query ? `?${query}` : window.location.pathname);
  }, [valuesKey]);

  // The schema's messages name their field, so the note above the results can say what to fix even when the
  // field's own message is not on screen (a field the last change brought into play, or one further down).
  const { dropCase, problems } = useMemo(() => {
    const v = JSON.parse(valuesKey) as CalculatorValues;
    const parsed = calculatorSchema.safeParse(v);
    if (!parsed.success) return { dropCase: null, problems: [...new Set(parsed.error.issues.map((i) => i.message))] };
    try {
      return { dropCase: toDropCase(v, PLOT_SAMPLES), problems: [] };
    } catch {
      return { dropCase: null, problems: [] };
    }
  }, [valuesKey]);

  // A change can bring a field into play whose value is already wrong; mark every such field, not just the one typed in.
  const invalid = problems.length > 0;
  useEffect(() => {
    if (invalid) void form.trigger();
  }, [form, invalid, valuesKey]);
  const caseJson = dropCase ? JSON.stringify(dropCase) : null;
  const query = useDropResult(caseJson);

  const switchUnits = (to: UnitSystem) => {
    const current = form.getValues();
    // An untouched form opens the other system's own round defaults rather than converted figures (0.984252 ft).
    const untouched = toSearchParams(current).toString() === `units=${current.units}`;
    form.reset(untouched ? defaultValues(to) : convertUnits(current, to));
    void form.trigger();
    startTransition(async () => {
      await setUnitSystemAction(to);
    });
  };

  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(340px,420px)_1fr]">
      <form noValidate aria-label="Drop case" className="flex flex-col gap-4" onSubmit={(e) => e.preventDefault()} data-ready={ready || undefined}>
        <div className="flex items-center justify-between gap-3">
          <span className="text-sm font-semibold text-ink-soft">Units</span>
          <UnitSwitch value={values.units} onChange={switchUnits} />
        </div>
        <ObjectSection form={form} values={values} object={dropCase && query.data && !query.error ? query.data.result.object : null} />
        <PathSection form={form} values={values} />
        <ReleaseSection form={form} values={values} />
        {canRegister && dropCase ? (
          <Link
            href={`/items/new?${toSearchParams(values).toString()}`}
            className="self-start rounded-md border border-cord-500 bg-paper-raised px-4 py-2 text-sm font-semibold text-cord-700 hover:bg-cord-50"
          >
            Add to register
          </Link>
        ) : null}
      </form>

      <div className="flex min-w-0 flex-col gap-4" aria-live="polite">
        {!dropCase ? (
          <div role="status" data-testid="form-problems" className="rounded-card bg-paper-raised p-5 text-ink-soft shadow-card">
            <p>Fix the fields marked in the form to see results: Plumbline shows no figures for a case it cannot read.</p>
            {problems.length ? (
              <ul className="mt-2 list-disc pl-5 text-sm">
                {problems.map((m) => (
                  <li key={m}>{m}</li>
                ))}
              </ul>
            ) : null}
          </div>
        ) : query.error ? (
          <div role="alert" className="rounded-card border-l-4 border-flare-500 bg-flare-50 p-4 text-sm text-flare-700">
            <p className="font-semibold">{query.error.message}</p>
            {'issues' in query.error && Array.isArray(query.error.issues) ? (
              <ul className="mt-1 list-disc pl-5">
                {query.error.issues.map((i: { path: string; message: string }) => (
                  <li key={i.path + i.message}>
                    <span className="num">{i.path}</span>: {i.message}
                  </li>
                ))}
              </ul>
            ) : null}
          </div>
        ) : query.data ? (
          <>
            {query.settling ? (
              <p role="status" className="text-sm text-ink-muted">
                Computing…
              </p>
            ) : null}
            <DropResults
              result={query.data.result}
              dropCase={query.data.dropCase}
              units={values.units}
              description={describe(values, query.data.dropCase)}
              updating={query.settling}
            />
          </>
        ) : (
          <p role="status" className="rounded-card bg-paper-raised p-5 text-ink-muted shadow-card">
            Computing…
          </p>
        )}
      </div>
    </div>
  );
}
