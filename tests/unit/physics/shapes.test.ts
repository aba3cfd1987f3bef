import { describe, expect, it } from 'vitest';
import { SHAPE_IDS, shapeDimensions, shapeProperties } from '@/lib/physics';

/**
 * The catalogue's areas and volumes against geometry worked out by hand (values written out,
 * rounded to 12 significant figures), and its added masses against potential-flow results.
 */
const props = (shape: string, dims: Record<string, number>, mass = 1) => shapeProperties(shape, dims, mass);

describe('shape catalogue: areas and volumes', () => {
  it.each<[string, Record<string, number>, number, number, string]>([
    // [shape, dimensions, projected area m², volume m³, source]
    ['sphere', { diameter: 0.2 }, 0.0314159265359, 0.00418879020479, 'circle πd²/4, sphere πd³/6'],
    ['cube_face_on', { side: 0.3 }, 0.09, 0.027, 'square a², cube a³'],
    // Rotated 45° about a horizontal axis the cube shows a face diagonal by a side.
    ['cube_edge_on', { side: 0.3 }, 0.127279220614, 0.027, 'rectangle a·a√2'],
    ['cylinder_side_on', { length: 1.2, diameter: 0.1 }, 0.12, 0.00942477796077, 'rectangle L·d, cylinder πd²L/4'],
    ['cylinder_end_on', { length: 1.2, diameter: 0.1 }, 0.00785398163397, 0.00942477796077, 'circle πd²/4'],
    ['flat_plate', { width: 0.5, height: 0.8, thickness: 0.01 }, 0.4, 0.004, 'rectangle w·h, slab w·h·t'],
    ['disc', { diameter: 0.5, thickness: 0.02 }, 0.196349540849, 0.00392699081699, 'circle πd²/4, slab πd²t/4'],
    ['long_bar', { length: 2, width: 0.05 }, 0.1, 0.005, 'rectangle L·a, square bar L·a²'],
    // Cauchy: the mean projected area of a convex body over all orientations is a quarter of its surface.
    ['tumbling_box', { length: 0.4, width: 0.3, height: 0.2 }, 0.13, 0.024, 'surface 2(lw + wh + hl) = 0.52 m², a quarter of it'],
    ['person_horizontal', { height: 1.8, breadth: 0.5 }, 0.706858347058, 80 / 985, 'ellipse π·a·b/4; volume m/985 kg/m³'],
    ['person_feet_first', { breadth: 0.5, depth: 0.3 }, 0.117809724510, 80 / 985, 'ellipse π·a·b/4'],
  ])('%s', (shape, dims, area, volume) => {
    const p = props(shape, dims, 80);
    expect(p.area_m2 / area).toBeCloseTo(1, 10);
    expect(p.volume_m3 / volume).toBeCloseTo(1, 10);
  });

  it('covers every shape in the catalogue', () => {
    // A shape added without a row above fails here.
    expect(SHAPE_IDS.sort()).toEqual(
      ['cube_edge_on', 'cube_face_on', 'cylinder_end_on', 'cylinder_side_on', 'disc', 'flat_plate', 'long_bar', 'person_feet_first', 'person_horizontal', 'sphere', 'tumbling_box'],
    );
    for (const s of SHAPE_IDS) expect(shapeDimensions(s).length).toBeGreaterThan(0);
  });

  it('a tumbling cube has the mean of its projected areas, 1.5·a² (Cauchy)', () => {
    // Cube of side 1: surface 6, mean projected area 6/4 = 1.5, between face-on (1) and the largest (√3 ≈ 1.732).
    expect(props('tumbling_box', { length: 1, width: 1, height: 1 }).area_m2).toBeCloseTo(1.5, 12);
  });
});

describe('shape catalogue: added mass', () => {
  it('sphere: half the displaced volume (potential flow, Lamb, Hydrodynamics)', () => {
    const p = props('sphere', { diameter: 0.2 });
    expect(p.added_mass_coeff * p.volume_m3).toBeCloseTo(0.5 * 0.00418879020479, 12);
  });

  it('disc broadside: (8/3)·r³ of fluid (potential flow, Lamb, Hydrodynamics; recalled from memory)', () => {
    // r = 0.25 m: (8/3)·0.015625 = 0.0416666… m³ of fluid, whatever the disc's thickness.
    for (const thickness of [0.005, 0.02]) {
      const p = props('disc', { diameter: 0.5, thickness });
      expect(p.added_mass_coeff * p.volume_m3).toBeCloseTo(0.0416666666667, 12);
    }
  });
});
