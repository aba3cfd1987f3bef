import fc from 'fast-check';
import { afterEach, describe, expect, it } from 'vitest';
import { z } from 'zod';
import { formToObject, MAX_JSON_DEPTH, readForm, safeJson, unflatten, UnsafeInputError } from '@/lib/validation/input';
import { toFieldErrors } from '@/lib/validation/issues';

// The three keys that reach a prototype when assigned on an ordinary object (ECMA-262, Object.prototype.__proto__
// and the constructor/prototype links): the input layer must refuse every one of them as a path segment.
const REFUSED = ['__proto__', 'constructor', 'prototype'];
const prototypeNames = Object.getOwnPropertyNames(Object.prototype).sort();

function form(fields: [string, string][]): FormData {
  const data = new FormData();
  for (const [k, v] of fields) data.append(k, v);
  return data;
}

function refusedField(run: () => unknown): string {
  try {
    run();
  } catch (error) {
    if (error instanceof UnsafeInputError) return error.field;
    throw error;
  }
  throw new Error('not refused');
}

afterEach(() => {
  // Whatever a test fed in, nothing reached the prototype every object shares.
  expect(Object.getOwnPropertyNames(Object.prototype).sort()).toEqual(prototypeNames);
  expect(({} as Record<string, unknown>).notes).toBeUndefined();
});

describe('form fields', () => {
  it.each([
    '__proto__',
    '__proto__.notes',
    'constructor',
    'constructor.prototype.notes',
    'dimensions.__proto__',
    'levels.0.constructor',
    'a.prototype',
  ])('refuse the name %s, naming it', (name) => {
    const data = form([['name', 'Pier 4'], [name, 'x']]);
    expect(refusedField(() => formToObject(data))).toBe(name);
    expect(refusedField(() => unflatten({ name: 'Pier 4', [name]: 'x' }))).toBe(name);
  });

  it('accept names that only contain the words', () => {
    expect(Object.keys(formToObject(form([['proto', 'a'], ['my_constructor', 'b'], ['prototypes.x', 'c']])))).toEqual(['proto', 'my_constructor', 'prototypes.x']);
  });

  it('become null-prototype objects, nested and listed as before', () => {
    const flat = formToObject(form([['dimensions.length', '1'], ['levels.1.name', 'b'], ['levels.0.name', 'a'], ['tag', 'T'], ['tag', 'U']]));
    expect(Object.getPrototypeOf(flat)).toBeNull();
    const tree = unflatten(flat);
    expect(tree).toEqual({ dimensions: { length: '1' }, levels: [{ name: 'a' }, { name: 'b' }], tag: 'U' });
    expect(Object.getPrototypeOf(tree)).toBeNull();
    expect(Object.getPrototypeOf(tree.dimensions)).toBeNull();
    expect(Object.getPrototypeOf((tree.levels as object[])[0])).toBeNull();
  });

  it('fail like a schema parse of any other field, so an action can answer with it', () => {
    const r = readForm(form([['name', 'a'], ['__proto__.notes', 'x']]), true);
    expect(r.success).toBe(false);
    if (r.success) return;
    expect(toFieldErrors(r.error)).toEqual({ '__proto__.notes': 'The field name "__proto__.notes" is not accepted.' });
  });

  it('read arguments that are not a form (a client can post any argument list to an action) as an empty form', () => {
    const schema = z.object({ name: z.string() });
    for (const argument of [1, [1, 2], null, undefined, 'name=a', { name: 'a' }, true]) {
      expect(Object.keys(formToObject(argument))).toEqual([]);
      const read = readForm(argument);
      if (!read.success) throw read.error;
      const r = schema.safeParse(read.values);
      expect(r.success).toBe(false);
      if (!r.success) expect(Object.keys(toFieldErrors(r.error))).toEqual(['name']);
    }
  });

  it('keep a refused bare "__proto__" as an error key rather than losing it on the prototype', () => {
    const r = readForm(form([['__proto__', 'x']]));
    expect(r.success).toBe(false);
    if (r.success) return;
    const errors = toFieldErrors(r.error);
    expect(Object.getPrototypeOf(errors)).toBe(Object.prototype);
    expect(Object.keys(errors)).toEqual(['__proto__']);
  });
});

describe('JSON values', () => {
  it.each([
    ['{"__proto__": {"notes": "x"}}', '__proto__'],
    ['{"constructor": {"prototype": {"notes": "x"}}}', 'constructor'],
    ['{"a": [{"b": {"prototype": 1}}]}', 'a.0.b.prototype'],
    ['[{"layers": [{"medium": {"__proto__": null}}]}]', '0.layers.0.medium.__proto__'],
  ])('refuse a prototype key at any depth: %s', (text, path) => {
    expect(refusedField(() => safeJson(JSON.parse(text)))).toBe(path);
  });

  it(`accept ${MAX_JSON_DEPTH} levels of nesting and refuse one more, at the path where it starts`, () => {
    const nest = (n: number) => JSON.parse('{"a":'.repeat(n) + '1' + '}'.repeat(n));
    expect(() => safeJson(nest(MAX_JSON_DEPTH))).not.toThrow();
    expect(refusedField(() => safeJson(nest(MAX_JSON_DEPTH + 1)))).toBe(Array(MAX_JSON_DEPTH).fill('a').join('.'));
  });

  it('refuse 100,000 nested arrays without exhausting the stack', () => {
    const deep = JSON.parse('['.repeat(100_000) + ']'.repeat(100_000));
    expect(refusedField(() => safeJson(deep))).toMatch(/^0(\.0)*$/);
  });

  it('give back every other JSON value unchanged, with null prototypes', () => {
    const key = fc.string().filter((k) => !REFUSED.includes(k));
    const json = fc.letrec((tie) => ({
      value: fc.oneof({ depthSize: 'small' }, fc.constant(null), fc.boolean(), fc.double({ noNaN: true, noDefaultInfinity: true }), fc.string(), fc.array(tie('value'), { maxLength: 4 }), fc.dictionary(key, tie('value'), { maxKeys: 4 })),
    })).value;
    fc.assert(
      fc.property(json, (value) => {
        const text = JSON.stringify(value);
        const safe = safeJson(JSON.parse(text));
        expect(JSON.stringify(safe)).toBe(text);
        if (typeof safe === 'object' && safe !== null && !Array.isArray(safe)) expect(Object.getPrototypeOf(safe)).toBeNull();
      }),
      { numRuns: 300 },
    );
  });
});
