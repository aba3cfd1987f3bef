/**
 * Speed figures for POST /api/v1/drops against the production server (`npm run bench`): requests per second and
 * p99 at 50 concurrent clients, beside /api/health's measured the same way in the same run, their ratio, and
 * /api/health's p99 while 50 clients keep the solver busy. Prints figures and asserts nothing.
 */
import { closeDb } from '@/db/knex';
import { createOrganisationWithAdmin } from '@/db/organisations';
import { hashPassword } from '@/lib/auth/password';

const CLIENTS = 50;
const SECONDS = 6;

/** What the calculator sends for an offshore fall: air, then seawater, with 240 plot samples (cost 480). */
const DROP_CASE = JSON.stringify({
  object: { mass_kg: 2.4, shape: 'long_bar', dimensions_m: { length: 0.6, width: 0.04 } },
  drag_model: 'quadratic',
  layers: [
    { medium: { preset: 'isa', altitude_m: 0, temperature_offset_c: 0 }, thickness_m: 30, flow_m_s: 12 },
    { medium: { preset: 'seawater' }, thickness_m: 80, flow_m_s: 0.5 },
  ],
  release: { velocity_m_s: [0, 0] },
  samples: 240,
});

interface Figures {
  rps: number;
  p99: number;
  failures: number;
}

type Call = () => Promise<Response>;

function p99(times: number[]): number {
  const sorted = [...times].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.floor(sorted.length * 0.99))] ?? NaN;
}

/** `clients` loops calling `call` back to back for `seconds`; latencies of the answers that arrive in time. */
async function load(call: Call, clients: number, seconds: number, until?: Promise<unknown>): Promise<Figures> {
  const times: number[] = [];
  let failures = 0;
  const end = performance.now() + seconds * 1000;
  let stop = false;
  void until?.then(() => (stop = true));
  const loop = async () => {
    while (!stop && performance.now() < end) {
      const t0 = performance.now();
      const response = await call().catch(() => null);
      if (!response) {
        failures++;
        continue;
      }
      await response.arrayBuffer();
      if (response.ok) times.push(performance.now() - t0);
      else failures++;
    }
  };
  const t0 = performance.now();
  await Promise.all(Array.from({ length: clients }, loop));
  return { rps: times.length / ((performance.now() - t0) / 1000), p99: p99(times), failures };
}

async function signIn(base: string): Promise<string> {
  const password = 'bench-password-long';
  const email = `drops-bench-${Date.now()}@bench.example`;
  await createOrganisationWithAdmin({ organisationName: `Drops bench ${new Date().toISOString()}`, email, passwordHash: await hashPassword(password), displayName: 'Bench' });
  const session = await fetch(`${base}/api/v1/session`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email, password }) });
  if (!session.ok) throw new Error(`bench sign-in answered ${session.status}`);
  return session.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
}

const line = (name: string, f: Figures) =>
  `${name.padEnd(34)} ${f.rps.toFixed(0).padStart(6)} req/s   p99 ${f.p99.toFixed(0).padStart(5)} ms${f.failures ? `   (${f.failures} not 2xx)` : ''}`;

async function main() {
  const base = process.env.BENCH_URL;
  if (!base) {
    console.log('drops over HTTP: skipped (set BENCH_URL to a running server; scripts/bench.sh does)');
    return;
  }
  const cookie = await signIn(base);
  const health: Call = () => fetch(`${base}/api/health`);
  const drop: Call = () => fetch(`${base}/api/v1/drops`, { method: 'POST', headers: { 'content-type': 'application/json', cookie }, body: DROP_CASE });
  const check = await drop();
  if (!check.ok) throw new Error(`the bench case answered ${check.status}: ${await check.text()}`);

  await load(health, CLIENTS, 1);
  await load(drop, CLIENTS, 1);
  const h = await load(health, CLIENTS, SECONDS);
  const d = await load(drop, CLIENTS, SECONDS);
  console.log(`${CLIENTS} concurrent clients, ${SECONDS} s each, one calculator-sized offshore case (2 layers, 240 samples):`);
  console.log(line('GET /api/health', h));
  console.log(line('POST /api/v1/drops', d));
  console.log(`drops / health throughput: ${(d.rps / h.rps).toFixed(2)}   (0.40 when the route solved on the request thread)`);

  const busy = load(drop, CLIENTS, SECONDS);
  const during = await load(health, 1, SECONDS, busy);
  const solver = await busy;
  // No target of its own: compare with health's p99 above, at 50 clients of its own and no solving at all.
  console.log(line(`GET /api/health, 1 client, during`, during));
  console.log(line(`  ${CLIENTS} clients of POST /api/v1/drops`, solver));
}

main()
  .then(() => closeDb())
  .catch(async (error) => {
    console.error(error);
    await closeDb();
    process.exit(1);
  });
