import fc from 'fast-check';

/**
 * The kinds of malformed input an outside probe sent (issue 9): wrong types, missing and extra fields, prototype
 * keys, NaN/Infinity/1e309 and 400-digit numbers, NUL and lone surrogates, huge strings, deep nesting, text that is
 * not JSON. JSON bodies are built as text, so that tokens JSON.stringify cannot write (1e309, a duplicate
 * "__proto__" key) reach the server's parser as a client would send them.
 */
export type Json = { raw: string };
const raw = (text: string): Json => ({ raw: text });

const HOSTILE_TEXT = [
  '',
  ' ',
  'a\u0000b',
  '\ud800',
  'x\udc00y',
  '1e309',
  '-1e309',
  '9'.repeat(400),
  'NaN',
  'Infinity',
  '-0',
  '0x10',
  '12 m',
  '<a href="https://evil.example">x</a>',
  '=2+2',
  '../../etc/passwd',
  '%E0%A4%A',
  'x'.repeat(70_000),
];

export const hostileString = fc.oneof(fc.constantFrom(...HOSTILE_TEXT), fc.string({ maxLength: 40 }), fc.string({ unit: 'binary', maxLength: 20 }));

const numberToken = fc.oneof(
  fc.constantFrom('1e309', '-1e309', '9'.repeat(400), '-0', '1e-400', '0', '-1', '1e6', '5'),
  fc.double({ noNaN: true, noDefaultInfinity: true }).map((n) => String(n)),
  fc.integer().map(String),
);

function nested(depth: number): string {
  return '{"a":'.repeat(depth) + '1' + '}'.repeat(depth);
}

/** A JSON value as text: leaves of every type, hostile strings, and arrays/objects of them. */
export const jsonValue: fc.Arbitrary<Json> = fc.letrec<{ value: Json }>((tie) => ({
  value: fc.oneof(
    { depthSize: 'small', withCrossShrink: true },
    numberToken.map(raw),
    hostileString.map((s) => raw(JSON.stringify(s))),
    fc.constantFrom('true', 'false', 'null').map(raw),
    fc.constantFrom(nested(40), '['.repeat(10_000) + ']'.repeat(10_000)).map(raw),
    fc.array(tie('value'), { maxLength: 4 }).map((items) => raw(`[${items.map((i) => i.raw).join(',')}]`)),
    fc.array(fc.tuple(fc.oneof(fc.string({ maxLength: 8 }), fc.constantFrom('__proto__', 'constructor', 'prototype')), tie('value')), { maxLength: 4 }).map((entries) => raw(objectText(entries))),
  ),
})).value;

function objectText(entries: [string, Json][]): string {
  return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${v.raw}`).join(',')}}`;
}

/** A body for a route whose fields are `fields`: each known field kept, dropped or given a hostile value, plus extra keys. */
export function jsonBody(fields: readonly string[]): fc.Arbitrary<string> {
  const knownFields = fc.array(fc.tuple(fc.constantFrom(...fields), jsonValue), { maxLength: fields.length + 2 });
  const extra = fc.array(fc.tuple(fc.oneof(fc.constantFrom('__proto__', 'constructor', 'prototype', 'id', 'organisation_id'), fc.string({ maxLength: 10 })), jsonValue), { maxLength: 3 });
  return fc.oneof(
    { weight: 6, arbitrary: fc.tuple(knownFields, extra).map(([known, more]) => objectText([...known, ...more])) },
    { weight: 2, arbitrary: jsonValue.map((v) => v.raw) },
    { weight: 1, arbitrary: fc.oneof(fc.string({ maxLength: 30 }), fc.constantFrom('', '{', '{"a":1', '\u0000', 'null')) },
  );
}

/** Form fields for an action: known names with hostile values, dotted and prototype names, and unknown ones. */
export function formFields(fields: readonly string[]): fc.Arbitrary<[string, string][]> {
  const name = fc.oneof(
    { weight: 6, arbitrary: fc.constantFrom(...fields) },
    { weight: 1, arbitrary: fc.constantFrom('__proto__', '__proto__.notes', 'constructor.prototype.name', 'dimensions.__proto__', 'levels.0.constructor', 'levels.999999.name') },
    { weight: 1, arbitrary: fc.string({ maxLength: 12 }) },
  );
  return fc.array(fc.tuple(name, hostileString), { maxLength: fields.length + 3 });
}

/** Arguments a client can post to an action in place of a form. */
export const oddActionArguments = fc.constantFrom<unknown>(1, [1, 2], null, undefined, 'name=x', { name: 'x' }, true);

export const contentType = fc.constantFrom(
  'application/json',
  'application/json',
  'application/json',
  'application/json; charset=utf-8',
  'text/plain',
  'application/x-www-form-urlencoded',
  'multipart/form-data; boundary=x',
  '',
);

export type CookieMode = 'member' | 'forged' | 'none';
export const cookieMode = fc.constantFrom<CookieMode>('member', 'member', 'member', 'member', 'forged', 'none');

/** Ids a client might put in a path or a field: its own, another organisation's, unknown, malformed. */
export function idArbitrary(own: readonly string[], foreign: readonly string[]): fc.Arbitrary<string> {
  return fc.oneof(
    fc.constantFrom(...own),
    fc.constantFrom(...foreign),
    fc.uuid(),
    fc.constantFrom('not-a-uuid', '', '0', '../sites', 'x'.repeat(5000), '00000000-0000-0000-0000-00000000000G', '%E0%A4%A', '\u0000'),
  );
}
