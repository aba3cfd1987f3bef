import { execFileSync } from 'node:child_process';
import path from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkFetchAction, checkFormPost, checkReplyValue, foreignOrigin } from '@/server/action-check';

const ORACLE = path.join(__dirname, 'react-reply-oracle.cjs');

/** React's own verdict on each argument-list body (an independent decoder: react-server-dom, as Next runs it). */
function reactVerdicts(bodies: string[]): string[] {
  const out = execFileSync(process.execPath, ['--conditions=react-server', ORACLE], { input: JSON.stringify(bodies), encoding: 'utf8' });
  return JSON.parse(out);
}

const text = (body: string) => checkFetchAction({ 'content-type': 'text/plain;charset=UTF-8' }, Buffer.from(body));

function multipart(fields: [string, string][], boundary = 'b0undary'): { headers: Record<string, string>; body: Buffer } {
  const parts = fields.map(([name, value]) => `--${boundary}\r\nContent-Disposition: form-data; name="${name}"\r\n\r\n${value}\r\n`);
  return { headers: { 'content-type': `multipart/form-data; boundary=${boundary}` }, body: Buffer.from(`${parts.join('')}--${boundary}--\r\n`) };
}

describe('server-action argument lists', () => {
  it('accepts what React encodes for our actions: form data after a previous state, and plain values', async () => {
    // React's encodeReply writes a FormData argument as "$K<id>" and undefined as "$undefined", and escapes a
    // string that starts with "$" by doubling it (react-server-dom-webpack's ReactFlightReplyClient, recalled
    // from memory; the oracle below decodes each of these without error).
    const bodies = ['[{},"$K1"]', '[{"message":"$undefined","errors":{"email":"x"}},"$K1"]', '["us"]', '["$$5 off"]', '[]'];
    for (const body of bodies) expect(await text(body)).toBeNull();
    expect(reactVerdicts(bodies)).toEqual(bodies.map(() => 'ok'));
  });

  it('refuses bodies Next would fail on with a 500, each with a 400 that says why', async () => {
    const cases: [string, RegExp][] = [
      ['garbage', /not valid JSON/],
      ['{"a":1}', /must be a JSON array/],
      ['["$Q1"]', /reference the app never sends/],
      ['["$@1"]', /reference the app never sends/],
      ['["$nnot-a-number"]', /reference the app never sends/],
      [JSON.stringify(Array(1001).fill(0)), /At most 1000 arguments/],
      ['['.repeat(40) + ']'.repeat(40), /nested too deeply/],
    ];
    for (const [body, why] of cases) {
      const problem = await text(body);
      expect(problem?.status, body.slice(0, 40)).toBe(400);
      expect(problem?.message).toMatch(why);
    }
    // React's decoder itself fails on these (or hands back no argument list): 500s in Next, not inventions of ours.
    // "$@1" decodes, to a promise of a part the body does not have, which the action would wait on for ever.
    expect(reactVerdicts(['garbage', '{"a":1}', '["$Q1"]', '["$nnot-a-number"]']).filter((v) => v === 'ok')).toEqual([]);
  });

  it('lets through only argument lists React decodes (property, against React as the oracle)', async () => {
    const refs = fc.constantFrom('$K1', '$undefined', '$Infinity', '$-0', '$NaN', '$D2026-01-01', '$n42', '$$x', '$Q1', '$@2', '$T', '$h1', '$B1', '$', '$x', '$n1e3');
    const leaf = fc.oneof(fc.string(), refs, fc.integer(), fc.boolean(), fc.constant(null));
    const value = fc.letrec((tie) => ({
      node: fc.oneof({ depthSize: 'small' }, leaf, fc.array(tie('node'), { maxLength: 4 }), fc.dictionary(fc.string(), tie('node'), { maxKeys: 3 })),
    })).node;
    const bodies = fc.sample(fc.array(value, { maxLength: 4 }).map((v) => JSON.stringify(v)), { numRuns: 300, seed: 9 });
    const ours = await Promise.all(bodies.map(text));
    const react = reactVerdicts(bodies);
    bodies.forEach((body, i) => {
      if (ours[i] === null) expect(react[i], body).toBe('ok');
    });
    expect(ours.filter((p) => p === null).length).toBeGreaterThan(30);
    expect(ours.filter((p) => p !== null).length).toBeGreaterThan(30);
  });

  it('reads multipart bodies with the parser Next uses and refuses broken ones', async () => {
    const ok = multipart([['1_email', 'a@b.example'], ['0', '[{},"$K1"]']]);
    expect(await checkFetchAction(ok.headers, ok.body)).toBeNull();
    const truncated = ok.body.subarray(0, ok.body.length - 20);
    expect((await checkFetchAction(ok.headers, truncated))?.message).toMatch(/Unexpected end of form/);
    expect((await checkFetchAction({ 'content-type': 'multipart/form-data' }, Buffer.from('abc')))?.message).toMatch(/Boundary not found/);
    const noRoot = multipart([['1_email', 'a@b.example']]);
    expect((await checkFetchAction(noRoot.headers, noRoot.body))?.message).toMatch(/field "0"/);
    const badRoot = multipart([['0', 'not json']]);
    expect((await checkFetchAction(badRoot.headers, badRoot.body))?.message).toMatch(/not valid JSON/);
  });

  it('checks a form posted before the page hydrated: readable, and its bound arguments a list', async () => {
    const id = '60' + 'ab'.repeat(20);
    const good = multipart([['$ACTION_REF_1', ''], ['$ACTION_1:0', `{"id":"${id}","bound":"$@1"}`], ['$ACTION_1:1', '[{}]'], ['email', 'x']]);
    expect(await checkFormPost(good.headers, good.body)).toBeNull();
    const plain = multipart([['name', 'value']]);
    expect(await checkFormPost(plain.headers, plain.body)).toBeNull();
    const badBound = multipart([['$ACTION_REF_1', ''], ['$ACTION_1:0', `{"id":"${id}","bound":"$@1"}`], ['$ACTION_1:1', 'zz']]);
    expect((await checkFormPost(badBound.headers, badBound.body))?.status).toBe(400);
    const badMeta = multipart([['$ACTION_REF_1', ''], ['$ACTION_1:0', 'garbage']]);
    expect((await checkFormPost(badMeta.headers, badMeta.body))?.status).toBe(400);
    expect((await checkFormPost(good.headers, good.body.subarray(0, 30)))?.status).toBe(400);
  });

  it('checkReplyValue bounds the total size of what it walks', () => {
    expect(checkReplyValue(['x'.repeat(600_000)])).toMatch(/too large/);
  });
});

describe('server-action origin', () => {
  it('refuses another origin with 403 and lets same-origin and origin-less requests through', () => {
    expect(foreignOrigin({ host: 'plumbline.example', origin: 'https://plumbline.example' })).toBeNull();
    expect(foreignOrigin({ host: 'plumbline.example' })).toBeNull();
    expect(foreignOrigin({ host: 'plumbline.example', origin: 'https://evil.example' })?.status).toBe(403);
    expect(foreignOrigin({ host: 'plumbline.example', origin: 'null' })?.status).toBe(403);
    expect(foreignOrigin({ host: 'plumbline.example', origin: 'not a url' })?.status).toBe(403);
    // Behind a trusted proxy, the host the browser used is the forwarded one (Next compares the same way).
    expect(foreignOrigin({ host: '10.0.0.5:3000', 'x-forwarded-host': 'plumbline.example', origin: 'https://plumbline.example' })).toBeNull();
  });
});
