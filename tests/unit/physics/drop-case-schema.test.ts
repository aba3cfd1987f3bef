import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { dropCaseIssues, dropCaseSchema } from '@/lib/schemas/drop-case';

const good = { object: { mass_kg: 2, cd: 1, area_m2: 0.01 }, drag_model: 'quadratic', medium: { preset: 'isa' }, release: { height_m: 10 } };

function issuesOf(input: unknown) {
  const r = dropCaseSchema.safeParse(input);
  expect(r.success).toBe(false);
  return r.success ? [] : dropCaseIssues(r.error);
}

describe('drop-case schema', () => {
  it('accepts a valid case and keeps its values', () => {
    const r = dropCaseSchema.safeParse(good);
    expect(r.success).toBe(true);
    if (r.success) expect(r.data.object.mass_kg).toBe(2);
  });

  it.each([
    ['negative mass', { ...good, object: { ...good.object, mass_kg: -1 } }, 'object.mass_kg'],
    ['string for a number', { ...good, release: { height_m: '10' } }, 'release.height_m'],
    ['NaN', { ...good, object: { ...good.object, cd: Number.NaN } }, 'object.cd'],
    ['Infinity', { ...good, object: { ...good.object, area_m2: Infinity } }, 'object.area_m2'],
    ['unknown shape', { ...good, object: { mass_kg: 1, shape: 'anvil' } }, 'object.shape'],
    ['unknown key', { ...good, object: { ...good.object, colour: 'red' } }, 'object'],
    ['missing area for quadratic drag', { ...good, object: { mass_kg: 2, cd: 1 } }, 'object.area_m2'],
    ['altitude above the troposphere', { ...good, medium: { preset: 'isa', altitude_m: 15000 } }, 'medium.altitude_m'],
    ['key that does not fit the preset', { ...good, medium: { preset: 'seawater', temperature_c: 10 } }, 'medium.temperature_c'],
    ['custom medium without density', { ...good, medium: { viscosity_pa_s: 1e-3 } }, 'medium.density_kg_m3'],
    ['layer with a bad thickness', { object: good.object, drag_model: 'quadratic', layers: [{ medium: { preset: 'isa' }, thickness_m: -3 }] }, 'layers.0.thickness_m'],
    ['height given with layers', { ...good, medium: undefined, layers: [{ medium: { preset: 'isa' }, thickness_m: 3 }] }, 'release.height_m'],
    ['too many samples', { ...good, samples: 5000 }, 'samples'],
  ])('%s is reported at its field', (_label, input, path) => {
    const issues = issuesOf(input);
    expect(issues.map((i) => i.path)).toContain(path);
    for (const i of issues) expect(i.message.length).toBeGreaterThan(3);
  });
});

describe('assess command line', () => {
  const dir = mkdtempSync(join(tmpdir(), 'plumbline-assess-'));
  const run = (args: string[], input?: string) =>
    spawnSync(process.execPath, ['node_modules/tsx/dist/cli.mjs', 'scripts/assess.ts', ...args], { input, encoding: 'utf8', cwd: process.cwd(), timeout: 60_000 });

  it('prints the result JSON for a file', () => {
    const file = join(dir, 'case.json');
    writeFileSync(file, JSON.stringify(good));
    const r = run([file]);
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.fall_time_s).toBeGreaterThan(0);
    expect(out.verification.passed).toBe(true);
  });

  it('reads standard input and answers an array with an array', () => {
    const r = run(['-'], JSON.stringify([good, { ...good, drag_model: 'none' }]));
    expect(r.status).toBe(0);
    expect(JSON.parse(r.stdout)).toHaveLength(2);
  });

  it('exits 2 and names the wrong field', () => {
    const r = run(['-'], JSON.stringify([good, { ...good, object: { mass_kg: 0 } }]));
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('case 1: object.mass_kg');
    expect(r.stdout).toBe('');
  });

  it('exits 2 on input that is not JSON', () => {
    const r = run(['-'], '{ not json');
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/not valid JSON/);
  });
});
