import { describe, expect, it } from 'vitest';
import { convertUnits } from '@/lib/calculator/url-state';
import { DEFAULT_VALUES, type CalculatorValues } from '@/lib/calculator/values';
import { readNumberText, writeNumberText } from '@/lib/units/number-text';
import { quantityField } from '@/lib/validation/quantity';

/**
 * How numbers may be written: the SI Brochure (BIPM, 9th edition 2019, section 5.4.4; recalled from memory): the
 * decimal marker is the point or the comma on the line, and digits may be split into groups of three by a thin
 * space, never by a point or a comma. So "1,500" and "1.500" are readable both ways, and are refused.
 */
const value = (text: string) => readNumberText(text) as { value: number };
const problem = (text: string) => (readNumberText(text) as { problem: string }).problem;

describe('one reading of typed numbers', () => {
  it('reads a decimal point or a decimal comma, and an exponent', () => {
    expect(value('30.5').value).toBe(30.5);
    expect(value('30,5').value).toBe(30.5);
    expect(value(' -0,25 ').value).toBe(-0.25);
    expect(value('.5').value).toBe(0.5);
    expect(value('2.5e-3').value).toBe(0.0025);
    expect(value('0.500').value).toBe(0.5);
    expect(value('1500').value).toBe(1500);
    expect(value('12.3456').value).toBe(12.3456);
  });

  it('reads digits grouped in threes by a space, a no-break space or a thin space', () => {
    expect(value('1 500').value).toBe(1500);
    expect(value('12\u00a0345,5').value).toBe(12345.5);
    expect(value('1\u2009234\u2009567.25').value).toBe(1234567.25);
    expect(value('-2\u202f000').value).toBe(-2000);
  });

  it('refuses "1,500" and "1.500" and says how to write each reading', () => {
    expect(problem('1,500')).toBe('"1,500" could be read as 1.500 or as 1500: write 1.5 for the one, 1 500 or 1500 for the other');
    expect(problem('1.500')).toMatch(/write 1\.5 for the one, 1 500 or 1500/);
    expect(problem('2.345')).toMatch(/write 2\.3450 for the one, 2 345 or 2345 for the other/);
    expect(problem('-12,750')).toMatch(/write 12\.75 for the one/);
  });

  it('refuses thousands marks, both marks at once, badly grouped spaces, hex and words', () => {
    expect(problem('1,500.5')).toMatch(/one decimal mark/);
    expect(problem('1.500,5')).toMatch(/one decimal mark/);
    expect(problem('15 00')).toMatch(/groups of three/);
    expect(problem('1 5')).toMatch(/groups of three/);
    for (const text of ['0x10', 'Infinity', 'NaN', '1_000', '1e', 'five']) expect(problem(text)).toBe('must be a number');
    expect(readNumberText('   ')).toBeNull();
  });

  it('writes numbers so they read back to the same value', () => {
    for (const v of [2.345, -1.234, 103.838, 1.5, 1500, 0.001234, 1e-7, 123456789, 9.81]) {
      const text = writeNumberText(v);
      expect(value(text).value, text).toBe(v);
    }
    expect(writeNumberText(2.345)).toBe('2.3450');
    expect(writeNumberText(47.1 / 0.45359237, 6)).toBe('103.8380');
  });
});

describe('the same reading in every unit system', () => {
  // 1 ft = 0.3048 m and 1 lb = 0.45359237 kg exactly (NIST SP 811, appendix B).
  const height = { label: 'Height', quantity: 'length' as const, min: 0, max: 10_000 };
  it('converts each written form once, from the units typed', () => {
    expect(quantityField(height, 'si', true).parse('30,5')).toBe(30.5);
    expect(quantityField(height, 'us', true).parse('30,5')).toBeCloseTo(30.5 * 0.3048, 12);
    expect(quantityField(height, 'us', true).parse('1 500')).toBeCloseTo(1500 * 0.3048, 9);
    expect(quantityField(height, 'si', true).parse('2 500,25')).toBe(2500.25);
  });

  it('names the field and the fault for an ambiguous number', () => {
    for (const units of ['si', 'us'] as const) {
      const result = quantityField(height, units, true).safeParse('1,500');
      expect(result.success).toBe(false);
      expect(result.error!.issues[0].message).toMatch(/^Height "1,500" could be read as 1\.500 or as 1500/);
    }
  });

  it('switches a calculator field typed with a decimal comma to the other units (30,5 m is 100.066 ft)', () => {
    const si: CalculatorValues = { ...DEFAULT_VALUES, units: 'si', dropHeight: '30,5' };
    const us = convertUnits(si, 'us');
    // 30.5 m / 0.3048 m per ft = 100.0656 ft (NIST SP 811's exact foot).
    expect(Number(us.dropHeight)).toBeCloseTo(100.066, 3);
    expect(Number(convertUnits(us, 'si').dropHeight)).toBeCloseTo(30.5, 3);
  });
});
