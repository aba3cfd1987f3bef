import { spawn, type ChildProcess } from 'node:child_process';
import { once } from 'node:events';
import { createWriteStream, existsSync, mkdirSync } from 'node:fs';
import path from 'node:path';
import type { TestProject } from 'vitest/node';

declare module 'vitest' {
  export interface ProvidedContext {
    /** Where our server listens, e.g. http://127.0.0.1:3300. */
    httpBase: string;
    /** The server's stdout: its JSON log lines. */
    serverLog: string;
    /** The production build the server serves (for its server-reference manifest). */
    distDir: string;
  }
}

const root = path.resolve(__dirname, '../..');

/**
 * Starts the bundled server (.build/server.mjs) on the production build against the test database, as `npm start`
 * does, with its log captured to a file the tests read. Needs DATABASE_URL and SESSION_SECRET (scripts/test.sh, or
 * `eval "$(bash scripts/dev-db.sh)"`) and a build in PLUMBLINE_DIST_DIR (.next-test by default).
 */
export default async function setup(project: TestProject) {
  const port = Number(process.env.PLUMBLINE_HTTP_TEST_PORT ?? 3300);
  const distDir = process.env.PLUMBLINE_DIST_DIR || '.next-test';
  if (!existsSync(path.join(root, distDir, 'BUILD_ID'))) {
    throw new Error(`The HTTP tests need a production build in ${distDir}: run PLUMBLINE_DIST_DIR=${distDir} npm run build first.`);
  }
  if (!process.env.DATABASE_URL || !process.env.SESSION_SECRET) throw new Error('Set DATABASE_URL and SESSION_SECRET: eval "$(bash scripts/dev-db.sh)".');
  const { bundle } = await import(path.join(root, 'scripts/bundle.mjs'));
  await bundle();

  const logDir = path.join(root, 'tests/.artifacts');
  mkdirSync(logDir, { recursive: true });
  const serverLog = path.join(logDir, 'http-server.log');
  const out = createWriteStream(serverLog);
  await once(out, 'open');
  const server: ChildProcess = spawn(process.execPath, ['.build/server.mjs'], {
    cwd: root,
    env: { ...process.env, NODE_ENV: 'production', PORT: String(port), PLUMBLINE_DIST_DIR: distDir, TRUST_PROXY_HOPS: '0', LOG_LEVEL: 'info' },
    stdio: ['ignore', out, out],
  });
  const base = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 60_000;
  for (;;) {
    if (server.exitCode !== null) throw new Error(`the server exited during start-up (log: ${serverLog})`);
    if (await fetch(`${base}/api/health`).then((r) => r.ok, () => false)) break;
    if (Date.now() > deadline) throw new Error(`the server did not answer /api/health within 60 s (log: ${serverLog})`);
    await new Promise((r) => setTimeout(r, 250));
  }
  project.provide('httpBase', base);
  project.provide('serverLog', serverLog);
  project.provide('distDir', path.join(root, distDir));

  return async () => {
    if (server.exitCode === null) {
      server.kill('SIGTERM');
      await once(server, 'exit');
    }
    out.end();
  };
}
