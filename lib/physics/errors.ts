/**
 * Thrown for an input the physics cannot accept. `field` is the dotted path of the offending
 * input in the drop-case JSON (for example `object.mass_kg` or `layers.1.thickness_m`), so the
 * command line and the HTTP API can point at it without parsing the message.
 */
export class PhysicsInputError extends Error {
  readonly field: string;
  /** The message without the field, for forms that show it beside the field. */
  readonly detail: string;

  constructor(field: string, detail: string) {
    super(`${field}: ${detail}`);
    this.name = 'PhysicsInputError';
    this.field = field;
    this.detail = detail;
  }
}

/**
 * Thrown when a valid case cannot be integrated within the step budget (for example a
 * near-neutrally buoyant object over a very long fall). Distinct from bad input so callers
 * can tell the user to change the case rather than fix a typo.
 */
export class PhysicsSolveError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'PhysicsSolveError';
  }
}

export function requireFinite(field: string, value: unknown): number {
  if (typeof value !== 'number') throw new PhysicsInputError(field, `must be a number, got ${describe(value)}`);
  if (!Number.isFinite(value)) throw new PhysicsInputError(field, `must be a finite number, got ${value}`);
  return value;
}

export function requirePositive(field: string, value: unknown): number {
  const v = requireFinite(field, value);
  if (v <= 0) throw new PhysicsInputError(field, `must be greater than zero, got ${v}`);
  return v;
}

export function requireNonNegative(field: string, value: unknown): number {
  const v = requireFinite(field, value);
  if (v < 0) throw new PhysicsInputError(field, `must not be negative, got ${v}`);
  return v;
}

export function requireInteger(field: string, value: unknown, min: number, max: number): number {
  const v = requireFinite(field, value);
  if (!Number.isInteger(v) || v < min || v > max) {
    throw new PhysicsInputError(field, `must be a whole number from ${min} to ${max}, got ${v}`);
  }
  return v;
}

function describe(value: unknown): string {
  if (value === null) return 'null';
  if (typeof value === 'string') return `the string ${JSON.stringify(value.length > 40 ? value.slice(0, 40) + '…' : value)}`;
  return typeof value;
}
