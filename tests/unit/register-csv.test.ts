import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import type { ConsequenceLevel } from '@/lib/domain';
import { parseItemsCsv } from '@/lib/register/csv-import';
import { CSV_LIMITS } from '@/lib/register/csv-limits';
import { itemsTemplateCsv, registerCsv } from '@/lib/register/csv-write';
import type { RegisterExportRow } from '@/db/types';

// Exact definitions: NIST SP 811 (2008), Appendix B: 1 ft = 0.3048 m, 1 lb = 0.45359237 kg,
// 1 lbf = 4.4482216152605 N, so 1 ft·lbf = 0.3048 × 4.4482216152605 J.
const FT = 0.3048;
const LB = 0.45359237;
const FT_LBF = 0.3048 * 4.4482216152605;

function closeTo(actual: number | null | undefined, expected: number, relative = 1e-14) {
  expect(actual).not.toBeNull();
  expect(Math.abs((actual as number) - expected)).toBeLessThanOrEqual(relative * Math.max(1, Math.abs(expected)));
}

// Invented demo site.
const LEVELS = [
  { id: '0b6f4c2e-8d1a-4f3b-9c7e-2a5d6e8f1b3c', name: 'Level 1' },
  { id: '1c7a5d3f-9e2b-4a4c-8d8f-3b6e7f9a2c4d', name: 'Roof' },
  { id: '2d8b6e4a-0f3c-4b5d-9e9a-4c7f8a0b3d5e', name: 'Mezzanine' },
];
const SITE = { levels: LEVELS, existingTags: [] as string[] };

const HEADER = 'tag,description,category,mass_kg,shape,dim_length_m,dim_width_m,dim_height_m,level,securing,last_inspected,notes';
const GOOD = 'B-1,Bolt box,fastener,6,tumbling_box,0.3,0.2,0.12,Roof,unsecured,2024-05-01,';

function csv(...lines: string[]): string {
  return lines.join('\n');
}

describe('items template', () => {
  for (const units of ['si', 'us'] as const) {
    it(`reads back with no problems (${units})`, () => {
      const text = itemsTemplateCsv(units, ['Level 1', 'Roof']);
      const r = parseItemsCsv(text, SITE);
      expect(r.problems).toEqual([]);
      expect(r.fatal).toBe(false);
      expect(r.total_rows).toBe(4);
      expect(r.valid.map((v) => v.line)).toEqual([2, 3, 4, 5]);
      expect(r.valid.map((v) => v.item.shape)).toEqual(['long_bar', 'tumbling_box', 'cylinder_side_on', 'flat_plate']);
      expect(r.valid.map((v) => v.item.securing)).toEqual(['tethered', 'unsecured', 'fixed_with_secondary', 'fixed_without_secondary']);
      expect(r.valid.map((v) => v.item.level_id)).toEqual([LEVELS[0].id, LEVELS[1].id, LEVELS[0].id, LEVELS[1].id]);
      expect(r.columns).toContain(units === 'si' ? 'mass_kg' : 'mass_lb');
      expect(r.columns).toContain(units === 'si' ? 'dim_length_m' : 'dim_length_ft');
    });
  }

  it('states the US template in pounds and feet, read back exactly', () => {
    const r = parseItemsCsv(itemsTemplateCsv('us', ['Roof']), SITE);
    const spanner = r.valid[0].item;
    // The spanner is 1 lb and 1 ft long in the US template (NIST SP 811: 1 lb = 0.45359237 kg, 1 ft = 0.3048 m).
    closeTo(spanner.mass_kg, LB);
    closeTo(spanner.dimensions_m.length, FT);
  });

  it('uses "Level 1" when the site has no levels yet', () => {
    const text = itemsTemplateCsv('si', []);
    const r = parseItemsCsv(text, { levels: [{ id: LEVELS[0].id, name: 'level 1' }], existingTags: [] });
    expect(r.problems).toEqual([]);
    expect(r.valid).toHaveLength(4);
  });
});

