import type { ShapeChoice } from '@/lib/calculator/form';
import type { DragModel } from '@/lib/physics';

export const SHAPE_LABELS: Record<ShapeChoice, string> = {
  tumbling_box: 'Box or toolbag, tumbling',
  cube_face_on: 'Cube, face down',
  cube_edge_on: 'Cube, edge down',
  sphere: 'Ball or sphere',
  cylinder_side_on: 'Cylinder or pipe, on its side',
  cylinder_end_on: 'Cylinder or pipe, end first',
  long_bar: 'Bar, tube or scaffold member, broadside',
  flat_plate: 'Sheet, panel or plate, falling flat',
  disc: 'Disc or lid, falling flat',
  person_horizontal: 'Person, face down',
  person_feet_first: 'Person, upright',
  direct: 'Other: type C_d, area and volume',
};

export const DIMENSION_LABELS: Record<string, string> = {
  diameter: 'Diameter',
  side: 'Side',
  length: 'Length',
  width: 'Width',
  height: 'Height',
  thickness: 'Thickness',
  breadth: 'Breadth (shoulders)',
  depth: 'Depth (chest)',
};

export const MODEL_LABELS: Record<'auto' | DragModel, string> = {
  auto: 'Automatic (Newton’s quadratic law)',
  quadratic: 'Quadratic (Newton’s drag law)',
  linear: 'Linear (Stokes’ law)',
  linear_quadratic: 'Linear plus quadratic',
  none: 'None (vacuum)',
};

export const PATH_LABELS = {
  air: 'Air, to the ground or deck',
  seawater: 'Seawater only',
  freshwater: 'Fresh water only',
  custom: 'Custom medium',
  deck_to_sea: 'Deck to seabed: air, then seawater',
} as const;

export const RELEASE_LABELS = {
  rest: 'Dropped from rest',
  thrown: 'Thrown or knocked off',
  swing: 'Swinging on a sling',
} as const;
