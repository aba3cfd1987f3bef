import type { Quantity, UnitSystem } from '@/lib/domain/units';

export type { Quantity };

// Exact definitions of NIST SP 811 (2008), Appendix B: every US customary unit here is built from these four.
const FT = 0.3048; // m
const LB = 0.45359237; // kg
const LBF = LB * 9.80665; // N: a pound-force is a pound under standard gravity
const DEG_F = 5 / 9; // K (a temperature difference)

interface UnitPair {
  /** One US customary unit in SI. */
  factor: number;
  /** The US customary reading at SI zero: only the Fahrenheit scale starts elsewhere (0 °C = 32 °F). */
  usAtSiZero?: number;
  /** What the page prints */
  siLabel: string;
  usLabel: string;
}

export const QUANTITIES: Record<Quantity, UnitPair> = {
  length: { factor: FT, siLabel: 'm', usLabel: 'ft' },
  mass: { factor: LB, siLabel: 'kg', usLabel: 'lb' },
  time: { factor: 1, siLabel: 's', usLabel: 's' },
  speed: { factor: FT, siLabel: 'm/s', usLabel: 'ft/s' },
  energy: { factor: FT * LBF, siLabel: 'J', usLabel: 'ft·lbf' },
  momentum: { factor: LB * FT, siLabel: 'kg·m/s', usLabel: 'lb·ft/s' },
  area: { factor: FT ** 2, siLabel: 'm²', usLabel: 'ft²' },
  volume: { factor: FT ** 3, siLabel: 'm³', usLabel: 'ft³' },
  density: { factor: LB / FT ** 3, siLabel: 'kg/m³', usLabel: 'lb/ft³' },
  viscosity: { factor: LB / FT, siLabel: 'Pa·s', usLabel: 'lb/(ft·s)' },
  linearDrag: { factor: LB, siLabel: 'kg/s', usLabel: 'lb/s' },
  acceleration: { factor: FT, siLabel: 'm/s²', usLabel: 'ft/s²' },
  temperature: { factor: DEG_F, usAtSiZero: 32, siLabel: '°C', usLabel: '°F' },
  temperatureDelta: { factor: DEG_F, siLabel: '°C', usLabel: '°F' },
};

export function unitLabel(quantity: Quantity, system: UnitSystem): string {
  const pair = QUANTITIES[quantity];
  return system === 'si' ? pair.siLabel : pair.usLabel;
}

/** A value typed in the user's unit system, in SI. */
export function toSI(quantity: Quantity, value: number, system: UnitSystem): number {
  if (system === 'si' || !Number.isFinite(value)) return value;
  const { factor, usAtSiZero = 0 } = QUANTITIES[quantity];
  return (value - usAtSiZero) * factor;
}

/** An SI value in the user's unit system. */
export function fromSI(quantity: Quantity, value: number, system: UnitSystem): number {
  if (system === 'si' || !Number.isFinite(value)) return value;
  const { factor, usAtSiZero = 0 } = QUANTITIES[quantity];
  return value / factor + usAtSiZero;
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
