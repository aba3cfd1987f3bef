import { CALCULATOR_RULES, type UnitSystem } from '@/lib/domain';
import { fromSI, toSI } from '@/lib/units';
import { readNumberText, writeNumberText } from '@/lib/units/number-text';
import { type CalculatorValues, DEFAULT_VALUES } from './values';

/** The calculator's state in its link, and the same form re-expressed in the other unit system. */

const KEYS = Object.keys(DEFAULT_VALUES) as (keyof CalculatorValues)[];

/**
 * Only what differs from the defaults goes into the link, so shared URLs stay short; the unit system always does,
 * because the numbers mean nothing without it.
 */
export function toSearchParams(v: CalculatorValues): URLSearchParams {
  const params = new URLSearchParams({ units: v.units });
  for (const k of KEYS) if (k !== 'units' && v[k] !== DEFAULT_VALUES[k]) params.set(k, String(v[k]));
  return params;
}

/** The form from a link; unknown keys are ignored and bad values are kept so the form can say what is wrong. */
export function fromSearchParams(params: URLSearchParams | Record<string, string | string[] | undefined>, units: UnitSystem): CalculatorValues {
  const get = (k: string): string | undefined => {
    if (params instanceof URLSearchParams) return params.get(k) ?? undefined;
    const raw = params[k];
    return Array.isArray(raw) ? raw[0] : raw;
  };
  const values = { ...DEFAULT_VALUES, units } as Record<string, string>;
  for (const k of KEYS) {
    const given = get(k);
    if (given !== undefined) values[k] = given.slice(0, 40);
  }
  return values as unknown as CalculatorValues;
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