describe('units in the header', () => {
  it('converts US customary columns exactly', () => {
    const text = csv(
      'tag,description,category,mass_lb,shape,dim_length_ft,dim_width_ft,dim_height_ft,area_ft2,volume_ft3,level,height_ft,securing',
      'B-1,Bolt box,fastener,10,tumbling_box,1,2,0.5,3,0.25,Roof,100,unsecured',
    );
    const r = parseItemsCsv(text, SITE);
    expect(r.problems).toEqual([]);
    const item = r.valid[0].item;
    // NIST SP 811, Appendix B (exact definitions).
    closeTo(item.mass_kg, 10 * LB);
    closeTo(item.dimensions_m.length, FT);
    closeTo(item.dimensions_m.width, 2 * FT);
    closeTo(item.dimensions_m.height, 0.5 * FT);
    closeTo(item.area_m2, 3 * FT ** 2);
    closeTo(item.volume_m3, 0.25 * FT ** 3);
    closeTo(item.height_m, 100 * FT);
  });

  it('lets each column use its own system, converting exactly either way', () => {
    const text = csv(
      'tag,description,category,mass_lb,shape,dim_length_ft,dim_width_m,dim_height_ft,level,height_m,securing',
      'B-1,Bolt box,fastener,10,tumbling_box,1,0.3,0.5,Roof,12.5,unsecured',
    );
    const r = parseItemsCsv(text, SITE);
    expect(r.problems).toEqual([]);
    const item = r.valid[0].item;
    closeTo(item.mass_kg, 10 * LB);
    closeTo(item.dimensions_m.length, FT);
    expect(item.dimensions_m.width).toBe(0.3);
    expect(item.height_m).toBe(12.5);
  });

  it('states limits in the units of the column the user typed', () => {
    const text = csv(
      'tag,description,category,mass_lb,shape,dim_length_ft,dim_width_ft,dim_height_m,level,securing',
      'B-1,Bolt box,fastener,0,tumbling_box,1,1,60,Roof,unsecured',
    );
    const r = parseItemsCsv(text, SITE);
    // Limits of REGISTER_RULES (lib/domain/quantity-rules.ts): mass > 0, height at most 50 m.
    expect(r.problems).toEqual([
      { line: 2, column: 'mass_lb', message: 'Mass must be greater than 0 lb.' },
      { line: 2, column: 'dim_height_m', message: 'Height must be at most 50 m.' },
    ]);
  });

  it('accepts header names in any case and with spaces around them', () => {
    const text = csv(' TAG ,Description,CATEGORY,Mass_KG,Shape,DIM_LENGTH_M,dim_width_m,dim_height_m,Level,Securing', 'B-1,Bolt box,fastener,6,tumbling_box,0.3,0.2,0.1,roof,unsecured');
    const r = parseItemsCsv(text, SITE);
    expect(r.problems).toEqual([]);
    expect(r.columns[0]).toBe(' TAG ');
    expect(r.valid[0].item.level_id).toBe(LEVELS[1].id);
  });
});

describe('header problems', () => {
  function headerProblems(header: string) {
    const r = parseItemsCsv(csv(header, GOOD), SITE);
    expect(r.fatal).toBe(true);
    expect(r.valid).toEqual([]);
    expect(r.invalid_lines).toBe(0);
    return r.problems;
  }

  it('names a unit it does not recognise', () => {
    expect(headerProblems(HEADER.replace('mass_kg', 'mass_g'))).toEqual([
      { line: 1, column: 'mass_g', message: 'Unit not recognised: use mass_kg or mass_lb.' },
    ]);
    expect(headerProblems(HEADER.replace('dim_width_m', 'dim_width'))).toEqual([
      { line: 1, column: 'dim_width', message: 'Unit not recognised: use dim_width_m or dim_width_ft.' },
    ]);
  });

  it('names an unknown column', () => {
    const problems = headerProblems(`${HEADER},colour`);
    expect(problems).toHaveLength(1);
    expect(problems[0]).toMatchObject({ line: 1, column: 'colour' });
    expect(problems[0].message).toMatch(/^Column not recognised\. Item columns are: tag, description, category, quantity, mass \(_kg or _lb\)/);
    expect(headerProblems(`${HEADER},dim_radius_m`)[0].message).toMatch(/^Dimension not recognised: use one of dim_diameter, dim_side/);
  });

  it('refuses the same quantity given twice', () => {
    expect(headerProblems(`${HEADER},mass_lb`)).toEqual([{ line: 1, column: 'mass_lb', message: 'Mass is given twice (mass_kg and mass_lb): keep one column.' }]);
    expect(headerProblems(`${HEADER},Notes`)).toEqual([{ line: 1, column: 'Notes', message: 'Column Notes is given twice: keep one.' }]);
  });

  it('names each required column that is missing', () => {
    const header = 'tag,category,mass_kg,shape,dim_length_m,dim_width_m,dim_height_m,level';
    const r = parseItemsCsv(csv(header, 'B-1,fastener,6,tumbling_box,0.3,0.2,0.12,Roof'), SITE);
    expect(r.fatal).toBe(true);
    expect(r.problems).toEqual([
      { line: 1, column: '', message: 'Required column missing: description.' },
      { line: 1, column: '', message: 'Required column missing: securing.' },
    ]);
    expect(r.preview).toHaveLength(1);
  });

  it('accepts the columns an export adds, and ignores them', () => {
    const text = csv(`${HEADER},site,drop_height_m,height_from,fall_time_s,impact_speed_ft_s,impact_energy_j,effective_energy_ft_lbf,drift_m,consequence_level,computed_at,model_version,compute_error`, `${GOOD},Pier 4,30,level,2.5,80,900,660,0.4,High,,,`);
    const r = parseItemsCsv(text, SITE);
    expect(r.problems).toEqual([]);
    expect(r.valid).toHaveLength(1);
  });
});

