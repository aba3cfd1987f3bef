import { MAX_SAMPLES, STANDARD_GRAVITY } from './constants';
import { INPUT_LIMITS, requireWithin, type LimitName } from './limits';
import { dragCoefficients, isDragModel, terminalSpeed, type DragCoefficients, type DragModel, DRAG_MODELS } from './drag';
import { PhysicsInputError, requireInteger, requireNonNegative, requirePositive } from './errors';
import { resolveMedium, type Medium, type MediumSpec } from './media';
import { shapeProperties, type ShapeId, type ShapeProperties } from './shapes';

/** The drop-case JSON, as the command line and the HTTP API receive it (SI units). */
export interface DropCase {
  object: ObjectSpec;
  drag_model: DragModel;
  medium?: MediumSpec;
  release?: { height_m?: number; velocity_m_s?: [number, number] };
  /** Horizontal flow of the single medium along +x. */
  wind_m_s?: number;
  /** Top first; replaces medium, release.height_m and wind_m_s. */
  layers?: LayerSpec[];
  gravity_m_s2?: number;
  /** Number of plot samples wanted (0 for none). */
  samples?: number;
}

export interface ObjectSpec {
  mass_kg: number;
  cd?: number;
  area_m2?: number;
  volume_m3?: number;
  added_mass_coeff?: number;
  linear_coeff_kg_s?: number;
  shape?: ShapeId;
  dimensions_m?: Record<string, number>;
}

export interface LayerSpec {
  medium: MediumSpec;
  thickness_m: number;
  flow_m_s?: number;
}

export interface ResolvedObject {
  readonly mass_kg: number;
  readonly cd: number | null;
  readonly area_m2: number | null;
  readonly volume_m3: number;
  readonly added_mass_coeff: number;
  readonly characteristic_length_m: number | null;
  readonly shape: ShapeProperties | null;
  /** Which properties were given explicitly rather than taken from the shape catalogue. */
  readonly explicit: { readonly cd: boolean; readonly volume: boolean; readonly added_mass: boolean };
}

/** One uniform layer with everything the equations of motion need, in SI units. */
export interface ResolvedLayer {
  readonly index: number;
  readonly medium: Medium;
  readonly top_m: number;
  readonly bottom_m: number;
  readonly flow_m_s: number;
  readonly drag: DragCoefficients;
  /** Inertial mass m + m_a; added mass is zero in a gas, where ρ_gas·V is negligible beside m. */
  readonly inertial_mass_kg: number;
  readonly added_mass_kg: number;
  /** Net weight (m − ρ·V)·g, N; zero or less means the object floats in this medium. */
  readonly net_weight_n: number;
  readonly terminal_speed_m_s: number;
  readonly field: string;
}

export interface ResolvedCase {
  readonly object: ResolvedObject;
  readonly drag_model: DragModel;
  readonly gravity_m_s2: number;
  readonly height_m: number;
  readonly release_velocity: readonly [number, number];
  readonly layers: readonly ResolvedLayer[];
  readonly single_medium: boolean;
  readonly samples: number;
}

/**
 * Below a micrometre a fall is not a meaningful planning case, and the tolerances, which scale
 * with the height, would fall below what double precision can resolve near the ground.
 */
export const MIN_HEIGHT_M = INPUT_LIMITS.height_m.min;

function requireHeight(field: string, value: unknown, zeroAllowed: boolean): number {
  const h = zeroAllowed ? requireNonNegative(field, value) : requirePositive(field, value);
  if (h !== 0 && h < MIN_HEIGHT_M) throw new PhysicsInputError(field, `must be ${zeroAllowed ? '0 or ' : ''}at least ${MIN_HEIGHT_M} m, got ${h}`);
  return h === 0 ? 0 : requireWithin(field, h, 'height_m');
}

/** The sign rule's own message first (e.g. "must be greater than zero"), then the model's limits. */
const positiveWithin = (name: LimitName) => (field: string, value: unknown) => requireWithin(field, requirePositive(field, value), name);
const nonNegativeWithin = (name: LimitName) => (field: string, value: unknown) => requireWithin(field, requireNonNegative(field, value), name);

