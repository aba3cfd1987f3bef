/**
 * Names of the object shapes people pick from, and of the dimensions those shapes take. The shape ids themselves
 * belong to the physics catalogue (lib/physics/shapes.ts); keying these tables by the literal ids lets the compiler
 * refuse a label read for a shape that has none, and tests/unit/domain.test.ts checks the two lists agree.
 */
export const SHAPE_LABELS = {
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
} as const;

export const DIMENSIONS = ['diameter', 'side', 'length', 'width', 'height', 'thickness', 'breadth', 'depth'] as const;
export type DimensionKey = (typeof DIMENSIONS)[number];

export const DIMENSION_LABELS: Record<DimensionKey, string> = {
  diameter: 'Diameter',
  side: 'Side',
  length: 'Length',
  width: 'Width',
  height: 'Height',
  thickness: 'Thickness',
  breadth: 'Breadth (shoulders)',
  depth: 'Depth (chest)',
};
