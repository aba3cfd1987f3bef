// The demo company's register: invented sites with the kind of items a survey at height lists, so every page of
// the register has something to show on first start. Every value passes the same schemas as user input.
import type { DimensionKey, ItemCategory, Securing } from '@/lib/domain';
import type { ShapeChoice } from '@/lib/shape-choice';
import { computeItem } from '@/lib/register/compute';
import { itemSchema } from '@/lib/validation/item';
import { levelSchema } from '@/lib/validation/level';
import { siteSchema } from '@/lib/validation/site';
import { createItem } from '../items';
import { getDb } from '../knex';
import { createLevel } from '../levels';
import { createSite } from '../sites';
import type { Conn } from '../types';

interface DemoItem {
  tag: string;
  description: string;
  category: ItemCategory;
  quantity?: number;
  mass: number;
  shape: ShapeChoice;
  dimensions?: Partial<Record<DimensionKey, number>>;
  cd?: number;
  area?: number;
  volume?: number;
  height?: number;
  securing: Securing;
  last_inspected?: string;
  notes?: string;
}

interface DemoLevel {
  name: string;
  floor_height: number;
  surface: 'ground' | 'deck' | 'water';
  water_depth?: number;
  notes?: string;
  items: DemoItem[];
}

interface DemoSite {
  name: string;
  kind: 'building' | 'wind_turbine' | 'offshore_deck';
  location: string;
  surface: 'ground' | 'deck' | 'water';
  water_depth?: number;
  altitude?: number;
  design_wind: number;
  current?: number;
  notes: string;
  levels: DemoLevel[];
}

