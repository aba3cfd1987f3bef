import type { ConsequenceLevel } from './register';
import { referenceEnergy } from './reference-energies';

/**
 * The ladder a new organisation starts with. Each bound sits at a published reference energy, so a level says
 * which published test or criterion an impact exceeds (the bounds are read from reference-energies.ts, so the
 * two cannot drift apart); the names and guidance are Plumbline's own and an admin may change all of it. The bounds
 * are test conditions, not safe limits.
 */
export const DEFAULT_LADDER: readonly Omit<ConsequenceLevel, 'id'>[] = [
  {
    rank: 1,
    name: 'Under debris threshold',
    lower_bound_j: 0,
    colour: 'haze',
    guidance: 'Good housekeeping and tool tethering where practical; hard hats in the area as site rules require.',
    source: 'Floor of the ladder: every impact energy has a level.',
  },
  {
    rank: 2,
    name: 'Injury possible',
    lower_bound_j: referenceEnergy('debris-14cfr417'),
    colour: 'cord',
    guidance: 'Tether or contain the item during work; mark the area below and keep through-traffic out while work goes on.',
    source: '14 CFR Part 417, Appendix C: hazardous-debris threshold, 11 ft·lbf = 14.9 J',
  },
  {
    rank: 3,
    name: 'Beyond helmet test',
    lower_bound_j: referenceEnergy('helmet-en397'),
    colour: 'brass',
    guidance: 'Barricade the drop zone below during work; tether, contain or fit secondary retention; nobody beneath while the item is handled.',
    source: 'EN 397:2012 shock-absorption test: 5 kg from 1 m, about 49 J',
  },
  {
    rank: 4,
    name: 'Hazardous fragment',
    lower_bound_j: referenceEnergy('fragment-ddesb'),
    colour: 'flare',
    guidance: 'Hard barricade at the computed radius, permit-controlled access, secondary retention on fixed items and an inspection interval.',
    source: 'DDESB Technical Paper 12: hazardous-fragment criterion, 58 ft·lbf = 79 J',
  },
  {
    rank: 5,
    name: 'Beyond net test',
    lower_bound_j: referenceEnergy('net-en1263'),
    colour: 'plum',
    guidance: 'Eliminate or engineer out: a lift plan, no one in the fall zone, and protection designed for the load, not a net or a helmet.',
    source: 'EN 1263-1:2014 safety-net dynamic test: 100 kg from 7 m, about 6.87 kJ',
  },
];
