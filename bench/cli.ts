/**
 * Cold-start figures for the assess command line, whole process from spawn to exit, as a user
 * runs it. Medians of a few runs; the bundle is made fresh first so no run pays for a rebuild.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

const CASE = { object: { mass_kg: 2, cd: 1, area_m2: 0.01 }, drag_model: 'quadratic', medium: { preset: 'isa' }, release: { height_m: 50, velocity_m_s: [1, 0] }, wind_m_s: 10 };

function medianOf(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  return s[s.length >> 1];
}

/** Median wall time in seconds of `runs` runs of a command that must exit 0. */
function wall(command: string, args: string[], runs: number): number {
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    const r = spawnSync(command, args, { stdio: ['ignore', 'ignore', 'pipe'], encoding: 'utf8' });
    times.push((performance.now() - t0) / 1000);
    if (r.status !== 0) throw new Error(`${command} ${args.join(' ')} exited ${r.status}: ${r.stderr}`);
  }
  return medianOf(times);
}

export function cliFigures(): [string, string, string][] {
  const built = spawnSync(process.execPath, ['scripts/bundle.mjs'], { stdio: 'inherit' });
  if (built.status !== 0) throw new Error('bundling failed');
  const dir = mkdtempSync(path.join(tmpdir(), 'plumbline-bench-'));
  const one = path.join(dir, 'one.json');
  const many = path.join(dir, 'many.json');
  writeFileSync(one, JSON.stringify(CASE));
  writeFileSync(many, JSON.stringify(Array.from({ length: 1000 }, (_, i) => ({ ...CASE, release: { height_m: 20 + (i % 80), velocity_m_s: [1, 0] } }))));
  const bare = wall(process.execPath, ['-e', ''], 5);
  return [
    ['node itself (empty script), for scale', `${bare.toFixed(3)} s`, ''],
    ['assess, one case (node scripts/assess.mjs)', `${wall(process.execPath, ['scripts/assess.mjs', one], 7).toFixed(3)} s`, 'target ≤ 0.3 s'],
    ['assess, 1,000 cases (node scripts/assess.mjs)', `${wall(process.execPath, ['scripts/assess.mjs', many], 5).toFixed(3)} s`, 'target ≤ 0.6 s'],
    ['assess, one case through npm run -s assess', `${wall('npm', ['run', '-s', 'assess', '--', one], 5).toFixed(3)} s`, 'target ≤ 0.3 s (npm adds its own start)'],
  ];
}
