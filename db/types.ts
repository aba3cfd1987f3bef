import type { Knex } from 'knex';

export const ROLES = ['admin', 'engineer', 'reviewer', 'viewer'] as const;
export type Role = (typeof ROLES)[number];
export const UNIT_SYSTEMS = ['si', 'us'] as const;
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];

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
