// Runs the bundled command line (.build/assess.mjs), rebuilding it first when it is missing or
// older than any source file it was built from (listed in .build/meta.json by scripts/bundle.mjs),
// so `npm run -s assess` never runs stale code and starts without compiling TypeScript.
import { statSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const bundlePath = path.join(root, '.build', 'assess.mjs');

function isFresh() {
  try {
    const built = statSync(bundlePath).mtimeMs;
    const meta = JSON.parse(readFileSync(path.join(root, '.build', 'meta.json'), 'utf8'));
    const inputs = meta.outputs?.['.build/assess.mjs'] ? Object.keys(meta.outputs['.build/assess.mjs'].inputs) : [];
    if (inputs.length === 0) return false;
    return inputs.every((file) => statSync(path.join(root, file)).mtimeMs <= built);
  } catch {
    return false;
  }
}

if (!isFresh()) {
  const { bundle } = await import('./bundle.mjs');
  await bundle();
}
await import(pathToFileURL(bundlePath).href);
