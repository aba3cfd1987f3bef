import { describe, expect, it } from 'vitest';
import { formatNumber, fromSI, QUANTITIES, toSI, type Quantity } from '@/lib/units';

// Exact definitions: NIST SP 811 (2008), Appendix B (1 ft = 0.3048 m exactly; 1 lb = 0.45359237 kg exactly;
// 1 lbf = 4.4482216152605 N exactly, so 1 ft·lbf = 0.3048 × 4.4482216152605 J = 1.3558179483314004 J).
const ONE_US_UNIT_IN_SI: Record<Quantity, number> = {
  length: 0.3048,
  mass: 0.45359237,
  time: 1,
  speed: 0.3048,
  energy: 1.3558179483314004,
  momentum: 0.45359237 * 0.3048,
  area: 0.3048 ** 2,
  volume: 0.3048 ** 3,
  density: 0.45359237 / 0.3048 ** 3,
  viscosity: 0.45359237 / 0.3048,
  linearDrag: 0.45359237,
  acceleration: 0.3048,
  temperature: (1 - 32) / 1.8,
  // A temperature difference of 1 °F is 5/9 of 1 °C (NIST SP 811, B.8, by the definition of the degree Fahrenheit).
  temperatureDelta: 5 / 9,
};

describe('unit conversion', () => {
  for (const q of Object.keys(QUANTITIES) as Quantity[]) {
    it(`${q}: one US customary unit in SI and back`, () => {
      const si = toSI(q, 1, 'us');
      expect(Math.abs(si - ONE_US_UNIT_IN_SI[q])).toBeLessThanOrEqual(1e-14 * Math.max(1, Math.abs(ONE_US_UNIT_IN_SI[q])));
      expect(fromSI(q, si, 'us')).toBeCloseTo(1, 12);
      expect(toSI(q, 7.25, 'si')).toBe(7.25);
    });
  }

  it('converts absolute temperatures at the fixed points', () => {
    // 32 °F = 0 °C and 212 °F = 100 °C (NIST SP 811, B.8).
    expect(toSI('temperature', 32, 'us')).toBeCloseTo(0, 10);
    expect(toSI('temperature', 212, 'us')).toBeCloseTo(100, 10);
  });

  it('formats to significant figures', () => {
    expect(formatNumber(49.033)).toBe('49');
    expect(formatNumber(2.4738)).toBe('2.47');
    expect(formatNumber(6867.9)).toBe('6,868');
    expect(formatNumber(0.012345)).toBe('0.0123');
  });
});
