import { PhysicsInputError, requirePositive } from './errors';
import { requireWithin } from './limits';

/**
 * Shape catalogue. Each entry turns dimensions into a reference area (projected on the plane
 * normal to the fall), a volume (for buoyancy and added mass), a typical drag coefficient with
 * a low-high range, and an added-mass coefficient relative to the body volume. Every number
 * names where it comes from; the ranges are the spread a planner should try, not tolerances.
 */
export type ShapeId =
  | 'sphere'
  | 'cube_face_on'
  | 'cube_edge_on'
  | 'cylinder_side_on'
  | 'cylinder_end_on'
  | 'flat_plate'
  | 'disc'
  | 'long_bar'
  | 'tumbling_box'
  | 'person_horizontal'
  | 'person_feet_first';

export interface ShapeProperties {
  readonly shape: ShapeId;
  readonly area_m2: number;
  readonly volume_m3: number;
  readonly cd: number;
  readonly cd_range: readonly [number, number];
  readonly added_mass_coeff: number;
  /** Length used for the Reynolds number. */
  readonly characteristic_length_m: number;
  /** Diameter when Stokes' law applies directly (spheres only). */
  readonly stokes_diameter_m: number | null;
  readonly sources: readonly string[];
}

interface ShapeDefinition {
  readonly dimensions: readonly string[];
  evaluate(d: Record<string, number>, massKg: number): Omit<ShapeProperties, 'shape'>;
}

const HOERNER = 'Hoerner, Fluid-Dynamic Drag (1965), recalled from memory';
const WHITE_T72 = 'F. M. White, Fluid Mechanics, Table 7.2 (after Hoerner), recalled from memory';
const WHITE_T73 = 'F. M. White, Fluid Mechanics, Table 7.3 (after Hoerner), recalled from memory';
const OPENSTAX = 'OpenStax College Physics, Table 5.2';
const H103 = 'DNV-RP-H103 (2011), Table A-2, recalled from memory';
const F107 = 'DNV-RP-F107 (2010), object categories for drag and added mass, recalled from memory';
const POTENTIAL = 'potential-flow theory (Lamb, Hydrodynamics)';
const CAUCHY = "Cauchy's projection formula: mean projected area of a convex body = surface area / 4";

/** Piecewise-linear interpolation in a table sorted by its first column, clamped at the ends. */
function interpolate(table: readonly (readonly [number, number])[], x: number): number {
  if (x <= table[0][0]) return table[0][1];
  for (let i = 1; i < table.length; i++) {
    const [x1, y1] = table[i];
    if (x <= x1) {
      const [x0, y0] = table[i - 1];
      return y0 + ((y1 - y0) * (x - x0)) / (x1 - x0);
    }
  }
  return table[table.length - 1][1];
}

// Finite circular cylinder, flow normal to the axis, Re ≈ 1e4–1e5 (WHITE_T72).
const CYLINDER_CROSSFLOW_CD: readonly (readonly [number, number])[] = [
  [1, 0.64], [2, 0.68], [3, 0.72], [5, 0.74], [10, 0.82], [20, 0.91], [40, 0.98], [1e9, 1.2],
];
// Circular cylinder, flow along the axis, by length/diameter (WHITE_T73).
const CYLINDER_AXIAL_CD: readonly (readonly [number, number])[] = [
  [0.5, 1.15], [1, 0.9], [2, 0.85], [4, 0.87], [8, 0.99],
];
// Thin rectangular plate normal to the flow, by aspect ratio (WHITE_T73).
const PLATE_CD: readonly (readonly [number, number])[] = [
  [1, 1.18], [5, 1.2], [10, 1.3], [20, 1.5], [1e9, 2.0],
];
// Added mass of a thin rectangular plate moving normal to itself, C_A referred to the volume
// (π/4)·a²·b with a the shorter and b the longer side (H103).
const PLATE_CA: readonly (readonly [number, number])[] = [
  [1, 0.579], [1.5, 0.642], [2, 0.704], [2.5, 0.757], [3, 0.801], [4, 0.872], [5, 0.897], [8, 0.934], [10, 0.947], [1e9, 1.0],
];

/** Body density used to give a person a volume (close to water; recalled from memory). */
const HUMAN_BODY_DENSITY = 985;

