// Bundles the entry points that run outside Next's build (worker threads, the command line) into .build/.
// Run on install (`prepare`), by `npm run build`, the start, test and bench scripts, and by scripts/assess.mjs
// when its bundle is stale; `node scripts/bundle.mjs` alone rebuilds them.
import { build } from 'esbuild';
import { mkdirSync, writeFileSync } from 'node:fs';
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

/**
 * Self-contained entries: their packages are bundled in too, because a command line started
 * once per call pays for every module file it resolves (zod alone is about a hundred).
 */
export const STANDALONE_ENTRIES = {
  assess: 'scripts/assess.ts',
};

// tsconfig maps "odex" to its hand-written declaration file for type checking; the bundle wants the package.
const realOdex = {
  name: 'real-odex',
  setup(b) {
    b.onResolve({ filter: /^odex$/ }, () => ({ path: 'odex', external: true }));
  },
};

// tsconfig maps "odex" to a declaration file; lib/physics imports its compiled file by path, which bundles as is.
const common = {
  outdir,
  outExtension: { '.js': '.mjs' },
  bundle: true,
  platform: 'node',
  target: 'node20',
  format: 'esm',
  sourcemap: 'linked',
  logLevel: 'warning',
  absWorkingDir: root,
  // The inputs of each output, so scripts/assess.mjs can tell when its bundle is stale.
  metafile: true,
};

const entryPoints = (entries) => Object.fromEntries(Object.entries(entries).map(([n, file]) => [n, path.join(root, file)]));

export async function bundle() {
  mkdirSync(outdir, { recursive: true });
  // Packages load from node_modules at run time; only the project's own TypeScript is bundled.
  const shared = await build({ ...common, entryPoints: entryPoints(ENTRIES), packages: 'external', plugins: [realOdex] });
  // A CommonJS package inside an ESM bundle needs require() for Node's own modules.
  const standalone = await build({
    ...common,
    entryPoints: entryPoints(STANDALONE_ENTRIES),
    // Less to parse at every start; the source map keeps stack traces readable.
    minify: true,
    banner: { js: "import { createRequire as __createRequire } from 'node:module'; const require = __createRequire(import.meta.url);" },
  });
  const metafile = { inputs: { ...shared.metafile.inputs, ...standalone.metafile.inputs }, outputs: { ...shared.metafile.outputs, ...standalone.metafile.outputs } };
  writeFileSync(path.join(outdir, 'meta.json'), JSON.stringify(metafile));
}

if (process.argv[1] === fileURLToPath(import.meta.url)) {
  await bundle();
}
