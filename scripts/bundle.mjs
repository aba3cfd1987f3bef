// Bundles the entry points that run outside Next's build (worker threads, the command line) into .build/.
// Run by `npm run build`, the start, test and bench scripts; `node scripts/bundle.mjs` alone rebuilds them.
import { build } from 'esbuild';
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const outdir = path.join(root, '.build');

/** Each entry becomes .build/<name>.mjs. Add new worker or command-line entry points here. */
export const ENTRIES = {
  server: 'server/main.ts',
  'drop-worker': 'lib/compute/drop-worker.ts',
  'hash-worker': 'lib/auth/hash-worker.ts',
};

// tsconfig maps "odex" to its hand-written declaration file for type checking; the bundle wants the package.
const realOdex = {
  name: 'real-odex',
  setup(b) {
    b.onResolve({ filter: /^odex$/ }, () => ({ path: 'odex', external: true }));
  },
};

export async function bundle() {
  mkdirSync(outdir, { recursive: true });
  const names = Object.keys(ENTRIES);
  if (!names.length) return;
  await build({
    entryPoints: Object.fromEntries(names.map((n) => [n, path.join(root, ENTRIES[n])])),
    outdir,
    outExtension: { '.js': '.mjs' },
    bundle: true,
    platform: 'node',
    target: 'node20',
    format: 'esm',
    // Packages load from node_modules at run time; only the project's own TypeScript is bundled.
    packages: 'external',
    plugins: [realOdex],
    sourcemap: 'linked',
    logLevel: 'warning',
    absWorkingDir: root,
  });
}

if (process.argv[1] === fileURLToPath(import.meta.url)) {
  await bundle();
}