const SHAPES: Record<ShapeId, ShapeDefinition> = {
  sphere: {
    dimensions: ['diameter'],
    // Smooth sphere.
    evaluate: ({ diameter: d }) => ({
      area_m2: (Math.PI * d * d) / 4,
      volume_m3: (Math.PI * d * d * d) / 6,
      // Subcritical value; beyond the drag crisis (Re above about 3e5) C_d falls towards 0.1-0.2.
      cd: 0.47,
      cd_range: [0.1, 0.5],
      added_mass_coeff: 0.5,
      characteristic_length_m: d,
      stokes_diameter_m: d,
      sources: [`C_d 0.47 and range: ${HOERNER}; ${OPENSTAX} lists 0.45`, `C_a 0.5: ${POTENTIAL}`],
    }),
  },
  cube_face_on: {
    dimensions: ['side'],
    // Cube falling with a face normal to the flow.
    evaluate: ({ side: a }) => ({
      area_m2: a * a,
      volume_m3: a * a * a,
      cd: 1.05,
      cd_range: [0.8, 1.1],
      added_mass_coeff: 0.68,
      characteristic_length_m: a,
      stokes_diameter_m: null,
      sources: [`C_d 1.05 (0.80 edge-on as the low end): ${HOERNER}`, `C_a 0.68: ${H103}`],
    }),
  },
  cube_edge_on: {
    dimensions: ['side'],
    // Cube falling with an edge leading (rotated 45° about a horizontal axis).
    evaluate: ({ side: a }) => ({
      area_m2: Math.SQRT2 * a * a,
      volume_m3: a * a * a,
      cd: 0.8,
      cd_range: [0.8, 1.05],
      added_mass_coeff: 0.68,
      characteristic_length_m: Math.SQRT2 * a,
      stokes_diameter_m: null,
      sources: [`C_d 0.80: ${HOERNER}`, `C_a 0.68 as face-on: ${H103}`],
    }),
  },
  cylinder_side_on: {
    dimensions: ['length', 'diameter'],
    // Circular cylinder falling with its axis horizontal.
    evaluate: ({ length: l, diameter: d }) => ({
      area_m2: l * d,
      volume_m3: (Math.PI * d * d * l) / 4,
      cd: interpolate(CYLINDER_CROSSFLOW_CD, l / d),
      cd_range: [0.6, 1.2],
      added_mass_coeff: 1.0,
      characteristic_length_m: d,
      stokes_diameter_m: null,
      sources: [`C_d by length/diameter: ${WHITE_T72}`, `C_a 1.0 (long cylinder, upper bound for short ones): ${POTENTIAL}`],
    }),
  },
  cylinder_end_on: {
    dimensions: ['length', 'diameter'],
    // Circular cylinder falling with its axis vertical.
    evaluate: ({ length: l, diameter: d }) => ({
      area_m2: (Math.PI * d * d) / 4,
      volume_m3: (Math.PI * d * d * l) / 4,
      cd: interpolate(CYLINDER_AXIAL_CD, l / d),
      cd_range: [0.8, 1.2],
      // Axial added mass is small for slender bodies and grows for squat ones (F107 gives 0.1-1.0
      // for slender objects); the squat-body end of that range is the cautious choice here.
      added_mass_coeff: l / d >= 2 ? 0.1 : 0.6,
      characteristic_length_m: d,
      stokes_diameter_m: null,
      sources: [`C_d by length/diameter: ${WHITE_T73}`, `C_a: ${F107}`],
    }),
  },
  flat_plate: {
    dimensions: ['width', 'height', 'thickness'],
    // Thin rectangular plate falling flat (normal to the flow).
    evaluate: ({ width, height, thickness }) => {
      const a = Math.min(width, height);
      const b = Math.max(width, height);
      const volume = width * height * thickness;
      return {
        area_m2: width * height,
        volume_m3: volume,
        cd: interpolate(PLATE_CD, b / a),
        cd_range: [1.1, 2.0],
        added_mass_coeff: (interpolate(PLATE_CA, b / a) * (Math.PI / 4) * a * a * b) / volume,
        characteristic_length_m: a,
        stokes_diameter_m: null,
        sources: [`C_d by aspect ratio: ${WHITE_T73}`, `C_a converted to the plate's own volume: ${H103}`],
      };
    },
  },
  disc: {
    dimensions: ['diameter', 'thickness'],
    // Thin disc falling flat.
    evaluate: ({ diameter: d, thickness: t }) => {
      const volume = (Math.PI * d * d * t) / 4;
      return {
        area_m2: (Math.PI * d * d) / 4,
        volume_m3: volume,
        cd: 1.12,
        cd_range: [1.1, 1.2],
        // Added mass of a disc moving normal to itself is (8/3)·ρ·r³, converted to its volume.
        added_mass_coeff: ((8 / 3) * (d / 2) ** 3) / volume,
        characteristic_length_m: d,
        stokes_diameter_m: null,
        sources: [`C_d 1.12 (circular flat plate): ${OPENSTAX}; Hoerner gives about 1.17`, `C_a from (8/3)·ρ·r³: ${POTENTIAL}`],
      };
    },
  },
  long_bar: {
    dimensions: ['length', 'width'],
    // Slender bar of square section (tube, rebar, scaffold member) falling broadside.
    evaluate: ({ length: l, width: a }) => ({
      area_m2: l * a,
      volume_m3: l * a * a,
      cd: 1.2,
      cd_range: [0.7, 2.0],
      added_mass_coeff: 1.0,
      characteristic_length_m: a,
      stokes_diameter_m: null,
      sources: [
        `C_d 1.2 (long round bar) up to 2.0 (square section face-on): ${HOERNER}`,
        `range 0.7-1.5 for slender objects: ${F107}`,
        `C_a 1.0: ${POTENTIAL}`,
      ],
    }),
  },
  tumbling_box: {
    dimensions: ['length', 'width', 'height'],
    // Box tumbling as it falls (orientation unknown).
    evaluate: ({ length: l, width: w, height: h }) => ({
      area_m2: (2 * (l * w + w * h + h * l)) / 4,
      volume_m3: l * w * h,
      cd: 1.05,
      cd_range: [0.8, 1.3],
      added_mass_coeff: 1.0,
      characteristic_length_m: Math.cbrt(l * w * h),
      stokes_diameter_m: null,
      sources: [
        `area: ${CAUCHY}`,
        `C_d between edge-on 0.80 and face-on 1.05 cube (${HOERNER}), up to 1.3 for box-shaped objects (${F107})`,
        `C_a 1.0 within 0.6-1.5 for box-shaped objects: ${F107}`,
      ],
    }),
  },
  person_horizontal: {
    dimensions: ['height', 'breadth'],
    // Person falling face-down, spread (area of the ellipse inscribed in height × breadth).
    evaluate: ({ height, breadth }, mass) => ({
      area_m2: (Math.PI / 4) * height * breadth,
      volume_m3: mass / HUMAN_BODY_DENSITY,
      cd: 1.0,
      cd_range: [0.7, 1.0],
      added_mass_coeff: 1.0,
      characteristic_length_m: breadth,
      stokes_diameter_m: null,
      sources: [`C_d 1.0 (skydiver, horizontal), 0.70 (feet first): ${OPENSTAX}`, 'ellipse area and C_a 1.0: common practice'],
    }),
  },
  person_feet_first: {
    dimensions: ['breadth', 'depth'],
    // Person falling upright (area of the ellipse inscribed in breadth × depth).
    evaluate: ({ breadth, depth }, mass) => ({
      area_m2: (Math.PI / 4) * breadth * depth,
      volume_m3: mass / HUMAN_BODY_DENSITY,
      cd: 0.7,
      cd_range: [0.7, 1.0],
      added_mass_coeff: 0.2,
      characteristic_length_m: breadth,
      stokes_diameter_m: null,
      sources: [`C_d 0.70 (skydiver, feet first): ${OPENSTAX}`, 'ellipse area and C_a 0.2: common practice'],
    }),
  },
};

