import { afterEach, describe, expect, it } from 'vitest';
import { CALCULATOR_RULES, REGISTER_RULES, SHAPE_LABELS } from '@/lib/domain';
import { SHAPE_CHOICES } from '@/lib/shape-choice';
import { itemSchema } from '@/lib/validation/item';
import { parseItemsCsv } from '@/lib/register/csv-import';

const LEVEL = '00000000-0000-4000-8000-000000000001';
const item = (mass: string, length = '0.3') => ({
  tag: 'T-1',
  description: 'Spanner',
  category: 'hand_tool',
  mass,
  shape: 'tumbling_box',
  dimensions: { length, width: '0.2', height: '0.1' },
  level_id: LEVEL,
  securing: 'unsecured',
});

describe('the vocabulary in lib/domain', () => {
  it('names every shape a form may offer, and no other', () => {
    // The shape ids come from the physics catalogue (lib/physics/shapes.ts); a new shape without a label fails here.
    expect(Object.keys(SHAPE_LABELS).sort()).toEqual([...SHAPE_CHOICES].sort());
  });
});

describe('the register keeps its own limits', () => {
  const calc = CALCULATOR_RULES as unknown as Record<'mass' | 'length', { max: number }>;
  const saved = { mass: calc.mass.max, length: calc.length.max };
  afterEach(() => {
    calc.mass.max = saved.mass;
    calc.length.max = saved.length;
  });

  it('accepts and refuses the same items whatever the calculator allows', () => {
    // Values the register has accepted since it opened (git history of lib/calculator/form.ts, "common practice"
    // limits): mass above 0 and at most 500 000 kg, a box side at most 100 m.
    expect(REGISTER_RULES.mass.max).toBe(500_000);
    expect(REGISTER_RULES.length.max).toBe(100);
    calc.mass.max = 1;
    calc.length.max = 0.01;
    expect(itemSchema('si').safeParse(item('400000', '90')).success).toBe(true);
    expect(itemSchema('si').safeParse(item('600000')).success).toBe(false);
    calc.mass.max = 1e9;
    calc.length.max = 1e6;
    expect(itemSchema('si').safeParse(item('600000')).success).toBe(false);
    expect(itemSchema('si').safeParse(item('5', '150')).success).toBe(false);
  });

  it('reads a CSV import against the register limits, not the calculator ones', () => {
    calc.mass.max = 1;
    calc.length.max = 0.01;
    const csv = 'tag,description,category,quantity,mass_kg,shape,dim_length_m,dim_width_m,dim_height_m,level,securing\nT-1,Spanner,hand_tool,1,400,tumbling_box,0.3,0.2,0.1,Deck,unsecured\n';
    const read = parseItemsCsv(csv, { levels: [{ id: LEVEL, name: 'Deck' }], existingTags: [] });
    expect(read.problems).toEqual([]);
    expect(read.valid.map((v) => v.item.mass_kg)).toEqual([400]);
  });
});
