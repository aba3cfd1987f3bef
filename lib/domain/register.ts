/**
 * The register of items at height: the words a site survey uses, and the shapes of data that pass between the
 * database, the pages and the CSV files. Everything numeric is SI here; units change only at the edges.
 */
export const SITE_KINDS = ['building', 'crane', 'wind_turbine', 'offshore_deck', 'bridge', 'other'] as const;
export type SiteKind = (typeof SITE_KINDS)[number];
export const SITE_KIND_LABELS: Record<SiteKind, string> = {
  building: 'Building',
  crane: 'Crane',
  wind_turbine: 'Wind turbine',
  offshore_deck: 'Offshore deck',
  bridge: 'Bridge',
  other: 'Other',
};

/** What an object from a level lands on. Over water it falls on through seawater to the seabed. */
export const SURFACES = ['ground', 'deck', 'water'] as const;
export type Surface = (typeof SURFACES)[number];
export const SURFACE_LABELS: Record<Surface, string> = {
  ground: 'Ground',
  deck: 'Deck or floor',
  water: 'Sea, to the seabed',
};

export const SECURING = ['unsecured', 'tethered', 'contained', 'fixed_with_secondary', 'fixed_without_secondary'] as const;
export type Securing = (typeof SECURING)[number];
export const SECURING_LABELS: Record<Securing, string> = {
  unsecured: 'Unsecured',
  tethered: 'Tethered',
  contained: 'Contained',
  fixed_with_secondary: 'Fixed, with secondary retention',
  fixed_without_secondary: 'Fixed, no secondary retention',
};

export const ITEM_CATEGORIES = [
  'hand_tool',
  'fastener',
  'light_fitting',
  'fitting',
  'equipment',
  'loose_material',
  'load_in_transit',
  'structural_part',
  'other',
] as const;
export type ItemCategory = (typeof ITEM_CATEGORIES)[number];
export const CATEGORY_LABELS: Record<ItemCategory, string> = {
  hand_tool: 'Hand tool',
  fastener: 'Fastener or clamp',
  light_fitting: 'Light fitting',
  fitting: 'Fitting or attachment',
  equipment: 'Equipment',
  loose_material: 'Loose material',
  load_in_transit: 'Load in transit',
  structural_part: 'Structural part',
  other: 'Other',
};

/**
 * Colours a consequence level may take: Plumbline's own ramp, from pale cord to deep ink through brass and flare.
 * Plotly needs the hex values; pages use them as inline styles so the ramp lives only here.
 */
export const LADDER_COLOURS = {
  haze: { label: 'Haze', hex: '#9fbfc3', text: '#1b2430' },
  cord: { label: 'Cord', hex: '#1f6f78', text: '#ffffff' },
  brass: { label: 'Brass', hex: '#a9771a', text: '#ffffff' },
  flare: { label: 'Flare', hex: '#b4461a', text: '#ffffff' },
  plum: { label: 'Plum', hex: '#6b3a5e', text: '#ffffff' },
  ink: { label: 'Ink', hex: '#1b2430', text: '#ffffff' },
} as const;
export type LadderColour = keyof typeof LADDER_COLOURS;
export const LADDER_COLOUR_IDS = Object.keys(LADDER_COLOURS) as [LadderColour, ...LadderColour[]];

/** A level as the register's views need it: to name it and order it by height. */
export interface SiteLevelRef {
  id: string;
  name: string;
  floor_height_m: number;
}

/** One rung of an organisation's consequence ladder. */
export interface ConsequenceLevel {
  id: string;
  rank: number;
  name: string;
  lower_bound_j: number;
  colour: LadderColour;
  guidance: string;
  source: string;
}

/** What one item's fall gave, as stored beside it. */
export interface StoredResult {
  fall_time_s: number | null;
  impact_speed_m_s: number | null;
  impact_energy_j: number | null;
  /** With added mass in water; equal to impact_energy_j in air. The energy the ladder classifies. */
  effective_energy_j: number | null;
  drift_m: number | null;
  sinks: boolean | null;
  consequence_level_id: string | null;
  model_version: string | null;
  inputs_hash: string | null;
  computed_at: string | null;
  /** Why no result could be computed, in words; null when one was. */
  compute_error: string | null;
}

/** One line of the register table: the item, where it is, and its stored result. */
export interface RegisterRow extends StoredResult {
  id: string;
  tag: string;
  description: string;
  category: ItemCategory;
  quantity: number;
  mass_kg: number;
  shape: string;
  level_id: string;
  level_name: string;
  /** The height the fall was computed from: the item's own, or its level's floor height. */
  height_m: number;
  height_overridden: boolean;
  securing: Securing;
  last_inspected: string | null;
  updated_at: string;
}

/** What the register's table and plot need in the browser: a site of thousands of items crosses the wire lighter. */
export type RegisterViewRow = Omit<RegisterRow, 'inputs_hash' | 'model_version' | 'updated_at'>;