describe('file problems', () => {
  it('refuses an empty file', () => {
    for (const text of ['', '\uFEFF', '\n\r\n  \n']) {
      const r = parseItemsCsv(text, SITE);
      expect(r.fatal).toBe(true);
      expect(r.problems).toEqual([{ line: 0, column: '', message: 'The file is empty.' }]);
    }
  });

  it('refuses a header with no rows', () => {
    const r = parseItemsCsv(`${HEADER}\n`, SITE);
    expect(r.fatal).toBe(true);
    expect(r.problems[0].message).toBe('The file has a header but no rows of items below it.');
  });

  it('refuses a file over the size limit', () => {
    const r = parseItemsCsv(`${HEADER}\n${'x'.repeat(CSV_LIMITS.maxBytes)}`, SITE);
    expect(r.fatal).toBe(true);
    expect(r.problems).toEqual([{ line: 0, column: '', message: 'The file is larger than 5 MB: split it into smaller files.' }]);
  });

  it('counts the size in UTF-8 bytes, not characters', () => {
    // "é" is two bytes in UTF-8 (RFC 3629), so 2.7 million of them pass a character count but not the byte limit.
    const r = parseItemsCsv(`${HEADER}\n${'é'.repeat(2_700_000)}`, SITE);
    expect(r.problems[0].message).toMatch(/larger than 5 MB/);
  });

  it(`refuses more than ${CSV_LIMITS.maxRows} rows`, () => {
    const rows = Array.from({ length: CSV_LIMITS.maxRows + 1 }, (_, i) => `T-${i},Box,fastener,6,tumbling_box,0.3,0.2,0.1,Roof,unsecured,,`);
    const r = parseItemsCsv(csv(HEADER, ...rows), SITE);
    expect(r.fatal).toBe(true);
    expect(r.valid).toEqual([]);
    expect(r.problems).toEqual([{ line: 0, column: '', message: 'The file has more than 20,000 rows: split it into smaller files.' }]);
  });

  it('refuses a quoted cell that is never closed, naming its line', () => {
    const r = parseItemsCsv(csv(HEADER, GOOD, 'B-2,"Bolt box,fastener,6,tumbling_box,0.3,0.2,0.12,Roof,unsecured,,', GOOD.replace('B-1', 'B-3')), SITE);
    expect(r.fatal).toBe(true);
    expect(r.valid).toEqual([]);
    expect(r.problems).toEqual([{ line: 3, column: '', message: 'The file could not be read as CSV: a quoted cell opened on line 3 is never closed.' }]);
  });
});

