#!/usr/bin/env node
/**
 * What the browser loads first on a few pages, and whether the ODE solver reached a client chunk, read from a
 * finished build: `node scripts/client-bundle.mjs [distDir]` (default .next). Next 16 with Turbopack no longer
 * prints "First Load JS", so this sums the route's entry chunks (the root main files, then the JS files of every
 * layout and the page on its path) raw and gzipped. The solver is found by an error message from odex's own
 * source, since minification drops the package's name.
 */
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { gzipSync } from 'node:zlib';

const dist = process.argv[2] ?? '.next';
const ROUTES = { '/calculator': '(app)/calculator', '/sites/[siteId]/import': '(app)/sites/[siteId]/import' };
const ODEX_MARK = 'maxExtrapolationColumns must be';

function entryChunks(segment) {
  const file = path.join(dist, 'server', 'app', segment, 'page_client-reference-manifest.js');
  if (!existsSync(file)) throw new Error(`${file} is missing: build with PLUMBLINE_DIST_DIR=${dist} first`);
  const sandbox = { self: {} };
  new Function('self', 'globalThis', readFileSync(file, 'utf8'))(sandbox.self, sandbox.self);
  const manifest = Object.values(sandbox.self.__RSC_MANIFEST)[0];
  const parts = segment.split('/');
  // Every layout from the root down, then the page itself.
  const keys = ['[project]/app/layout', ...parts.map((_, i) => `[project]/app/${parts.slice(0, i + 1).join('/')}/layout`), `[project]/app/${segment}/page`];
  return keys.flatMap((k) => manifest.entryJSFiles[k] ?? []);
}

const root = JSON.parse(readFileSync(path.join(dist, 'build-manifest.json'), 'utf8')).rootMainFiles;
const kB = (n) => `${(n / 1024).toFixed(1)} kB`;
for (const [route, segment] of Object.entries(ROUTES)) {
  const files = [...new Set([...root, ...entryChunks(segment)])];
  const bytes = files.map((f) => readFileSync(path.join(dist, f)));
  const raw = bytes.reduce((s, b) => s + b.length, 0);
  const gz = bytes.reduce((s, b) => s + gzipSync(b).length, 0);
  const solver = files.filter((f, i) => bytes[i].includes(ODEX_MARK));
  console.log(`${route.padEnd(24)} First Load JS ${kB(gz)} gzipped (${kB(raw)} raw, ${files.length} files); odex in: ${solver.length ? solver.join(', ') : 'none'}`);
}
const chunksDir = path.join(dist, 'static', 'chunks');
const withSolver = readdirSync(chunksDir).filter((f) => f.endsWith('.js') && readFileSync(path.join(chunksDir, f), 'utf8').includes(ODEX_MARK));
console.log(`client chunks holding odex: ${withSolver.length ? withSolver.join(', ') : 'none'}`);
