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