function isObject(value: unknown): value is Record<string, unknown> {
  return value !== null && typeof value === 'object' && !Array.isArray(value);
}

function optionalNumber(field: string, value: unknown, check: (f: string, v: unknown) => number): number | undefined {
  return value === undefined ? undefined : check(field, value);
}

export function resolveObject(spec: unknown, field = 'object'): ResolvedObject {
  if (!isObject(spec)) throw new PhysicsInputError(field, 'must be an object with at least mass_kg');
  const mass = positiveWithin('mass_kg')(`${field}.mass_kg`, spec.mass_kg);
  const cd = optionalNumber(`${field}.cd`, spec.cd, nonNegativeWithin('cd'));
  const area = optionalNumber(`${field}.area_m2`, spec.area_m2, positiveWithin('area_m2'));
  const volume = optionalNumber(`${field}.volume_m3`, spec.volume_m3, nonNegativeWithin('volume_m3'));
  const ca = optionalNumber(`${field}.added_mass_coeff`, spec.added_mass_coeff, nonNegativeWithin('added_mass_coeff'));
  optionalNumber(`${field}.linear_coeff_kg_s`, spec.linear_coeff_kg_s, nonNegativeWithin('linear_coeff_kg_s'));
  let shape: ShapeProperties | null = null;
  if (spec.shape !== undefined) shape = shapeProperties(spec.shape, spec.dimensions_m, mass, field);
  else if (spec.dimensions_m !== undefined) throw new PhysicsInputError(`${field}.shape`, 'is required when dimensions_m is given');
  const resolvedArea = area ?? shape?.area_m2 ?? null;
  return {
    mass_kg: mass,
    cd: cd ?? shape?.cd ?? null,
    area_m2: resolvedArea,
    volume_m3: volume ?? shape?.volume_m3 ?? 0,
    added_mass_coeff: ca ?? shape?.added_mass_coeff ?? 0,
    // Without a shape, the diameter of the circle with the reference area (common practice).
    characteristic_length_m: shape?.characteristic_length_m ?? (resolvedArea === null ? null : Math.sqrt((4 * resolvedArea) / Math.PI)),
    shape,
    explicit: { cd: cd !== undefined, volume: volume !== undefined, added_mass: ca !== undefined },
  };
}

/**
 * Checks and resolves a drop case into SI layers ready to integrate. Throws PhysicsInputError
 * naming the first offending field; the zod schema calls this too, so the rules live here once.
 */