describe('row problems', () => {
  it('reports physical lines, past a note that spans several lines, a BOM and CRLF', () => {
    const text =
      '\uFEFF' +
      [
        HEADER,
        'A-1,Spanner,hand_tool,0.5,long_bar,0.3,0.03,,Level 1,tethered,,"Tethered to the\r\nhandrail,\r\n""yellow"" lanyard"',
        '',
        'A-2,Bolt box,fastener,-1,tumbling_box,0.3,0.2,0.12,Roof,unsecured,2024-02-30,',
        'A-3,Panel,structural_part,6,flat_plate,,1.2,0.6,Roof,contained,,',
      ].join('\r\n');
    const r = parseItemsCsv(text, SITE);
    expect(r.total_rows).toBe(3);
    expect(r.valid.map((v) => v.line)).toEqual([2]);
    expect(r.valid[0].item.notes).toBe('Tethered to the\r\nhandrail,\r\n"yellow" lanyard');
    expect(r.problems).toEqual([
      { line: 6, column: 'mass_kg', message: 'Mass must be greater than 0 kg.' },
      { line: 6, column: 'last_inspected', message: 'Last inspection must be a date, YYYY-MM-DD.' },
      { line: 7, column: '', message: 'Thickness is required for this shape. Add a column dim_thickness_m or dim_thickness_ft.' },
    ]);
    expect(r.invalid_lines).toBe(2);
    expect(r.preview.map((p) => p.line)).toEqual([2, 6, 7]);
    expect(r.preview[1].cells.mass_kg).toBe('-1');
  });

  it('requires only the dimensions the shape needs', () => {
    const r = parseItemsCsv(csv(HEADER, 'S-1,Spanner,hand_tool,0.5,long_bar,0.3,,,Roof,tethered,,'), SITE);
    expect(r.problems).toEqual([{ line: 2, column: 'dim_width_m', message: 'Width is required for this shape.' }]);
  });

  it('accepts the labels of categories, shapes and securing, in any case', () => {
    const text = csv(HEADER, 'L-1,Floodlight,LIGHT FITTING,7,"box or toolbag, tumbling",0.4,0.3,0.2,Roof,"Fixed, with secondary retention",,');
    const r = parseItemsCsv(text, SITE);
    expect(r.problems).toEqual([]);
    expect(r.valid[0].item).toMatchObject({ category: 'light_fitting', shape: 'tumbling_box', securing: 'fixed_with_secondary' });
  });

  it('lists the accepted values for a shape it does not know', () => {
    const r = parseItemsCsv(csv(HEADER, 'B-1,Bolt box,fastener,6,blob,0.3,0.2,0.12,Roof,unsecured,,'), SITE);
    expect(r.problems).toHaveLength(1);
    expect(r.problems[0]).toMatchObject({ line: 2, column: 'shape' });
    expect(r.problems[0].message).toMatch(/^Shape "blob" not recognised: use one of tumbling_box, .*long_bar, .*direct, or its label/);
  });

  it('names the levels of the site for an unknown level', () => {
    const r = parseItemsCsv(csv(HEADER, GOOD.replace('Roof', 'Cellar')), SITE);
    expect(r.problems).toEqual([{ line: 2, column: 'level', message: 'Unknown level "Cellar": the site has Level 1, Roof, Mezzanine.' }]);
    const many = Array.from({ length: 11 }, (_, i) => ({ id: LEVELS[0].id, name: `Deck ${i + 1}` }));
    const r2 = parseItemsCsv(csv(HEADER, GOOD.replace('Roof', 'Cellar')), { levels: many, existingTags: [] });
    expect(r2.problems[0].message).toBe('Unknown level "Cellar": the site has Deck 1, Deck 2, Deck 3, Deck 4, Deck 5, Deck 6, Deck 7, Deck 8 and 3 more.');
  });

  it('refuses a tag repeated in the file or already in the register, ignoring case', () => {
    const text = csv(HEADER, GOOD, GOOD.replace('B-1', 'b-1 '), GOOD.replace('B-1', 'T-9'), GOOD.replace('B-1', 'B-1'));
    const r = parseItemsCsv(text, { levels: LEVELS, existingTags: ['t-9'] });
    expect(r.valid.map((v) => v.line)).toEqual([2]);
    expect(r.problems).toEqual([
      { line: 3, column: 'tag', message: 'Tag "b-1" is repeated: it first appears on line 2.' },
      { line: 4, column: 'tag', message: 'Tag "T-9" is already in this site\'s register.' },
      { line: 5, column: 'tag', message: 'Tag "B-1" is repeated: it first appears on line 2.' },
    ]);
    expect(r.invalid_lines).toBe(3);
  });

  it('flags a row with more cells than the header', () => {
    const r = parseItemsCsv(csv(HEADER, `${GOOD},extra`, `${GOOD.replace('B-1', 'B-2')},,`), SITE);
    expect(r.problems).toEqual([{ line: 2, column: '', message: 'This row has more cells than the header has columns (12).' }]);
    expect(r.valid.map((v) => v.line)).toEqual([3]);
  });

  it('gives exactly the bad lines of 10,000 rows, 5% of them bad', () => {
    const lines = [HEADER];
    const bad = new Set<number>();
    let line = 2;
    for (let i = 0; i < 10_000; i++) {
      const broken = i % 20 === 7;
      const fault = i % 4;
      const mass = broken && fault === 0 ? 'heavy' : '6';
      const level = broken && fault === 1 ? 'Basement' : ['Level 1', 'Roof', 'Mezzanine'][i % 3];
      const date = broken && fault === 2 ? '2024-13-01' : '2024-06-30';
      const width = broken && fault === 3 ? '0' : '0.2';
      // Every ninth row has a two-line note, so physical lines run ahead of row numbers.
      const note = i % 9 === 0 ? '"first line\nsecond line"' : 'checked';
      lines.push(`T-${i},Bolt box ${i},fastener,${mass},tumbling_box,0.3,${width},0.12,${level},unsecured,${date},${note}`);
      if (broken) bad.add(line);
      line += i % 9 === 0 ? 2 : 1;
    }
    const r = parseItemsCsv(lines.join('\n'), SITE);
    expect(bad.size).toBe(500);
    expect(r.fatal).toBe(false);
    expect(r.total_rows).toBe(10_000);
    expect(r.invalid_lines).toBe(500);
    expect(new Set(r.problems.map((p) => p.line))).toEqual(bad);
    expect(r.problems).toHaveLength(500);
    expect(r.valid).toHaveLength(9_500);
    expect(r.valid.some((v) => bad.has(v.line))).toBe(false);
  });
});

