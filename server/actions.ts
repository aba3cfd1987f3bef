import { readFileSync } from 'node:fs';
import path from 'node:path';

/** The server actions of the build, from Next's server-reference manifest. */
export interface ActionIndex {
  /** Exported name by action id. */
  names: Map<string, string>;
  /** Ids of the actions open to signed-out visitors (lib/actions/auth.ts): they get the sign-in body limit. */
  signIn: Set<string>;
}

const SIGN_IN_ACTIONS_FILE = 'lib/actions/auth.ts';

interface ManifestEntry {
  exportedName?: string;
  filename?: string;
}

export function actionIndex(manifest: { node?: Record<string, ManifestEntry> }): ActionIndex {
  const names = new Map<string, string>();
  const signIn = new Set<string>();
  for (const [id, entry] of Object.entries(manifest.node ?? {})) {
    names.set(id, entry.exportedName ?? '(inline)');
    if (entry.filename === SIGN_IN_ACTIONS_FILE) signIn.add(id);
  }
  return { names, signIn };
}

export function readActionIndex(distDir: string): ActionIndex {
  const file = path.join(distDir, 'server', 'server-reference-manifest.json');
  return actionIndex(JSON.parse(readFileSync(file, 'utf8')));
}
