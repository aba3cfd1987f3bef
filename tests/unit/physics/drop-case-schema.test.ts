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

  // Each message must say what is wrong in words a user can act on, not only exist.
  it.each([
    ['negative mass', { ...good, object: { ...good.object, mass_kg: -1 } }, 'object.mass_kg', /^must be greater than 0$/],
    ['string for a number', { ...good, release: { height_m: '10' } }, 'release.height_m', /^must be a finite number$/],
    ['NaN', { ...good, object: { ...good.object, cd: Number.NaN } }, 'object.cd', /^must be a finite number$/],
    ['Infinity', { ...good, object: { ...good.object, area_m2: Infinity } }, 'object.area_m2', /^must be a finite number$/],
    ['unknown shape', { ...good, object: { mass_kg: 1, shape: 'anvil' } }, 'object.shape', /"sphere".*"tumbling_box"/],
    ['unknown key', { ...good, object: { ...good.object, colour: 'red' } }, 'object', /colour/],
    ['missing area for quadratic drag', { ...good, object: { mass_kg: 2, cd: 1 } }, 'object.area_m2', /required for quadratic drag/],
    ['altitude above the troposphere', { ...good, medium: { preset: 'isa', altitude_m: 15000 } }, 'medium.altitude_m', /-500 m to 11019 m, got 15000/],
    ['key that does not fit the preset', { ...good, medium: { preset: 'seawater', temperature_c: 10 } }, 'medium.temperature_c', /does not apply to the "seawater" preset/],
    ['custom medium without density', { ...good, medium: { viscosity_pa_s: 1e-3 } }, 'medium.density_kg_m3', /required for a custom medium/],
    ['layer with a bad thickness', { object: good.object, drag_model: 'quadratic', layers: [{ medium: { preset: 'isa' }, thickness_m: -3 }] }, 'layers.0.thickness_m', /^must be greater than 0$/],
    ['height given with layers', { ...good, medium: undefined, layers: [{ medium: { preset: 'isa' }, thickness_m: 3 }] }, 'release.height_m', /cannot be given with layers/],
    ['too many samples', { ...good, samples: 5000 }, 'samples', /2000/],
    ['mass beyond the model limits', { ...good, object: { ...good.object, mass_kg: 1e308 } }, 'object.mass_kg', /from 1e-18 to 1e7 kg .*got 1e\+308/],
  ])('%s is reported at its field with a plain message', (_label, input, path, message) => {
    const issues = issuesOf(input);
    const issue = issues.find((i) => i.path === path);
    expect(issue, `no issue at ${path}: ${JSON.stringify(issues)}`).toBeDefined();
    expect(issue!.message).toMatch(message);
  });
});

describe('assess command line', () => {
  const dir = mkdtempSync(join(tmpdir(), 'plumbline-assess-'));
  // The way `npm run -s assess` starts it: the launcher rebuilds the bundle if it is stale.
  const run = (args: string[], input?: string) =>
    spawnSync(process.execPath, ['scripts/assess.mjs', ...args], { input, encoding: 'utf8', cwd: process.cwd(), timeout: 120_000, maxBuffer: 64 * 1024 * 1024 });

  it('prints the result JSON for a file', () => {
    const file = join(dir, 'case.json');
    writeFileSync(file, JSON.stringify(good));
    const r = run([file]);
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.fall_time_s).toBeGreaterThan(0);
    expect(out.verification.passed).toBe(true);
  });

  it('reads standard input and answers a list with a list, one case per line', () => {
    const r = run(['-'], JSON.stringify([good, { ...good, drag_model: 'none' }]));
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out).toHaveLength(2);
    // Vacuum 10 m: t = √(2h/g) = 1.42784 s (textbook); the drag case is slower.
    expect(out[1].fall_time_s).toBeCloseTo(Math.sqrt(20 / 9.80665), 12);
    expect(out[0].fall_time_s).toBeGreaterThan(out[1].fall_time_s);
    expect(r.stdout.trim().split('\n')).toHaveLength(4);
  });

  it('a bad case gets an error object in its place, the others their results, and exit 2', () => {
    const r = run(['-'], JSON.stringify([good, { ...good, object: { mass_kg: 0 } }, { ...good, release: { height_m: 20 } }]));
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('case 1: object.mass_kg');
    const out = JSON.parse(r.stdout);
    expect(out).toHaveLength(3);
    expect(out[0].fall_time_s).toBeGreaterThan(0);
    expect(out[1].error.kind).toBe('input');
    expect(out[1].error.issues.map((i: { path: string }) => i.path)).toContain('object.mass_kg');
    // In order: the 20 m case falls longer than the 10 m one.
    expect(out[2].fall_time_s).toBeGreaterThan(out[0].fall_time_s);
  });

  it('a value beyond the model limits is bad input (exit 2), not a failed solve', () => {
    const r = run(['-'], JSON.stringify({ ...good, object: { mass_kg: 1, linear_coeff_kg_s: 1e308 }, drag_model: 'linear' }));
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/object\.linear_coeff_kg_s: must be from 0 to 1e6 kg\/s/);
    expect(JSON.parse(r.stdout).error.kind).toBe('input');
  });

  it('refuses more than 100,000 cases before solving any', () => {
    const r = run(['-'], JSON.stringify(Array.from({ length: 100_001 }, () => ({}))));
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/at most 100000 cases/);
    expect(r.stdout).toBe('');
  });

  it('exits 2 on input that is not JSON', () => {
    const r = run(['-'], '{ not json');
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/not valid JSON/);
  });
});
