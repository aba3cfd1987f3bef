import { CALCULATOR_RULES, type CalculatorRuleKey, type UnitSystem } from '@/lib/domain';
import { MATERIAL_IDS } from '@/lib/materials';
import { SHAPE_CHOICES } from '@/lib/shape-choice';
import { fromSI, toSI } from '@/lib/units';
import { readNumberText, writeNumberText } from '@/lib/units/number-text';
import { checkQuantity } from '@/lib/validation/quantity';
import { type CalculatorValues, DEFAULT_VALUES, MODEL_CHOICES, PATHS, RELEASES, defaultValues } from './values';

/** The calculator's state in its link, and the same form re-expressed in the other unit system. */

const KEYS = Object.keys(DEFAULT_VALUES) as (keyof CalculatorValues)[];
const MAX_TEXT = 40;
/** Link parameters the app itself adds on the way to the register; not the calculator's, but not a mistake either. */
const PASSED_THROUGH: ReadonlySet<string> = new Set(['from', 'site']);
/** The note names a few ignored parameters, each cut short, so a hostile link cannot fill the page. */
const MAX_NAMED = 6;
const MAX_NAME = 24;

const CHOICES: Partial<Record<keyof CalculatorValues, readonly string[]>> = {
  units: ['si', 'us'],
  shape: SHAPE_CHOICES,
  massSource: ['typed', 'material'],
  material: MATERIAL_IDS,
  path: PATHS,
  release: RELEASES,
  model: MODEL_CHOICES,
};

/**
 * Only what differs from the unit system's defaults goes into the link, so shared URLs stay short; the unit system
 * always does, because the numbers mean nothing without it.
 */
export function toSearchParams(v: CalculatorValues): URLSearchParams {
  const defaults = defaultValues(v.units);
  const params = new URLSearchParams({ units: v.units });
  for (const k of KEYS) if (k !== 'units' && v[k] !== defaults[k]) params.set(k, String(v[k]));
  return params;
}

/** A link's form and the names of the parameters it carried that the calculator could not use. */
export interface LinkState {
  values: CalculatorValues;
  ignored: string[];
}

type Params = URLSearchParams | Record<string, string | string[] | undefined>;

function usable(key: keyof CalculatorValues, given: string, units: UnitSystem, fallback: string): boolean {
  if (given.length > MAX_TEXT) return false;
  const choices = CHOICES[key];
  if (choices) return choices.includes(given);
  // A blank field is only taken where the default is blank too (the optional overrides); a blank required field
  // would open the form with a message on a field the sender never meant to clear.
  if (given.trim() === '') return fallback === '';
  const checked = checkQuantity(CALCULATOR_RULES[key as CalculatorRuleKey], given, units);
  return checked !== null && 'value' in checked;
}

/**
 * The form from a link. Each value the calculator cannot use (an unknown choice, text that is not a number, a
 * number out of range) is replaced by that field's default, and every ignored or unknown parameter is named so the
 * page can say so; the form then always opens in a state it can compute.
 */
export function fromSearchParams(params: Params, fallbackUnits: UnitSystem): LinkState {
  const entries: [string, string][] = [];
  if (params instanceof URLSearchParams) params.forEach((value, key) => entries.push([key, value]));
  else for (const [key, raw] of Object.entries(params)) if (raw !== undefined) entries.push([key, Array.isArray(raw) ? (raw[0] ?? '') : raw]);

  const given = new Map<string, string>();
  for (const [key, value] of entries) if (!given.has(key)) given.set(key, value);
  const linkUnits = given.get('units');
  const units: UnitSystem = linkUnits === 'si' || linkUnits === 'us' ? linkUnits : fallbackUnits;
  const values = { ...defaultValues(units) } as Record<string, string>;
  const ignored: string[] = [];

  for (const [key, value] of given) {
    if (!(KEYS as string[]).includes(key)) {
      if (!PASSED_THROUGH.has(key)) ignored.push(key);
      continue;
    }
    const k = key as keyof CalculatorValues;
    if (k === 'units') {
      if (value !== units) ignored.push(key);
      continue;
    }
    if (usable(k, value, units, values[k])) values[k] = value;
    else ignored.push(key);
  }
  return { values: values as unknown as CalculatorValues, ignored };
}

/** The ignored parameters as the page's note names them: a few, each short. */
export function ignoredNames(ignored: string[]): { names: string[]; more: number } {
  const names = ignored.slice(0, MAX_NAMED).map((n) => (n.length > MAX_NAME ? `${n.slice(0, MAX_NAME)}…` : n));
  return { names, more: Math.max(0, ignored.length - MAX_NAMED) };
}

/** Re-expresses every unit-bearing field when the user switches between SI and US customary. */
export function convertUnits(v: CalculatorValues, to: UnitSystem): CalculatorValues {
  if (v.units === to) return v;
  const out = { ...v, units: to } as Record<string, string>;
  for (const [key, rule] of Object.entries(CALCULATOR_RULES)) {
    const read = readNumberText(v[key as keyof CalculatorValues] as string);
    // Text that is not a number stays as typed, so its message still shows after the switch.
    if (!rule.quantity || !read || 'problem' in read || !Number.isFinite(read.value)) continue;
    const n = read.value;
    const converted = fromSI(rule.quantity, toSI(rule.quantity, n, v.units), to);
    out[key] = writeNumberText(converted, 6);
  }
  return out as unknown as CalculatorValues;
}