const TOWER: DemoSite = {
  name: 'Copperhythe Tower, Block B (demo)',
  kind: 'building',
  location: 'Fictional city-centre plot, demo scenario',
  surface: 'ground',
  design_wind: 12,
  notes: 'Fourteen-storey concrete frame under construction; edge protection on every slab, tied scaffold on the east elevation.',
  levels: [
    {
      name: 'Roof plant deck',
      floor_height: 52,
      surface: 'ground',
      notes: 'Parapet 1.1 m; the public footway runs below the north edge.',
      items: [
        { tag: 'B-R-001', description: 'Torque wrench, 1/2" drive', category: 'hand_tool', mass: 1.6, shape: 'long_bar', dimensions: { length: 0.45, width: 0.035 }, securing: 'tethered', last_inspected: '2026-10-14' },
        { tag: 'B-R-002', description: 'Podger spanner', category: 'hand_tool', mass: 0.45, shape: 'long_bar', dimensions: { length: 0.3, width: 0.02 }, securing: 'tethered' },
        { tag: 'B-R-004', description: 'Bolt box, M16 (part full)', category: 'fastener', mass: 6, shape: 'tumbling_box', dimensions: { length: 0.3, width: 0.2, height: 0.12 }, securing: 'contained' },
        { tag: 'B-R-005', description: 'PIR insulation board, 2.4 × 1.2 m', category: 'loose_material', quantity: 12, mass: 8.6, shape: 'flat_plate', dimensions: { width: 1.2, height: 2.4, thickness: 0.1 }, securing: 'unsecured', notes: 'Stacked for the roof build-up; banded only while on the pallet.' },
        { tag: 'B-R-006', description: 'Plywood sheet, 18 mm', category: 'loose_material', quantity: 6, mass: 28, shape: 'flat_plate', dimensions: { width: 1.22, height: 2.44, thickness: 0.018 }, securing: 'unsecured' },
        { tag: 'B-R-007', description: 'Aviation warning light on mast', category: 'light_fitting', mass: 3.2, shape: 'cylinder_end_on', dimensions: { length: 0.2, diameter: 0.15 }, height: 56, securing: 'fixed_with_secondary', last_inspected: '2026-09-03', notes: 'Top of the 4 m lightning mast.' },
        { tag: 'B-R-008', description: 'Junction box, roof plant', category: 'equipment', mass: 4.5, shape: 'tumbling_box', dimensions: { length: 0.3, width: 0.3, height: 0.15 }, securing: 'fixed_without_secondary' },
        { tag: 'B-R-009', description: 'CCTV camera, site security', category: 'equipment', mass: 2.1, shape: 'cylinder_side_on', dimensions: { length: 0.35, diameter: 0.12 }, securing: 'fixed_with_secondary', last_inspected: '2026-09-03' },
        { tag: 'B-R-010', description: 'Hi-vis vest clip-on torch', category: 'other', mass: 0.1, shape: 'tumbling_box', dimensions: { length: 0.09, width: 0.04, height: 0.03 }, securing: 'unsecured' },
        { tag: 'B-R-011', description: 'Pallet of membrane rolls, craned to the roof', category: 'load_in_transit', mass: 420, shape: 'tumbling_box', dimensions: { length: 1.2, width: 1, height: 0.9 }, securing: 'fixed_without_secondary', notes: 'Lifted on a pallet fork; no net or bag around the rolls.' },
      ],
    },
    {
      name: 'Level 13 slab edge',
      floor_height: 45.5,
      surface: 'ground',
      items: [
        { tag: 'B-13-001', description: 'Scaffold clamps, doubles (bagged)', category: 'fastener', quantity: 40, mass: 1.1, shape: 'tumbling_box', dimensions: { length: 0.1, width: 0.08, height: 0.06 }, securing: 'contained' },
        { tag: 'B-13-002', description: 'Cordless drill', category: 'hand_tool', mass: 2.3, shape: 'tumbling_box', dimensions: { length: 0.28, width: 0.25, height: 0.08 }, securing: 'tethered' },
        { tag: 'B-13-003', description: 'Festoon lamp, temporary lighting', category: 'light_fitting', quantity: 24, mass: 0.2, shape: 'sphere', dimensions: { diameter: 0.08 }, securing: 'fixed_without_secondary' },
        { tag: 'B-13-004', description: 'Spirit level, 1.2 m', category: 'hand_tool', mass: 1.1, shape: 'long_bar', dimensions: { length: 1.2, width: 0.05 }, securing: 'unsecured' },
        { tag: 'B-13-005', description: 'Bucket of anchor bolts', category: 'fastener', mass: 7.5, shape: 'cylinder_end_on', dimensions: { length: 0.3, diameter: 0.28 }, securing: 'contained' },
        { tag: 'B-13-006', description: 'Tape measure, 5 m', category: 'hand_tool', mass: 0.25, shape: 'tumbling_box', dimensions: { length: 0.08, width: 0.08, height: 0.04 }, securing: 'tethered' },
        { tag: 'B-13-007', description: 'Edge-protection mesh panel', category: 'structural_part', quantity: 18, mass: 22, shape: 'direct', cd: 0.5, area: 2.86, securing: 'fixed_with_secondary', last_inspected: '2026-11-02', notes: 'Open mesh: drag from the solid fraction of the panel, not its outline.' },
      ],
    },
    {
      name: 'Level 9 slab edge',
      floor_height: 31.5,
      surface: 'ground',
      items: [
        { tag: 'B-09-001', description: 'Window frame, aluminium, being landed', category: 'load_in_transit', mass: 32, shape: 'flat_plate', dimensions: { width: 1.5, height: 1.2, thickness: 0.07 }, securing: 'unsecured' },
        { tag: 'B-09-002', description: 'Hand saw', category: 'hand_tool', mass: 0.5, shape: 'flat_plate', dimensions: { width: 0.55, height: 0.12, thickness: 0.002 }, securing: 'unsecured' },
        { tag: 'B-09-003', description: 'Formwork tie bar, 1 m', category: 'loose_material', quantity: 20, mass: 1.8, shape: 'cylinder_side_on', dimensions: { length: 1, diameter: 0.017 }, securing: 'unsecured' },
        { tag: 'B-09-004', description: 'Fire extinguisher, 9 kg powder', category: 'equipment', mass: 13, shape: 'cylinder_end_on', dimensions: { length: 0.55, diameter: 0.18 }, securing: 'fixed_with_secondary', last_inspected: '2026-08-19' },
        { tag: 'B-09-005', description: 'Emergency bulkhead light', category: 'light_fitting', quantity: 6, mass: 1.4, shape: 'tumbling_box', dimensions: { length: 0.35, width: 0.12, height: 0.08 }, securing: 'fixed_without_secondary' },
        { tag: 'B-09-006', description: 'Socket set in tool bag', category: 'hand_tool', mass: 5, shape: 'tumbling_box', dimensions: { length: 0.4, width: 0.25, height: 0.2 }, securing: 'contained' },
      ],
    },
    {
      name: 'Scaffold lift 6, east elevation',
      floor_height: 12,
      surface: 'ground',
      notes: 'Brick guards fitted on lifts 4 to 6.',
      items: [
        { tag: 'B-S6-001', description: 'Scaffold tube, 3 m', category: 'loose_material', quantity: 8, mass: 13.1, shape: 'cylinder_side_on', dimensions: { length: 3, diameter: 0.0483 }, securing: 'unsecured' },
        { tag: 'B-S6-002', description: 'Scaffold board, 3.9 m', category: 'loose_material', quantity: 10, mass: 22, shape: 'flat_plate', dimensions: { width: 0.225, height: 3.9, thickness: 0.038 }, securing: 'unsecured' },
        { tag: 'B-S6-003', description: 'Scaffold key', category: 'hand_tool', mass: 0.5, shape: 'long_bar', dimensions: { length: 0.28, width: 0.02 }, securing: 'tethered' },
        { tag: 'B-S6-004', description: 'Toe-board clips (bagged)', category: 'fastener', quantity: 30, mass: 0.35, shape: 'tumbling_box', dimensions: { length: 0.08, width: 0.05, height: 0.04 }, securing: 'contained' },
        { tag: 'B-S6-005', description: 'Bricks on the loading bay', category: 'loose_material', quantity: 50, mass: 2.7, shape: 'tumbling_box', dimensions: { length: 0.215, width: 0.1025, height: 0.065 }, securing: 'unsecured' },
        { tag: 'B-S6-006', description: 'Chalk line reel', category: 'hand_tool', mass: 0.15, shape: 'tumbling_box', dimensions: { length: 0.12, width: 0.07, height: 0.04 }, securing: 'unsecured' },
      ],
    },
    {
      name: 'Loading bay canopy',
      floor_height: 5,
      surface: 'ground',
      items: [
        { tag: 'B-LC-001', description: 'Canopy floodlight', category: 'light_fitting', mass: 6.5, shape: 'tumbling_box', dimensions: { length: 0.4, width: 0.3, height: 0.12 }, securing: 'fixed_with_secondary', last_inspected: '2026-07-07' },
        { tag: 'B-LC-002', description: 'Plasterboard offcut', category: 'loose_material', quantity: 4, mass: 6, shape: 'flat_plate', dimensions: { width: 1.2, height: 0.6, thickness: 0.0125 }, securing: 'unsecured' },
        { tag: 'B-LC-003', description: 'Bag of cable ties', category: 'fastener', mass: 0.1, shape: 'tumbling_box', dimensions: { length: 0.2, width: 0.1, height: 0.03 }, securing: 'unsecured' },
      ],
    },
  ],
};

