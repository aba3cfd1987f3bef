'use client';

import type { ReactNode } from 'react';
import type { UseFormReturn } from 'react-hook-form';
import { TextField } from '@/components/forms/fields';
import type { CalculatorValues } from '@/lib/calculator/values';
import { CALCULATOR_RULES } from '@/lib/domain';
import { unitLabel } from '@/lib/units';

export type CalcForm = UseFormReturn<CalculatorValues>;

/** A number input for one calculator field, with the unit of the user's system and the schema's message. */
export function CalcNumber({
  form,
  name,
  label,
  hint,
}: {
  form: CalcForm;
  name: keyof CalculatorValues & keyof typeof CALCULATOR_RULES;
  label?: string;
  hint?: ReactNode;
}) {
  const rule = CALCULATOR_RULES[name];
  const units = form.watch('units');
  const suffix = rule.quantity ? unitLabel(rule.quantity, units) : rule.unitless || undefined;
  const error = form.formState.errors[name]?.message;
  return (
    <TextField
      label={label ?? rule.label}
      inputMode="decimal"
      autoComplete="off"
      suffix={suffix}
      hint={hint}
      error={typeof error === 'string' ? error : undefined}
      {...form.register(name)}
    />
  );
}

export function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <fieldset className="flex flex-col gap-4 rounded-card bg-paper-raised p-5 shadow-card">
      <legend className="float-left mb-1 w-full text-base font-bold text-ink">{title}</legend>
      {children}
    </fieldset>
  );
}

export function ChoiceRow<T extends string>({
  form,
  name,
  options,
  legend,
}: {
  form: CalcForm;
  name: keyof CalculatorValues;
  options: Record<T, string>;
  legend: string;
}) {
  return (
    <div role="radiogroup" aria-label={legend} className="flex flex-wrap gap-2">
      {(Object.entries(options) as [T, string][]).map(([value, label]) => (
        <label
          key={value}
          className="flex cursor-pointer items-center gap-2 rounded-md border border-paper-rule px-3 py-1.5 text-sm has-[:checked]:border-cord-500 has-[:checked]:bg-cord-50 has-[:checked]:font-semibold"
        >
          <input type="radio" value={value} className="accent-cord-600" {...form.register(name)} />
          {label}
        </label>
      ))}
    </div>
  );
}
