import { z } from 'zod';
import type { QuantityRule, UnitSystem } from '@/lib/domain';
import { fromSI, toSI, unitLabel } from '@/lib/units';
import { NOT_A_NUMBER, readNumberText } from '@/lib/units/number-text';
import { storableText } from './text';


/**
 * A bound in plain grouped digits, four figures but never fewer than its whole part ("1,000,000,000 J", "32,808 ft",
 * "0.000001 m"): a limit is read by a person, so no exponent form like "1.000e+9 J".
 */
export function formatLimit(value: number): string {
  if (!Number.isFinite(value)) return String(value);
  const abs = Math.abs(value);
  if (abs < 1) return value.toLocaleString('en-GB', { maximumSignificantDigits: 4 });
  return value.toLocaleString('en-GB', { maximumFractionDigits: Math.max(0, 3 - Math.floor(Math.log10(abs))) });
}

function limit(rule: QuantityRule, bound: number, units: UnitSystem): string {
  if (!rule.quantity) return `${formatLimit(bound)}${rule.unitless ?? ''}`;
  return `${formatLimit(fromSI(rule.quantity, bound, units))} ${unitLabel(rule.quantity, units)}`;
}


/**
 * A typed value (text from a form or CSV cell, read by readNumberText, or a JSON number) in SI and checked against the rule's SI limits:
 * null when blank, else the value or the message naming the field. "1e309" and a 400-digit number read as
 * Infinity, and a conversion can overflow too, so the limits are checked on the converted value and nothing
 * non-finite passes.
 */
export function checkQuantity(rule: QuantityRule, raw: unknown, units: UnitSystem): { value: number } | { message: string } | null {
  if (raw === undefined || raw === null) return null;
  let typed: number;
  if (typeof raw === 'number') {
    typed = raw;
  } else {
    if (typeof raw !== 'string') return { message: `${rule.label} ${NOT_A_NUMBER}.` };
    const read = readNumberText(raw);
    if (read === null) return null;
    if ('problem' in read) return { message: `${rule.label} ${read.problem}.` };
    typed = read.value;
  }
  const value = rule.quantity && Number.isFinite(typed) ? toSI(rule.quantity, typed, units) : typed;
  // A bound typed in the user's own units must pass even where the conversion rounds it a hair outside.
  const slack = Number.isFinite(value) ? 1e-9 * Math.max(1, Math.abs(value)) : 0;
  if (rule.min !== undefined) {
    if (rule.exclusiveMin && value <= rule.min) return { message: `${rule.label} must be greater than ${limit(rule, rule.min, units)}.` };
    if (!rule.exclusiveMin && value < rule.min - slack) return { message: `${rule.label} must be at least ${limit(rule, rule.min, units)}.` };
  }
  if (rule.max !== undefined && value > rule.max + slack) return { message: `${rule.label} must be at most ${limit(rule, rule.max, units)}.` };
  if (!Number.isFinite(value)) return { message: `${rule.label} must be a finite number.` };
  if (rule.integer && !Number.isInteger(typed)) return { message: `${rule.label} must be a whole number.` };
  return { value };
}

/**
 * A measured value in the user's unit system, checked against SI limits, coming out in SI. The message names the
 * field and states the limit in the units the user typed in.
 */
export function quantityField(rule: QuantityRule, units: UnitSystem, required: true): z.ZodType<number, unknown>;
export function quantityField(rule: QuantityRule, units: UnitSystem, required: false): z.ZodType<number | undefined, unknown>;
export function quantityField(rule: QuantityRule, units: UnitSystem, required: boolean): z.ZodType<number | undefined, unknown> {
  return z.unknown().optional().transform((raw, ctx) => {
    const checked = checkQuantity(rule, raw, units);
    if (checked === null) {
      if (required) ctx.addIssue({ code: 'custom', message: `${rule.label} is required.` });
      return required ? z.NEVER : undefined;
    }
    if ('message' in checked) {
      ctx.addIssue({ code: 'custom', message: checked.message });
      return z.NEVER;
    }
    return checked.value;
  }) as z.ZodType<number | undefined, unknown>;
}

/** Trimmed text with a length limit; absent or blank is allowed (read as '') unless a minimum is given. */
export function textField(label: string, max: number, min = 0) {
  return z.preprocess(
    (v) => (v === undefined || v === null ? '' : v),
    z
      .string({ error: `${label} must be text.` })
      .trim()
      .min(min, min === 1 ? `${label} is required.` : `${label} must be at least ${min} characters.`)
      .max(max, `${label} must be at most ${max} characters.`)
      .superRefine(storableText(label)),
  );
}

export function enumField<const T extends readonly [string, ...string[]]>(values: T, message: string) {
  return z.enum(values, { error: message });
}

/** The unit system a form or request declares; SI when it says nothing. */
export const unitsField = z.preprocess((v) => (v === undefined || v === null || v === '' ? 'si' : v), z.enum(['si', 'us'], { error: 'Units must be "si" or "us".' }));
