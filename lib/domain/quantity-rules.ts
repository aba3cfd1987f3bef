import type { DimensionKey } from './shapes';
import type { Quantity } from './units';

/** What a typed number must satisfy: limits are SI, messages print them in the user's units. */
export interface QuantityRule {
  label: string;
  /** null for pure numbers (a drag coefficient, a count) */
  quantity: Quantity | null;
  /** SI limits */
  min?: number;
  max?: number;
  exclusiveMin?: boolean;
  integer?: boolean;
  /** What follows a pure number's limit in a message ("°"). */
  unitless?: string;
}

const dimension = (label: string, max: number): QuantityRule => ({ label, quantity: 'length', min: 0, max, exclusiveMin: true });

/**
 * The calculator's fields. A what-if tool may widen or narrow these without changing what the register stores:
 * the register has its own table below.
 */
export const CALCULATOR_RULES = {
  diameter: dimension('Diameter', 50),
  side: dimension('Side', 50),
  length: dimension('Length', 100),
  width: dimension('Width', 50),
  height: dimension('Height', 50),
  thickness: dimension('Thickness', 10),
  breadth: dimension('Breadth', 5),
  depth: dimension('Depth', 5),
  mass: { label: 'Mass', quantity: 'mass', min: 0, max: 500_000, exclusiveMin: true },
  cd: { label: 'Drag coefficient', quantity: null, unitless: '', min: 0, max: 5, exclusiveMin: true },
  area: { label: 'Reference area', quantity: 'area', min: 0, max: 1000, exclusiveMin: true },
  volume: { label: 'Volume', quantity: 'volume', min: 0, max: 1000 },
  addedMass: { label: 'Added-mass coefficient', quantity: null, unitless: '', min: 0, max: 10 },
  linearCoeff: { label: 'Linear drag coefficient', quantity: 'linearDrag', min: 0, max: 1e6 },
  altitude: { label: 'Site altitude', quantity: 'length', min: -500, max: 11_019 },
  tempOffset: { label: 'Temperature offset from ISA', quantity: 'temperatureDelta', min: -60, max: 60 },
  waterTemp: { label: 'Water temperature', quantity: 'temperature', min: 0, max: 40 },
  density: { label: 'Medium density', quantity: 'density', min: 0, max: 20_000, exclusiveMin: true },
  viscosity: { label: 'Medium viscosity', quantity: 'viscosity', min: 0, max: 100, exclusiveMin: true },
  dropHeight: { label: 'Drop height', quantity: 'length', min: 0, max: 10_000 },
  airGap: { label: 'Deck height above the water', quantity: 'length', min: 0, max: 500 },
  waterDepth: { label: 'Water depth', quantity: 'length', min: 0, max: 4000, exclusiveMin: true },
  wind: { label: 'Wind speed', quantity: 'speed', min: 0, max: 70 },
  current: { label: 'Current', quantity: 'speed', min: 0, max: 5 },
  releaseSpeed: { label: 'Release speed', quantity: 'speed', min: 0, max: 100 },
  releaseAngle: { label: 'Release direction', quantity: null, unitless: '°', min: -90, max: 90 },
} as const satisfies Record<string, QuantityRule>;
export type CalculatorRuleKey = keyof typeof CALCULATOR_RULES;

/**
 * What an item in the register may hold, for its form, the item API and the CSV import alike. The values are the
 * ones the register has accepted since it opened; a change here changes what stored data may look like.
 */
export const REGISTER_RULES = {
  diameter: dimension('Diameter', 50),
  side: dimension('Side', 50),
  length: dimension('Length', 100),
  width: dimension('Width', 50),
  height: dimension('Height', 50),
  thickness: dimension('Thickness', 10),
  breadth: dimension('Breadth', 5),
  depth: dimension('Depth', 5),
  mass: { label: 'Mass', quantity: 'mass', min: 0, max: 500_000, exclusiveMin: true },
  cd: { label: 'Drag coefficient', quantity: null, unitless: '', min: 0, max: 5, exclusiveMin: true },
  area: { label: 'Reference area', quantity: 'area', min: 0, max: 1000, exclusiveMin: true },
  volume: { label: 'Volume', quantity: 'volume', min: 0, max: 1000 },
  quantity: { label: 'Quantity', quantity: null, min: 1, max: 100_000, integer: true },
  /** The item's own release height, over its level's floor height. */
  releaseHeight: { label: 'Height', quantity: 'length', min: 0, max: 10_000 },
} as const satisfies Record<DimensionKey | 'mass' | 'cd' | 'area' | 'volume' | 'quantity' | 'releaseHeight', QuantityRule>;
