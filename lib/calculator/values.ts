import type { UnitSystem } from '@/lib/domain';
import type { MaterialId } from '@/lib/materials';
import { DRAG_MODELS, type DragModel } from '@/lib/physics/drag';
import type { ShapeChoice } from '@/lib/shape-choice';

/**
 * The calculator's form, in the user's units. Every value is the text of an input, so the page state is exactly
 * what the URL carries; `toDropCase` turns a valid form into the SI drop case the physics core and the API take.
 */
export const PATHS = ['air', 'seawater', 'freshwater', 'custom', 'deck_to_sea'] as const;
export type PathKind = (typeof PATHS)[number];
export const RELEASES = ['rest', 'thrown', 'swing'] as const;
export type ReleaseKind = (typeof RELEASES)[number];
export const MODEL_CHOICES = ['auto', ...DRAG_MODELS] as const;
export type ModelChoice = 'auto' | DragModel;

export interface CalculatorValues {
  units: UnitSystem;
  shape: ShapeChoice;
  diameter: string;
  side: string;
  length: string;
  width: string;
  height: string;
  thickness: string;
  breadth: string;
  depth: string;
  massSource: 'typed' | 'material';
  mass: string;
  material: MaterialId;
  cd: string;
  area: string;
  volume: string;
  addedMass: string;
  linearCoeff: string;
  path: PathKind;
  altitude: string;
  tempOffset: string;
  waterTemp: string;
  density: string;
  viscosity: string;
  dropHeight: string;
  airGap: string;
  waterDepth: string;
  wind: string;
  current: string;
  release: ReleaseKind;
  releaseSpeed: string;
  releaseAngle: string;
  model: ModelChoice;
}

/** The SI form a new calculation opens with: round metric values for a hand-sized box dropped from a scaffold. */
export const DEFAULT_VALUES: CalculatorValues = {
  units: 'si',
  shape: 'tumbling_box',
  diameter: '',
  side: '',
  length: '0.3',
  width: '0.2',
  height: '0.1',
  thickness: '',
  breadth: '',
  depth: '',
  massSource: 'typed',
  mass: '5',
  material: 'steel',
  cd: '',
  area: '',
  volume: '',
  addedMass: '',
  linearCoeff: '',
  path: 'air',
  altitude: '0',
  tempOffset: '0',
  waterTemp: '10',
  density: '',
  viscosity: '',
  dropHeight: '30',
  airGap: '25',
  waterDepth: '80',
  wind: '0',
  current: '0',
  release: 'rest',
  releaseSpeed: '0',
  releaseAngle: '0',
  model: 'auto',
};

/**
 * The same starting case in round US customary values rather than the SI numbers converted (0.98 ft) or relabelled
 * (0.3 ft, 10 °F water). Only the unit-bearing fields differ; zeros and blanks read the same in both systems.
 * The box is sized so it sinks in water (10 lb in 0.125 ft³ is about 1,280 kg/m³), so every path shows a fall.
 */
const US_DEFAULTS: Partial<CalculatorValues> = {
  units: 'us',
  length: '1',
  width: '0.5',
  height: '0.25',
  mass: '10',
  waterTemp: '50',
  dropHeight: '100',
  airGap: '80',
  waterDepth: '250',
};

export function defaultValues(units: UnitSystem): CalculatorValues {
  return units === 'us' ? { ...DEFAULT_VALUES, ...US_DEFAULTS } : DEFAULT_VALUES;
}
