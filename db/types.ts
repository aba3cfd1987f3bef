import type { Knex } from 'knex';
import type { ConsequenceLevel, ItemCategory, RegisterRow, Role, Securing, SiteKind, StoredResult, Surface, UnitSystem } from '@/lib/domain';

/** A query runs on the pool or inside a caller's transaction. */
export type Conn = Knex | Knex.Transaction;

export interface OrganisationRow {
  id: string;
  name: string;
  created_at: Date;
  updated_at: Date;
}

export interface UserRow {
  id: string;
  email: string;
  password_hash: string;
  display_name: string;
  unit_system: UnitSystem;
  must_change_password: boolean;
  created_at: Date;
  updated_at: Date;
}

export interface MembershipRow {
  id: string;
  organisation_id: string;
  user_id: string;
  role: Role;
  created_at: Date;
  updated_at: Date;
}

export interface AuditRow {
  id: string;
  organisation_id: string | null;
  actor_user_id: string | null;
  action: string;
  entity_type: string;
  entity_id: string | null;
  before: unknown;
  after: unknown;
  created_at: Date;
}

/** What a signed-in request knows about its user, fresh from the database. */
export interface Member {
  userId: string;
  email: string;
  displayName: string;
  unitSystem: UnitSystem;
  mustChangePassword: boolean;
  organisationId: string;
  organisationName: string;
  role: Role;
}

/** A user as others may see it: never the password hash. */
export type PublicUser = Omit<UserRow, 'password_hash'>;

export interface SiteRow {
  id: string;
  organisation_id: string;
  name: string;
  kind: SiteKind;
  location: string;
  surface: Surface;
  water_depth_m: number | null;
  altitude_m: number;
  design_wind_m_s: number;
  current_m_s: number;
  notes: string;
  created_at: Date;
  updated_at: Date;
}

export interface LevelRow {
  id: string;
  organisation_id: string;
  site_id: string;
  name: string;
  floor_height_m: number;
  surface: Surface;
  water_depth_m: number | null;
  notes: string;
  created_at: Date;
  updated_at: Date;
}

/** An item with its stored result; the database hands back computed_at as a Date. */
export interface ItemRow extends Omit<StoredResult, 'computed_at'> {
  id: string;
  organisation_id: string;
  site_id: string;
  level_id: string;
  tag: string;
  description: string;
  category: ItemCategory;
  quantity: number;
  mass_kg: number;
  shape: string;
  dimensions_m: Record<string, number>;
  cd: number | null;
  area_m2: number | null;
  volume_m3: number | null;
  height_m: number | null;
  securing: Securing;
  /** YYYY-MM-DD */
  last_inspected: string | null;
  notes: string;
  computed_at: Date | null;
  created_at: Date;
  updated_at: Date;
}

export interface SessionRow {
  id_hash: string;
  user_id: string;
  organisation_id: string;
  created_at: Date;
  last_seen_at: Date;
  expires_at: Date;
  revoked_at: Date | null;
}

/** A register line with the item inputs the table does not show, so an export can be re-imported. */
export type RegisterExportRow = RegisterRow & {
  dimensions_m: Record<string, number>;
  cd: number | null;
  area_m2: number | null;
  volume_m3: number | null;
  notes: string;
  height_override_m: number | null;
};

/*
 * What the write functions store, in SI with the stored column names where they match. lib/validation's schemas
 * produce these (their outputs are checked against them where lib/register/commands.ts and the actions call db/),
 * so the data layer needs no import from the layers above it.
 */
export interface SiteFields {
  name: string;
  kind: SiteKind;
  location: string;
  surface: Surface;
  water_depth: number | null;
  altitude: number;
  design_wind: number;
  current: number;
  notes: string;
}

export interface LevelFields {
  name: string;
  floor_height: number;
  surface: Surface;
  water_depth: number | null;
  notes: string;
}

export type ItemFields = Pick<
  ItemRow,
  | 'tag'
  | 'description'
  | 'category'
  | 'quantity'
  | 'mass_kg'
  | 'shape'
  | 'dimensions_m'
  | 'cd'
  | 'area_m2'
  | 'volume_m3'
  | 'level_id'
  | 'height_m'
  | 'securing'
  | 'last_inspected'
  | 'notes'
>;

/** A whole ladder, lowest level first; ranks are given by position. */
export interface LadderFields {
  levels: Omit<ConsequenceLevel, 'id' | 'rank'>[];
}