const PLATFORM: DemoSite = {
  name: 'Skarvhol Alpha drilling platform (demo)',
  kind: 'offshore_deck',
  location: 'Fictional field, 140 km offshore, demo scenario',
  surface: 'water',
  water_depth: 85,
  design_wind: 15,
  current: 0.5,
  notes: 'Fixed steel jacket. Crane lifts run over the pipe deck and, for supply-boat transfers, over the sea on the west side.',
  levels: [
    {
      name: 'Derrick, monkey board',
      floor_height: 27,
      surface: 'deck',
      notes: 'Height above the drill floor, which an object from the derrick lands on.',
      items: [
        { tag: 'OD-MB-001', description: 'Fingerboard latch pin', category: 'fitting', quantity: 12, mass: 2.2, shape: 'cylinder_side_on', dimensions: { length: 0.35, diameter: 0.035 }, securing: 'fixed_with_secondary', last_inspected: '2026-08-11' },
        { tag: 'OD-MB-002', description: 'Derrick floodlight', category: 'light_fitting', quantity: 4, mass: 14, shape: 'tumbling_box', dimensions: { length: 0.45, width: 0.35, height: 0.25 }, securing: 'fixed_with_secondary', last_inspected: '2026-06-18' },
        { tag: 'OD-MB-003', description: 'Hand-held radio, derrickman', category: 'equipment', mass: 0.35, shape: 'tumbling_box', dimensions: { length: 0.13, width: 0.06, height: 0.04 }, securing: 'tethered' },
        { tag: 'OD-MB-004', description: 'Lump hammer', category: 'hand_tool', mass: 1.8, shape: 'long_bar', dimensions: { length: 0.4, width: 0.04 }, securing: 'tethered' },
        { tag: 'OD-MB-005', description: 'Bow shackle, 4.75 t (spares)', category: 'fastener', quantity: 4, mass: 1.2, shape: 'tumbling_box', dimensions: { length: 0.12, width: 0.08, height: 0.03 }, securing: 'contained' },
      ],
    },
    {
      name: 'Drill floor edge',
      floor_height: 12,
      surface: 'deck',
      notes: 'Height above the main deck below the V-door.',
      items: [
        { tag: 'OD-DF-003', description: 'Pipe wrench, 24"', category: 'hand_tool', mass: 3.6, shape: 'long_bar', dimensions: { length: 0.6, width: 0.05 }, securing: 'tethered' },
        { tag: 'OD-DF-007', description: 'Slip die inserts (boxed)', category: 'fitting', mass: 4, shape: 'tumbling_box', dimensions: { length: 0.25, width: 0.15, height: 0.1 }, securing: 'contained' },
        { tag: 'OD-DF-009', description: 'Torque wrench, 3/4" drive', category: 'hand_tool', mass: 3.2, shape: 'long_bar', dimensions: { length: 0.9, width: 0.04 }, securing: 'tethered', last_inspected: '2026-10-30' },
        { tag: 'OD-DF-011', description: 'Junction box, Ex d', category: 'equipment', mass: 12, shape: 'tumbling_box', dimensions: { length: 0.35, width: 0.3, height: 0.18 }, securing: 'fixed_without_secondary' },
        { tag: 'OD-DF-014', description: 'CCTV camera, Ex housing', category: 'equipment', mass: 4.8, shape: 'cylinder_side_on', dimensions: { length: 0.4, diameter: 0.15 }, securing: 'fixed_with_secondary', last_inspected: '2026-03-27' },
      ],
    },
    {
      name: 'Cellar deck, outboard edge',
      floor_height: 21,
      surface: 'water',
      water_depth: 85,
      items: [
        { tag: 'OD-CD-001', description: 'Grating clips', category: 'fastener', quantity: 20, mass: 0.2, shape: 'tumbling_box', dimensions: { length: 0.08, width: 0.05, height: 0.03 }, securing: 'unsecured' },
        { tag: 'OD-CD-002', description: 'Combination spanner, 32 mm', category: 'hand_tool', mass: 0.6, shape: 'long_bar', dimensions: { length: 0.35, width: 0.025 }, securing: 'tethered' },
        { tag: 'OD-CD-003', description: 'Walkway light, linear', category: 'light_fitting', quantity: 8, mass: 3.5, shape: 'cylinder_side_on', dimensions: { length: 0.6, diameter: 0.07 }, securing: 'fixed_without_secondary' },
        { tag: 'OD-CD-004', description: 'Scaffold clamps (bagged)', category: 'fastener', quantity: 25, mass: 1.1, shape: 'tumbling_box', dimensions: { length: 0.1, width: 0.08, height: 0.06 }, securing: 'contained' },
        { tag: 'OD-CD-005', description: 'Plywood cover panel, 12 mm', category: 'loose_material', quantity: 3, mass: 18, shape: 'flat_plate', dimensions: { width: 1.22, height: 2.44, thickness: 0.012 }, securing: 'unsecured', notes: 'Floats: the register keeps its energy on arrival at the sea surface.' },
        { tag: 'OD-CD-006', description: 'Fire hose nozzle', category: 'equipment', mass: 2.5, shape: 'cylinder_end_on', dimensions: { length: 0.3, diameter: 0.08 }, securing: 'fixed_with_secondary', last_inspected: '2026-05-12' },
        { tag: 'OD-CD-007', description: 'Sledgehammer, 4 kg', category: 'hand_tool', mass: 4, shape: 'long_bar', dimensions: { length: 0.9, width: 0.06 }, volume: 0.0012, securing: 'tethered', notes: 'Steel head on a wooden shaft: the volume is the tool, not the bar around it.' },
      ],
    },
    {
      name: 'Crane boom tip, over the sea',
      floor_height: 52,
      surface: 'water',
      water_depth: 85,
      notes: 'West crane at full outreach during supply-boat transfers.',
      items: [
        { tag: 'OD-CB-001', description: 'Boom-tip floodlight', category: 'light_fitting', mass: 14, shape: 'tumbling_box', dimensions: { length: 0.36, width: 0.28, height: 0.12 }, securing: 'fixed_with_secondary', last_inspected: '2026-04-22' },
        { tag: 'OD-CB-002', description: 'Aviation warning light', category: 'light_fitting', mass: 2.4, shape: 'cylinder_end_on', dimensions: { length: 0.15, diameter: 0.12 }, height: 54, securing: 'fixed_without_secondary' },
        { tag: 'OD-CB-003', description: 'Anemometer, crane wind monitor', category: 'equipment', mass: 1.2, shape: 'direct', cd: 1.1, area: 0.05, volume: 0.0006, height: 55, securing: 'fixed_with_secondary', last_inspected: '2026-04-22' },
        { tag: 'OD-CB-004', description: 'Cargo basket, small, with spares', category: 'load_in_transit', mass: 650, shape: 'direct', cd: 1.3, area: 3.2, volume: 0.09, securing: 'fixed_without_secondary', notes: 'Open steel frame: the volume is the steel and contents, not the outline.' },
        { tag: 'OD-CB-005', description: 'Pipe spool, 8" × 6 m', category: 'load_in_transit', mass: 360, shape: 'cylinder_side_on', dimensions: { length: 6, diameter: 0.22 }, volume: 0.046, securing: 'fixed_without_secondary', notes: 'Floods as it sinks: the volume is the steel, not the bore.' },
      ],
    },
    {
      name: 'Crane lift path, pipe deck',
      floor_height: 20,
      surface: 'deck',
      items: [
        { tag: 'OD-PD-001', description: 'Pipe spool, 6" × 4 m', category: 'load_in_transit', mass: 110, shape: 'cylinder_side_on', dimensions: { length: 4, diameter: 0.17 }, securing: 'fixed_without_secondary' },
        { tag: 'OD-PD-002', description: 'Gas cylinder in transport rack', category: 'load_in_transit', quantity: 4, mass: 78, shape: 'cylinder_side_on', dimensions: { length: 1.5, diameter: 0.23 }, securing: 'contained' },
        { tag: 'OD-PD-003', description: 'Sling hook latch', category: 'fitting', mass: 0.15, shape: 'flat_plate', dimensions: { width: 0.08, height: 0.04, thickness: 0.006 }, securing: 'fixed_without_secondary' },
      ],
    },
  ],
};

