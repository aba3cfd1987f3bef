/** The two unit systems a member may work in. Everything stored and computed is SI; these name the edges only. */
export const UNIT_SYSTEMS = ['si', 'us'] as const;
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];

/** The physical quantities Plumbline reads and prints; lib/units converts each between SI and US customary. */
export type Quantity =
  | 'length'
  | 'mass'
  | 'time'
  | 'speed'
  | 'energy'
  | 'momentum'
  | 'area'
  | 'volume'
  | 'density'
  | 'viscosity'
  | 'linearDrag'
  | 'acceleration'
  | 'temperature'
  | 'temperatureDelta';
