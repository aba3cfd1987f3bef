import { z } from 'zod';
import type { UnitSystem } from '@/db/types';
import { formatNumber, fromSI, toSI, unitLabel, type Quantity } from '@/lib/units';

export interface QuantityRule {
  label: string;
  /** null for pure numbers (a drag coefficient, a count) */
  quantity: Quantity | null;
  /** SI limits */
  min?: number;
  max?: number;
  exclusiveMin?: boolean;
  integer?: boolean;
}

function limit(rule: QuantityRule, bound: number, units: UnitSystem): string {
  if (!rule.quantity) return formatNumber(bound, 4);
  return `${formatNumber(fromSI(rule.quantity, bound, units), 4)} ${unitLabel(rule.quantity, units)}`;
}

/** A typed value (text from a form or CSV cell, or a JSON number) as a finite number, or null when blank. */
function readNumber(raw: unknown): number | null | 'bad' {
  if (raw === undefined || raw === null) return null;
  if (typeof raw === 'number') return Number.isFinite(raw) ? raw : 'bad';
  if (typeof raw !== 'string') return 'bad';
  const text = raw.trim();
  if (!text) return null;
  // A decimal comma is common on site spreadsheets; thousands separators are not accepted.
  if (!/^[+-]?(\d+([.,]\d*)?|[.,]\d+)([eE][+-]?\d+)?$/.test(text)) return 'bad';
  return Number(text.replace(',', '.'));
}

/**
 * A measured value in the user's unit system, checked against SI limits, coming out in SI. The message names the
 * field and states the limit in the units the user typed in.
 */
export function quantityField(rule: QuantityRule, units: UnitSystem, required: true): z.ZodType<number, unknown>;
export function quantityField(rule: QuantityRule, units: UnitSystem, required: false): z.ZodType<number | undefined, unknown>;
export function quantityField(rule: QuantityRule, units: UnitSystem, required: boolean): z.ZodType<number | undefined, unknown> {
  return z.unknown().optional().transform((raw, ctx) => {
    const typed = readNumber(raw);
    if (typed === null) {
      if (required) ctx.addIssue({ code: 'custom', message: `${rule.label} is required.` });
      return required ? z.NEVER : undefined;
    }
    if (typed === 'bad') {
      ctx.addIssue({ code: 'custom', message: `${rule.label} must be a number.` });
      return z.NEVER;
    }
    if (rule.integer && !Number.isInteger(typed)) {
      ctx.addIssue({ code: 'custom', message: `${rule.label} must be a whole number.` });
      return z.NEVER;
    }
    const value = rule.quantity ? toSI(rule.quantity, typed, units) : typed;
    // A bound typed in the user's own units must pass even where the conversion rounds it a hair outside.
    const slack = 1e-9 * Math.max(1, Math.abs(value));
    if (rule.min !== undefined) {
      if (rule.exclusiveMin && value <= rule.min) {
        ctx.addIssue({ code: 'custom', message: `${rule.label} must be greater than ${limit(rule, rule.min, units)}.` });
        return z.NEVER;
      }
      if (!rule.exclusiveMin && value < rule.min - slack) {
        ctx.addIssue({ code: 'custom', message: `${rule.label} must be at least ${limit(rule, rule.min, units)}.` });
        return z.NEVER;
      }
    }
    if (rule.max !== undefined && value > rule.max + slack) {
      ctx.addIssue({ code: 'custom', message: `${rule.label} must be at most ${limit(rule, rule.max, units)}.` });
      return z.NEVER;
    }
    return value;
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
      .max(max, `${label} must be at most ${max} characters.`),
  );
}

export function enumField<const T extends readonly [string, ...string[]]>(values: T, message: string) {
  return z.enum(values, { error: message });
}

/** The unit system a form or request declares; SI when it says nothing. */
export const unitsField = z.preprocess((v) => (v === undefined || v === null || v === '' ? 'si' : v), z.enum(['si', 'us'], { error: 'Units must be "si" or "us".' }));

/**
 * Turns dotted form names ("dimensions.length", "levels.0.name") into nested objects and lists, so forms and JSON
 * share one schema.
 */
export function unflatten(flat: Record<string, string>): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(flat)) {
    const parts = key.split('.');
    let node = out;
    for (const part of parts.slice(0, -1)) {
      if (typeof node[part] !== 'object' || node[part] === null) node[part] = {};
      node = node[part] as Record<string, unknown>;
    }
    node[parts[parts.length - 1]] = value;
  }
  return listify(out) as Record<string, unknown>;
}

function listify(node: unknown): unknown {
  if (typeof node !== 'object' || node === null) return node;
  const entries = Object.entries(node as Record<string, unknown>).map(([k, v]) => [k, listify(v)] as const);
  if (entries.length && entries.every(([k]) => /^\d+$/.test(k))) {
    return entries.sort((a, b) => Number(a[0]) - Number(b[0])).map(([, v]) => v);
  }
  return Object.fromEntries(entries);
}