const TURBINE: DemoSite = {
  name: 'Scarthwaite Fell turbine WTG-04 (demo)',
  kind: 'wind_turbine',
  location: 'Fictional upland wind farm, demo scenario',
  surface: 'ground',
  altitude: 380,
  design_wind: 12,
  notes: 'Hub height 100 m. Climbing stops above 12 m/s; the design wind is that limit.',
  levels: [
    {
      name: 'Nacelle roof',
      floor_height: 104,
      surface: 'ground',
      items: [
        { tag: 'WT-NR-001', description: 'Cup anemometer', category: 'equipment', mass: 0.9, shape: 'direct', cd: 1, area: 0.04, height: 106.5, securing: 'fixed_with_secondary', last_inspected: '2026-05-20' },
        { tag: 'WT-NR-002', description: 'Wind vane', category: 'equipment', mass: 1.1, shape: 'flat_plate', dimensions: { width: 0.3, height: 0.15, thickness: 0.01 }, height: 106.5, securing: 'fixed_without_secondary' },
        { tag: 'WT-NR-003', description: 'Aviation obstruction light', category: 'light_fitting', mass: 2.8, shape: 'cylinder_end_on', dimensions: { length: 0.18, diameter: 0.2 }, securing: 'fixed_with_secondary', last_inspected: '2026-05-20' },
        { tag: 'WT-NR-004', description: 'Torque wrench, 3/4" drive', category: 'hand_tool', mass: 4.5, shape: 'long_bar', dimensions: { length: 0.8, width: 0.04 }, securing: 'tethered' },
        { tag: 'WT-NR-005', description: 'Rescue kit bag', category: 'equipment', mass: 6, shape: 'tumbling_box', dimensions: { length: 0.45, width: 0.3, height: 0.25 }, securing: 'contained' },
        { tag: 'WT-NR-006', description: 'Sealant cartridge', category: 'loose_material', mass: 0.45, shape: 'cylinder_side_on', dimensions: { length: 0.22, diameter: 0.05 }, securing: 'unsecured' },
        { tag: 'WT-NR-007', description: 'Service crane hook and chain', category: 'fitting', mass: 28, shape: 'tumbling_box', dimensions: { length: 0.3, width: 0.2, height: 0.15 }, securing: 'fixed_with_secondary', last_inspected: '2026-02-09' },
      ],
    },
    {
      name: 'Hub, spinner hatch',
      floor_height: 100,
      surface: 'ground',
      items: [
        { tag: 'WT-HB-001', description: 'Blade bolt tensioner', category: 'equipment', mass: 18, shape: 'cylinder_end_on', dimensions: { length: 0.25, diameter: 0.2 }, securing: 'tethered' },
        { tag: 'WT-HB-002', description: 'Spinner hatch bolts, M16', category: 'fastener', quantity: 16, mass: 0.14, shape: 'cylinder_side_on', dimensions: { length: 0.06, diameter: 0.016 }, securing: 'unsecured' },
        { tag: 'WT-HB-003', description: 'Impact socket, 36 mm', category: 'hand_tool', mass: 0.5, shape: 'cylinder_end_on', dimensions: { length: 0.065, diameter: 0.05 }, securing: 'tethered' },
        { tag: 'WT-HB-004', description: 'Head torch', category: 'other', mass: 0.15, shape: 'tumbling_box', dimensions: { length: 0.07, width: 0.05, height: 0.04 }, securing: 'unsecured' },
      ],
    },
  ],
};

const DEMO_SITES = [TOWER, PLATFORM, TURBINE];

/**
 * Adds the demo sites, levels and items through the same write functions the pages use, so every item is stored
 * with its computed fall and an audit entry. Pass the transaction that creates the organisation: a failure
 * part-way leaves no half-seeded demo behind, and the next start seeds it again. The demo's 68 falls are solved
 * inside that transaction, which nobody else is waiting for.
 */
export async function seedDemoRegister(organisationId: string, actorUserId: string, conn: Conn = getDb()): Promise<void> {
  for (const { levels, ...site } of DEMO_SITES) {
    const { id: siteId } = await createSite(organisationId, actorUserId, siteSchema('si').parse(site), conn);
    for (const { items, ...level } of levels) {
      const { id: levelId } = await createLevel(organisationId, actorUserId, siteId, levelSchema('si').parse(level), conn);
      for (const item of items) {
        await createItem(organisationId, actorUserId, siteId, itemSchema('si').parse({ ...item, level_id: levelId }), computeItem, conn);
      }
    }
  }
}