export const SHAPE_IDS = Object.keys(SHAPES) as ShapeId[];

export function isShapeId(value: unknown): value is ShapeId {
  return typeof value === 'string' && Object.prototype.hasOwnProperty.call(SHAPES, value);
}

export function shapeDimensions(shape: ShapeId): readonly string[] {
  return SHAPES[shape].dimensions;
}

/**
 * Properties of a catalogue shape. `dimensions` are in metres, keyed as listed by
 * `shapeDimensions`; `massKg` gives a person a volume.
 */
export function shapeProperties(shape: unknown, dimensions: unknown, massKg: number, field = 'object'): ShapeProperties {
  if (!isShapeId(shape)) {
    throw new PhysicsInputError(`${field}.shape`, `unknown shape ${JSON.stringify(shape)}; known shapes: ${SHAPE_IDS.join(', ')}`);
  }
  const def = SHAPES[shape];
  if (dimensions === null || typeof dimensions !== 'object' || Array.isArray(dimensions)) {
    throw new PhysicsInputError(`${field}.dimensions_m`, `shape ${shape} needs dimensions_m with ${def.dimensions.join(', ')} in metres`);
  }
  const given = dimensions as Record<string, unknown>;
  for (const key of Object.keys(given)) {
    if (!def.dimensions.includes(key)) {
      throw new PhysicsInputError(`${field}.dimensions_m.${key}`, `is not a dimension of ${shape}; expected ${def.dimensions.join(', ')}`);
    }
  }
  const d: Record<string, number> = {};
  for (const key of def.dimensions) d[key] = requireWithin(`${field}.dimensions_m.${key}`, requirePositive(`${field}.dimensions_m.${key}`, given[key]), 'dimension_m');
  return { shape, ...def.evaluate(d, massKg) };
}
