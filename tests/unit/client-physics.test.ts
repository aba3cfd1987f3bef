import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { dirname, join, normalize, relative } from 'node:path';
import { describe, expect, it } from 'vitest';

/**
 * The physics runs on the server (DEVELOPERS.md, "Where the physics runs"): the drops answer carries the resolved
 * object and the closed-form curve, so the browser needs no solver. This follows the value imports (not
 * `import type`, which the compiler erases) from every 'use client' file and lists the lib/physics modules the
 * browser would load. The one allowance is the shape catalogue's geometry, which the calculator needs to turn
 * "mass from material" into the mass the drop case carries, with the two small modules it stands on.
 */
const ROOT = normalize(join(__dirname, '..', '..'));
const ALLOWED = ['lib/physics/drag.ts', 'lib/physics/errors.ts', 'lib/physics/limits.ts', 'lib/physics/shapes.ts'];

function sourceFiles(dir: string): string[] {
  return readdirSync(join(ROOT, dir), { withFileTypes: true }).flatMap((entry) => {
    const path = `${dir}/${entry.name}`;
    if (entry.isDirectory()) return sourceFiles(path);
    return /\.tsx?$/.test(entry.name) && !entry.name.endsWith('.d.ts') ? [path] : [];
  });
}

/** Specifiers of the imports and re-exports that survive compilation: `import type` and all-type lists do not. */
export function valueImports(text: string): string[] {
  const found: string[] = [];
  for (const m of text.matchAll(/^\s*(import|export)\s+(type\s+)?([^;]*?)\s*from\s+['"]([^'"]+)['"]/gm)) {
    if (m[2]) continue;
    const list = /\{([^}]*)\}/.exec(m[3]);
    const outsideBraces = m[3].replace(/\{[^}]*\}/, '').replace(/,/g, '').trim();
    const names = list ? list[1].split(',').map((n) => n.trim()).filter(Boolean) : [];
    if (list && !outsideBraces && names.length > 0 && names.every((n) => n.startsWith('type '))) continue;
    found.push(m[4]);
  }
  for (const m of text.matchAll(/^\s*import\s+['"]([^'"]+)['"]|\bimport\(\s*['"]([^'"]+)['"]\s*\)/gm)) found.push(m[1] ?? m[2]);
  return found;
}

/** The repository file a specifier names, or null for a package. */
function resolve(from: string, specifier: string): string | null {
  let base: string;
  if (specifier.startsWith('@/')) base = specifier.slice(2);
  else if (specifier.startsWith('.')) base = relative(ROOT, join(ROOT, dirname(from), specifier)).split('\\').join('/');
  else return null;
  const candidates = [base, `${base}.ts`, `${base}.tsx`, `${base}.js`, `${base}/index.ts`, `${base}/index.tsx`];
  return candidates.find((c) => /\.(tsx?|js)$/.test(c) && existsSync(join(ROOT, c))) ?? null;
}

const directive = (file: string, name: string) => new RegExp(`^\\s*['"]${name}['"]`).test(readFileSync(join(ROOT, file), 'utf8'));

/**
 * Every repository file reachable by value imports from the given files. A 'use server' module reaches the browser
 * as references to its actions only, so its own imports are not followed.
 */
function reachable(starts: string[]): Set<string> {
  const seen = new Set<string>();
  const queue = [...starts];
  while (queue.length) {
    const file = queue.pop()!;
    if (seen.has(file)) continue;
    seen.add(file);
    if (directive(file, 'use server')) continue;
    for (const s of valueImports(readFileSync(join(ROOT, file), 'utf8'))) {
      const target = resolve(file, s);
      if (target) queue.push(target);
    }
  }
  return seen;
}

describe('physics out of the browser', () => {
  const clientFiles = ['app', 'components', 'lib'].flatMap(sourceFiles).filter((f) => directive(f, 'use client'));

  it('finds the client components it starts from', () => {
    expect(clientFiles).toContain('components/calculator/calculator.tsx');
    expect(clientFiles).toContain('components/calculator/object-section.tsx');
    expect(clientFiles).not.toContain('lib/actions/register.ts');
  });

  it('loads no lib/physics module in the browser but the shape geometry', () => {
    const physics = [...reachable(clientFiles)].filter((f) => f.startsWith('lib/physics/')).sort();
    expect(physics).toEqual(ALLOWED);
  });

  it('has no component import lib/physics but for types', () => {
    const offenders = sourceFiles('components').flatMap((file) =>
      valueImports(readFileSync(join(ROOT, file), 'utf8'))
        .filter((s) => s === '@/lib/physics' || s.startsWith('@/lib/physics/'))
        .map((s) => `${file} -> ${s}`),
    );
    expect(offenders).toEqual([]);
  });

  it('tells value imports from type-only ones (the checker itself)', () => {
    const text = [
      "import type { DropCase } from '@/lib/physics';",
      "import { type DropResult, type DragModel } from '@/lib/physics/fall';",
      "import { simulateDrop } from '@/lib/physics';",
      "import { type ShapeId, shapeProperties } from '@/lib/physics/shapes';",
      "export { DRAG_MODELS } from './drag';",
      "export type { Medium } from './media';",
      "import odex from 'odex';",
      "const lazy = () => import('@/lib/physics/fall');",
    ].join('\n');
    expect(valueImports(text)).toEqual(['@/lib/physics', '@/lib/physics/shapes', './drag', 'odex', '@/lib/physics/fall']);
    expect(resolve('components/calculator/calculator.tsx', '@/lib/physics')).toBe('lib/physics/index.ts');
    expect(resolve('lib/physics/index.ts', './fall')).toBe('lib/physics/fall.ts');
    expect(resolve('lib/physics/index.ts', 'odex')).toBeNull();
  });
});
