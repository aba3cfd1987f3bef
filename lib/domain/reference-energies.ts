/**
 * Published energies that give an impact energy its scale. They are test conditions and criteria, not limits of
 * safe exposure: a helmet that passes a 49 J test is not proof against every 49 J object.
 */
export interface ReferenceEnergy {
  id: string;
  energy_j: number;
  label: string;
  source: string;
}

export const REFERENCE_ENERGIES = [
  {
    id: 'debris-14cfr417',
    energy_j: 14.9,
    label: 'Hazardous-debris threshold (14 CFR 417)',
    source: '14 CFR Part 417, Appendix C (11 ft·lbf = 14.9 J)',
  },
  {
    id: 'helmet-en397',
    energy_j: 49.0,
    label: 'Industrial helmet shock test (EN 397)',
    source: 'EN 397:2012, shock absorption test (5 kg × 9.81 m/s² × 1 m ≈ 49 J)',
  },
  {
    id: 'helmet-z89-type1',
    energy_j: 54,
    label: 'Type I helmet top-impact test (ANSI/ISEA Z89.1)',
    source: 'ANSI/ISEA Z89.1-2014, Type I force transmission test (3.6 kg from 1.52 m), recalled from memory',
  },
  {
    id: 'fragment-ddesb',
    energy_j: 79,
    label: 'Hazardous-fragment criterion (DDESB TP-12)',
    source: 'DDESB Technical Paper 12 (58 ft·lbf = 79 J)',
  },
  {
    id: 'net-en1263',
    energy_j: 6867,
    label: 'Safety-net drop test (EN 1263-1)',
    source: 'EN 1263-1:2014, dynamic test (100 kg × 9.81 m/s² × 7 m ≈ 6.87 kJ)',
  },
] as const satisfies readonly ReferenceEnergy[];

export type ReferenceEnergyId = (typeof REFERENCE_ENERGIES)[number]['id'];

/** The energy of one published reference, in joules. */
export function referenceEnergy(id: ReferenceEnergyId): number {
  const found = REFERENCE_ENERGIES.find((r) => r.id === id);
  if (!found) throw new Error(`No reference energy "${id}".`);
  return found.energy_j;
}
