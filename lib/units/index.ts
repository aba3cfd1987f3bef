import { create, unitDependencies } from 'mathjs';
import type { Quantity, UnitSystem } from '@/lib/domain/units';

export type { Quantity };

// Conversions go through mathjs's unit system (its definitions are the exact ones of NIST SP 811), not a table of ours.
const math = create({ unitDependencies });

interface UnitPair {
  /** mathjs unit names */
  si: string;
  us: string;
  /** What the page prints */
  siLabel: string;
  usLabel: string;
}

export const QUANTITIES: Record<Quantity, UnitPair> = {
  length: { si: 'm', us: 'ft', siLabel: 'm', usLabel: 'ft' },
  mass: { si: 'kg', us: 'lb', siLabel: 'kg', usLabel: 'lb' },
  time: { si: 's', us: 's', siLabel: 's', usLabel: 's' },
  speed: { si: 'm/s', us: 'ft/s', siLabel: 'm/s', usLabel: 'ft/s' },
  energy: { si: 'J', us: 'ft lbf', siLabel: 'J', usLabel: 'ft·lbf' },
  momentum: { si: 'kg m/s', us: 'lb ft/s', siLabel: 'kg·m/s', usLabel: 'lb·ft/s' },
  area: { si: 'm^2', us: 'ft^2', siLabel: 'm²', usLabel: 'ft²' },
  volume: { si: 'm^3', us: 'ft^3', siLabel: 'm³', usLabel: 'ft³' },
  density: { si: 'kg/m^3', us: 'lb/ft^3', siLabel: 'kg/m³', usLabel: 'lb/ft³' },
  viscosity: { si: 'Pa s', us: 'lb/(ft s)', siLabel: 'Pa·s', usLabel: 'lb/(ft·s)' },
  linearDrag: { si: 'kg/s', us: 'lb/s', siLabel: 'kg/s', usLabel: 'lb/s' },
  acceleration: { si: 'm/s^2', us: 'ft/s^2', siLabel: 'm/s²', usLabel: 'ft/s²' },
  temperature: { si: 'degC', us: 'degF', siLabel: '°C', usLabel: '°F' },
  temperatureDelta: { si: 'K', us: 'degR', siLabel: '°C', usLabel: '°F' },
};

export function unitLabel(quantity: Quantity, system: UnitSystem): string {
  const pair = QUANTITIES[quantity];
  return system === 'si' ? pair.siLabel : pair.usLabel;
}

/** A value typed in the user's unit system, in SI. */
export function toSI(quantity: Quantity, value: number, system: UnitSystem): number {
  if (system === 'si' || !Number.isFinite(value)) return value;
  const pair = QUANTITIES[quantity];
  return math.unit(value, pair.us).toNumber(pair.si);
}

/** An SI value in the user's unit system. */
export function fromSI(quantity: Quantity, value: number, system: UnitSystem): number {
  if (system === 'si' || !Number.isFinite(value)) return value;
  const pair = QUANTITIES[quantity];
  return math.unit(value, pair.si).toNumber(pair.us);
}

/** Significant figures, without exponent notation for the magnitudes a site sees. */
export function formatNumber(value: number, significant = 3): string {
  if (!Number.isFinite(value)) return '—';
  if (value === 0) return '0';
  const abs = Math.abs(value);
  if (abs >= 1e6 || abs < 1e-3) return value.toExponential(significant - 1);
  const digits = Math.max(0, significant - 1 - Math.floor(Math.log10(abs)));
  return value.toLocaleString('en-GB', { maximumFractionDigits: digits, minimumFractionDigits: 0 });
}

/** An SI value shown in the user's system, with its unit. */
export function formatQuantity(quantity: Quantity, valueSI: number, system: UnitSystem, significant = 3): string {
  return `${formatNumber(fromSI(quantity, valueSI, system), significant)} ${unitLabel(quantity, system)}`;
}
