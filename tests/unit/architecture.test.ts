import { readdirSync, readFileSync } from 'node:fs';
import { dirname, join, normalize, relative } from 'node:path';
import { describe, expect, it } from 'vitest';

/**
 * Imports run one way: app -> components -> lib -> db, with lib/domain and lib/errors at the bottom (see
 * DEVELOPERS.md, "Layers"). This reads the import and export-from lines of every .ts and .tsx file under the layers
 * and checks each against the rules below; a new violation fails it.
 */
const ROOT = normalize(join(__dirname, '..', '..'));
const LAYERS = ['app', 'components', 'lib', 'db'];

function sourceFiles(dir: string): string[] {
  return readdirSync(join(ROOT, dir), { withFileTypes: true }).flatMap((entry) => {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) return sourceFiles(path);
    return /\.tsx?$/.test(entry.name) && !entry.name.endsWith('.d.ts') ? [path] : [];
  });
}

/** The repository paths a file imports from (packages are left out: the rules are about our own layers). */
export function importsOf(file: string, text: string): string[] {
  const specifiers = [...text.matchAll(/^\s*(?:import|export)\s[^;]*?\sfrom\s+['"]([^'"]+)['"]|^\s*import\s+['"]([^'"]+)['"]|\bimport\(\s*['"]([^'"]+)['"]\s*\)/gm)]
    .map((m) => m[1] ?? m[2] ?? m[3]);
  return specifiers.flatMap((s) => {
    if (s.startsWith('@/')) return [s.slice(2)];
    if (s.startsWith('.')) return [relative(ROOT, join(ROOT, dirname(file), s)).split('\\').join('/')];
    return [];
  });
}

const under = (path: string, ...prefixes: string[]) => prefixes.some((p) => path === p || path.startsWith(`${p}/`));

/** What a file may import, by where it lives; null when allowed, else the reason. */
export function violation(file: string, target: string): string | null {
  if (under(file, 'lib/domain')) return under(target, 'lib/domain') ? null : 'lib/domain imports nothing but lib/domain';
  if (file === 'lib/errors.ts') return under(target, 'lib/domain') ? null : 'lib/errors imports nothing but lib/domain';
  if (under(file, 'lib/physics')) return under(target, 'lib/physics') ? null : 'lib/physics is pure and imports only itself';
  if (under(file, 'db/migrations')) return 'a migration imports no code of ours: its data is frozen as it was';
  // The demo seed is a script that builds its data through the same schemas as the forms.
  if (under(file, 'db/seed')) return under(target, 'app', 'components') ? 'the seed never imports app/ or components/' : null;
  // knexfile.ts at the root is the connection settings the Knex CLI reads too.
  if (under(file, 'db')) return under(target, 'db', 'lib/domain', 'lib/errors', 'knexfile') ? null : 'db/ imports only db/, lib/domain and lib/errors';
  if (under(file, 'lib/units')) return under(target, 'lib/units', 'lib/domain') ? null : 'lib/units imports only itself and lib/domain';
  // The schemas sit below the features that use them: a calculator or register change must not move a schema.
  if (under(file, 'lib/validation') && under(target, 'lib/calculator', 'lib/register', 'lib/actions')) {
    return 'lib/validation never imports lib/calculator, lib/register or lib/actions';
  }
  if (under(file, 'lib')) return under(target, 'app', 'components') ? 'lib/ never imports app/ or components/' : null;
  if (under(file, 'components')) return under(target, 'app') ? 'components never import app/' : null;
  return null;
}

function allViolations(): string[] {
  return LAYERS.flatMap(sourceFiles).flatMap((file) => {
    const path = file.split('\\').join('/');
    return importsOf(path, readFileSync(join(ROOT, file), 'utf8'))
      .map((target) => [target, violation(path, target)] as const)
      .filter(([, why]) => why !== null)
      .map(([target, why]) => `${path} -> ${target.replace(/\.tsx?$/, '')}: ${why}`);
  });
}

describe('import direction', () => {
  it('has no import against the layers', () => {
    expect(allViolations()).toEqual([]);
  });

  it('catches each kind of violation (the checker itself)', () => {
    expect(importsOf('db/x.ts', "import { a } from '@/lib/register/csv';\nimport b from '../components/y';\nexport { c } from './z';")).toEqual([
      'lib/register/csv',
      'components/y',
      'db/z',
    ]);
    expect(violation('db/items.ts', 'lib/register/compute')).not.toBeNull();
    expect(violation('db/items.ts', 'lib/domain')).toBeNull();
    expect(violation('db/items.ts', 'lib/errors')).toBeNull();
    expect(violation('lib/register/csv.ts', 'components/calculator/labels')).not.toBeNull();
    expect(violation('lib/register/csv.ts', 'lib/units')).toBeNull();
    expect(violation('components/a.tsx', 'app/(app)/page')).not.toBeNull();
    expect(violation('components/a.tsx', 'lib/domain')).toBeNull();
    expect(violation('lib/domain/roles.ts', 'lib/physics')).not.toBeNull();
    expect(violation('lib/physics/fall.ts', 'lib/units')).not.toBeNull();
    expect(violation('db/migrations/x.ts', 'lib/register/default-ladder')).not.toBeNull();
    expect(violation('lib/errors.ts', 'lib/http/api')).not.toBeNull();
    expect(violation('lib/units/index.ts', 'db/types')).not.toBeNull();
    expect(violation('lib/units/index.ts', 'lib/domain/units')).toBeNull();
    expect(violation('lib/validation/item.ts', 'lib/calculator/values')).not.toBeNull();
    expect(violation('lib/validation/item.ts', 'lib/register/csv-import')).not.toBeNull();
    expect(violation('lib/validation/item.ts', 'lib/physics')).toBeNull();
    expect(violation('app/page.tsx', 'db/items')).toBeNull();
  });
});
