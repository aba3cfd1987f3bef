/**
 * Speed figures for the register (`npm run bench`): a 10,000-row CSV read, checked, computed and stored in one
 * transaction, and the site page with 5,000 items served over HTTP by the production build. Prints figures beside
 * their targets and asserts nothing.
 */
import { createOrganisationWithAdmin } from '@/db/organisations';
import { listRegister } from '@/db/items';
import { createLevel, listLevels } from '@/db/levels';
import { closeDb } from '@/db/knex';
import { createSite } from '@/db/sites';
import { hashPassword } from '@/lib/auth/password';
import { parseItemsCsv } from '@/lib/register/csv-import';
import { levelSchema } from '@/lib/validation/level';
import { siteSchema } from '@/lib/validation/site';
import { importItems } from '@/lib/register/commands';

const LEVELS = [
  ['Roof', 48],
  ['Level 9', 36],
  ['Level 6', 24],
  ['Level 3', 12],
  ['Scaffold lift 2', 4],
] as const;

/** A register file of `rows` varied items across the bench site's levels. */
function registerFile(rows: number, prefix: string): string {
  const lines = ['tag,description,category,quantity,mass_kg,shape,dim_length_m,dim_width_m,dim_height_m,level,securing'];
  for (let i = 0; i < rows; i++) {
    const mass = (0.2 + (i % 97) * 0.31).toFixed(2);
    const length = (0.1 + (i % 13) * 0.05).toFixed(2);
    const shape = i % 3 === 0 ? 'long_bar' : 'tumbling_box';
    const height = shape === 'tumbling_box' ? (0.05 + (i % 7) * 0.02).toFixed(2) : '';
    lines.push(`${prefix}-${i},Bench item ${i},hand_tool,1,${mass},${shape},${length},0.05,${height},${LEVELS[i % LEVELS.length][0]},unsecured`);
  }
  return lines.join('\n');
}

async function seedSite(organisationId: string, actor: string, name: string) {
  const site = await createSite(organisationId, actor, siteSchema('si').parse({ name, kind: 'building', surface: 'ground', design_wind: 12 }));
  for (const [level, height] of LEVELS) {
    await createLevel(organisationId, actor, site.id, levelSchema('si').parse({ name: level, floor_height: height, surface: 'ground' }));
  }
  return { site, levels: await listLevels(organisationId, site.id) };
}

async function fill(organisationId: string, actor: string, siteId: string, levels: { id: string; name: string }[], rows: number, prefix: string) {
  const t0 = performance.now();
  const parsed = parseItemsCsv(registerFile(rows, prefix), { levels, existingTags: [] });
  const t1 = performance.now();
  if (parsed.problems.length) throw new Error(`bench file has problems: ${JSON.stringify(parsed.problems.slice(0, 3))}`);
  const imported = await importItems(organisationId, actor, siteId, parsed.valid, { file_name: 'bench.csv', mode: 'all-or-nothing', skipped_rows: 0 });
  const t2 = performance.now();
  return { imported, readMs: t1 - t0, storeMs: t2 - t1 };
}

async function timePage(base: string, email: string, password: string, siteId: string): Promise<number[]> {
  const session = await fetch(`${base}/api/v1/session`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email, password }) });
  if (!session.ok) throw new Error(`bench sign-in answered ${session.status}`);
  const cookie = session.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
  const times: number[] = [];
  for (let i = 0; i < 6; i++) {
    const t0 = performance.now();
    const response = await fetch(`${base}/sites/${siteId}`, { headers: { cookie } });
    const body = await response.text();
    if (!response.ok || !body.includes('Items at height')) throw new Error(`site page answered ${response.status}`);
    times.push(performance.now() - t0);
  }
  return times.slice(1);
}

async function main() {
  const password = 'bench-password-long';
  const email = `bench-${Date.now()}@bench.example`;
  const { organisation, user } = await createOrganisationWithAdmin({
    organisationName: `Bench ${new Date().toISOString()}`,
    email,
    passwordHash: await hashPassword(password),
    displayName: 'Bench',
  });

  const big = await seedSite(organisation.id, user.id, 'Bench import site');
  const run = await fill(organisation.id, user.id, big.site.id, big.levels, 10_000, 'B');
  const total = (run.readMs + run.storeMs) / 1000;
  console.log(`import and compute 10,000 rows: ${total.toFixed(2)} s (read and check ${(run.readMs / 1000).toFixed(2)} s, compute and store ${(run.storeMs / 1000).toFixed(2)} s)   target ≤ 10 s`);

  const page = await seedSite(organisation.id, user.id, 'Bench page site');
  await fill(organisation.id, user.id, page.site.id, page.levels, 5_000, 'P');
  const t0 = performance.now();
  const rows = await listRegister(organisation.id, page.site.id);
  console.log(`register query, ${rows.length} items: ${(performance.now() - t0).toFixed(0)} ms`);

  const base = process.env.BENCH_URL;
  if (base) {
    const times = (await timePage(base, email, password, page.site.id)).sort((a, b) => a - b);
    console.log(`site page with 5,000 items over HTTP: median ${times[times.length >> 1].toFixed(0)} ms, worst ${times[times.length - 1].toFixed(0)} ms   target ≤ 1000 ms`);
  } else {
    console.log('site page over HTTP: skipped (set BENCH_URL to a running server; scripts/bench.sh does)');
  }
  await closeDb();
}

main().catch(async (error) => {
  console.error(error);
  await closeDb();
  process.exit(1);
});