export function resolveDropCase(input: unknown): ResolvedCase {
  if (!isObject(input)) throw new PhysicsInputError('(case)', 'must be a JSON object');
  const object = resolveObject(input.object);
  if (!isDragModel(input.drag_model)) {
    throw new PhysicsInputError('drag_model', `must be one of ${DRAG_MODELS.map((m) => `"${m}"`).join(', ')}, got ${JSON.stringify(input.drag_model)}`);
  }
  const dragModel = input.drag_model;
  const g = input.gravity_m_s2 === undefined ? STANDARD_GRAVITY : positiveWithin('gravity_m_s2')('gravity_m_s2', input.gravity_m_s2);

  const release = input.release === undefined ? {} : input.release;
  if (!isObject(release)) throw new PhysicsInputError('release', 'must be an object');
  let v0: [number, number] = [0, 0];
  if (release.velocity_m_s !== undefined) {
    const v = release.velocity_m_s;
    if (!Array.isArray(v) || v.length !== 2) throw new PhysicsInputError('release.velocity_m_s', 'must be [horizontal, vertical] in m/s');
    v0 = [requireWithin('release.velocity_m_s.0', v[0], 'velocity_m_s'), requireWithin('release.velocity_m_s.1', v[1], 'velocity_m_s')];
  }

  const layerSpecs: { medium: unknown; thickness: number; flow: number; field: string }[] = [];
  if (input.layers !== undefined) {
    for (const key of ['medium', 'wind_m_s'] as const) {
      if (input[key] !== undefined) throw new PhysicsInputError(key, 'cannot be given with layers (layers replace medium, release.height_m and wind_m_s)');
    }
    if (release.height_m !== undefined) {
      throw new PhysicsInputError('release.height_m', 'cannot be given with layers (the release is at the top of the layer stack)');
    }
    if (!Array.isArray(input.layers) || input.layers.length === 0) throw new PhysicsInputError('layers', 'must be a non-empty list, top layer first');
    if (input.layers.length > 20) throw new PhysicsInputError('layers', `at most 20 layers, got ${input.layers.length}`);
    input.layers.forEach((layer: unknown, i: number) => {
      const f = `layers.${i}`;
      if (!isObject(layer)) throw new PhysicsInputError(f, 'must be an object with medium and thickness_m');
      layerSpecs.push({
        medium: layer.medium,
        thickness: requireHeight(`${f}.thickness_m`, layer.thickness_m, false),
        flow: layer.flow_m_s === undefined ? 0 : requireWithin(`${f}.flow_m_s`, layer.flow_m_s, 'flow_m_s'),
        field: f,
      });
    });
  } else {
    if (input.medium === undefined) throw new PhysicsInputError('medium', 'is required (or give layers)');
    if (release.height_m === undefined) throw new PhysicsInputError('release.height_m', 'is required unless layers are given');
    layerSpecs.push({
      medium: input.medium,
      thickness: requireHeight('release.height_m', release.height_m, true),
      flow: input.wind_m_s === undefined ? 0 : requireWithin('wind_m_s', input.wind_m_s, 'flow_m_s'),
      field: '',
    });
  }

  const height = layerSpecs.reduce((sum, l) => sum + l.thickness, 0);
  if (height === 0 && v0[1] > 0 && (v0[1] * v0[1]) / (2 * g) < MIN_HEIGHT_M) {
    throw new PhysicsInputError('release.velocity_m_s.1', `an upward throw from zero height must rise at least ${MIN_HEIGHT_M} m; use 0 for a release at rest`);
  }
  let top = height;
  const layers: ResolvedLayer[] = layerSpecs.map((spec, index) => {
    const mediumField = spec.field ? `${spec.field}.medium` : 'medium';
    const medium = resolveMedium(spec.medium as MediumSpec, mediumField);
    const drag = dragCoefficients(
      dragModel,
      {
        cd: object.cd ?? undefined,
        area_m2: object.area_m2 ?? undefined,
        linear_coeff_kg_s: (input.object as ObjectSpec).linear_coeff_kg_s,
        stokes_diameter_m: object.shape?.stokes_diameter_m ?? null,
      },
      medium,
      'object',
      mediumField,
    );
    const addedMass = medium.phase === 'liquid' ? medium.density_kg_m3 * object.added_mass_coeff * object.volume_m3 : 0;
    const netWeight = (object.mass_kg - medium.density_kg_m3 * object.volume_m3) * g;
    const bottom = index === layerSpecs.length - 1 ? 0 : top - spec.thickness;
    const layer: ResolvedLayer = {
      index,
      medium,
      top_m: top,
      bottom_m: bottom,
      flow_m_s: spec.flow,
      drag,
      inertial_mass_kg: object.mass_kg + addedMass,
      added_mass_kg: addedMass,
      net_weight_n: netWeight,
      terminal_speed_m_s: terminalSpeed(drag, netWeight),
      field: spec.field || 'medium',
    };
    top = bottom;
    return layer;
  });

  const samples = input.samples === undefined ? 0 : requireInteger('samples', input.samples, 0, MAX_SAMPLES);
  if (samples === 1) throw new PhysicsInputError('samples', 'must be 0 (no time series) or from 2 to ' + MAX_SAMPLES + ' (the release and the impact are always included)');
  return {
    object,
    drag_model: dragModel,
    gravity_m_s2: g,
    height_m: height,
    release_velocity: v0,
    layers,
    single_medium: input.layers === undefined || layerSpecs.length === 1,
    samples,
  };
}
