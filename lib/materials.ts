/** Densities for "mass from material × volume". Typical design values; a real item's mass is better weighed. */
export interface Material {
  id: 'steel' | 'aluminium' | 'timber' | 'concrete';
  label: string;
  density_kg_m3: number;
  source: string;
}

export const MATERIALS: readonly Material[] = [
  { id: 'steel', label: 'Steel', density_kg_m3: 7850, source: 'EN 1993-1-1, §3.2.6 (ρ = 7850 kg/m³), recalled from memory' },
  { id: 'aluminium', label: 'Aluminium alloy', density_kg_m3: 2700, source: 'EN 1999-1-1, §3.2.5 (ρ = 2700 kg/m³), recalled from memory' },
  { id: 'timber', label: 'Timber, softwood C24', density_kg_m3: 420, source: 'EN 338, Table 1, C24 mean density 420 kg/m³, recalled from memory' },
  { id: 'concrete', label: 'Concrete, normal weight', density_kg_m3: 2400, source: 'EN 1991-1-1, Table A.1 (24 kN/m³ unreinforced), recalled from memory' },
];

export type MaterialId = Material['id'];
export const MATERIAL_IDS = MATERIALS.map((m) => m.id) as [MaterialId, ...MaterialId[]];

export function material(id: MaterialId): Material {
  return MATERIALS.find((m) => m.id === id) ?? MATERIALS[0];
}