describe('register export', () => {
  const ladder: ConsequenceLevel[] = [
    { id: 'c1', rank: 1, name: 'Low', lower_bound_j: 0, colour: 'haze', guidance: '', source: 'demo' },
    { id: 'c2', rank: 2, name: 'High', lower_bound_j: 100, colour: 'flare', guidance: '', source: 'demo' },
  ];

  function row(over: Partial<RegisterExportRow>): RegisterExportRow {
    return {
      id: 'r1',
      tag: 'S-1',
      description: 'Spanner',
      category: 'hand_tool',
      quantity: 1,
      mass_kg: 0.5,
      shape: 'long_bar',
      level_id: LEVELS[1].id,
      level_name: 'Roof',
      height_m: 30,
      height_overridden: false,
      securing: 'tethered',
      last_inspected: '2024-05-01',
      updated_at: '2025-01-01T00:00:00Z',
      fall_time_s: 2.52,
      impact_speed_m_s: 23.9,
      impact_energy_j: 143.2,
      effective_energy_j: 143.2,
      drift_m: 0.35,
      sinks: null,
      consequence_level_id: 'c2',
      model_version: 'demo-1',
      inputs_hash: null,
      computed_at: '2025-01-01T00:00:00Z',
      compute_error: null,
      dimensions_m: { length: 0.3, width: 0.03 },
      cd: null,
      area_m2: null,
      volume_m3: null,
      notes: '',
      height_override_m: null,
      ...over,
    };
  }

  const rows = [
    row({ description: '=HYPERLINK("x")', notes: '@SUM(1)' }),
    row({ id: 'r2', tag: '+1', description: '-2', shape: 'direct', dimensions_m: {}, cd: 1.1, area_m2: 0.02, volume_m3: 0.0004, height_m: 12.5, height_overridden: true, height_override_m: 12.5, consequence_level_id: null, last_inspected: null, notes: 'two\nlines' }),
    row({ id: 'r3', tag: 'P-3', description: 'Panel, aluminium', category: 'structural_part', quantity: 3, mass_kg: 6, shape: 'flat_plate', dimensions_m: { width: 1.2, height: 0.6, thickness: 0.003 }, securing: 'fixed_without_secondary', level_name: 'Mezzanine', compute_error: '=bad', fall_time_s: null }),
  ];

  it('escapes cells a spreadsheet would run as a formula', () => {
    const text = registerCsv(rows, { units: 'si', ladder, siteName: '@Pier 4' });
    const cells = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { delimiter: ',', skipEmptyLines: true }).data;
    const header = cells[0];
    const at = (r: number, name: string) => cells[r][header.indexOf(name)];
    // The apostrophe prefix is OWASP's advice for CSV injection (owasp.org, "CSV Injection"), recalled from memory.
    expect(at(1, 'description')).toBe('\'=HYPERLINK("x")');
    expect(at(1, 'notes')).toBe("'@SUM(1)");
    expect(at(2, 'tag')).toBe("'+1");
    expect(at(2, 'description')).toBe("'-2");
    expect(at(3, 'compute_error')).toBe("'=bad");
    expect(at(1, 'site')).toBe("'@Pier 4");
    expect(at(1, 'consequence_level')).toBe('High');
    expect(at(2, 'consequence_level')).toBe('');
    expect(at(2, 'height_m')).toBe('12.5');
    expect(at(1, 'height_m')).toBe('');
    expect(at(3, 'fall_time_s')).toBe('');
    expect(at(1, 'impact_energy_j')).toBe('143.2');
  });

  it('states the height each result was computed at and whose height it is', () => {
    const text = registerCsv(rows, { units: 'si', ladder, siteName: 'Pier 4' });
    const cells = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { delimiter: ',', skipEmptyLines: true }).data;
    const header = cells[0];
    const at = (r: number, name: string) => cells[r][header.indexOf(name)];
    expect([at(1, 'drop_height_m'), at(1, 'height_from'), at(1, 'height_m')]).toEqual(['30', 'level', '']);
    expect([at(2, 'drop_height_m'), at(2, 'height_from'), at(2, 'height_m')]).toEqual(['12.5', 'item', '12.5']);
    // 30 m is 98.4252 ft to six figures (NIST SP 811: 1 ft = 0.3048 m).
    const us = Papa.parse<string[]>(registerCsv([rows[0]], { units: 'us', ladder, siteName: 'Pier 4' }).replace(/^\uFEFF/, ''), { skipEmptyLines: true }).data;
    expect(us[1][us[0].indexOf('drop_height_ft')]).toBe('98.4252');
  });

  it('re-imports to the same inputs (SI)', () => {
    const text = registerCsv(rows, { units: 'si', ladder, siteName: 'Pier 4' });
    const r = parseItemsCsv(text, SITE);
    expect(r.problems).toEqual([]);
    expect(r.valid.map((v) => v.item)).toEqual(
      rows.map((x) => ({
        tag: x.tag,
        description: x.description,
        category: x.category,
        quantity: x.quantity,
        mass_kg: x.mass_kg,
        shape: x.shape,
        dimensions_m: x.dimensions_m,
        cd: x.cd,
        area_m2: x.area_m2,
        volume_m3: x.volume_m3,
        level_id: LEVELS.find((l) => l.name === x.level_name)!.id,
        height_m: x.height_override_m,
        securing: x.securing,
        last_inspected: x.last_inspected,
        notes: x.notes,
      })),
    );
  });

  it('re-imports to the same inputs (US customary), within the 6 significant digits written', () => {
    const text = registerCsv(rows, { units: 'us', ladder, siteName: 'Pier 4' });
    expect(text.split('\r\n')[0]).toMatch(/mass_lb.*dim_length_ft.*area_ft2.*volume_ft3.*height_ft.*impact_speed_ft_s,impact_energy_ft_lbf,effective_energy_ft_lbf,drift_ft/);
    const r = parseItemsCsv(text, SITE);
    expect(r.problems).toEqual([]);
    // Six significant digits are off by at most half a unit in the sixth digit: 5e-6 of the value (common practice).
    const sixDigits = (actual: number | null, expected: number) => expect(Math.abs(actual! - expected)).toBeLessThanOrEqual(5e-6 * expected);
    rows.forEach((x, i) => {
      const item = r.valid[i].item;
      sixDigits(item.mass_kg, x.mass_kg);
      for (const [k, v] of Object.entries(x.dimensions_m)) sixDigits(item.dimensions_m[k], v);
      expect(Object.keys(item.dimensions_m)).toEqual(Object.keys(x.dimensions_m));
      if (x.area_m2 !== null) sixDigits(item.area_m2, x.area_m2);
      if (x.volume_m3 !== null) sixDigits(item.volume_m3, x.volume_m3);
      if (x.height_override_m !== null) sixDigits(item.height_m, x.height_override_m);
      else expect(item.height_m).toBeNull();
      expect(item).toMatchObject({ tag: x.tag, description: x.description, cd: x.cd, quantity: x.quantity, notes: x.notes });
    });
  });

  it('writes results in the user’s units', () => {
    const text = registerCsv([rows[0]], { units: 'us', ladder, siteName: 'Pier 4' });
    const [header, first] = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { delimiter: ',', skipEmptyLines: true }).data;
    const at = (name: string) => Number(first[header.indexOf(name)]);
    // NIST SP 811, Appendix B: 1 ft·lbf = 0.3048 × 4.4482216152605 J; 1 ft = 0.3048 m.
    closeTo(at('impact_energy_ft_lbf'), Number((143.2 / FT_LBF).toPrecision(6)));
    closeTo(at('impact_speed_ft_s'), Number((23.9 / FT).toPrecision(6)));
    closeTo(at('mass_lb'), Number((0.5 / LB).toPrecision(6)));
    expect(at('fall_time_s')).toBe(2.52);
  });
});
