import { existsSync, readFileSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

/** The app's source folder. */
export const SRC = resolve(dirname(fileURLToPath(import.meta.url)), '../../src');

/** Value imports (type-only imports are erased) of one module: `from '…'` specifiers. */
export function valueImports(source: string): string[] {
  const found: string[] = [];
  for (const m of source.matchAll(/^(?:import|export)\s+(type\s+)?([\s\S]*?)\s+from\s+'([^']+)';/gm)) {
    if (m[1]) continue;
    const names = (m[2] ?? '').trim();
    const onlyTypes =
      names.startsWith('{') &&
      names
        .slice(1, -1)
        .split(',')
        .every((n) => n.trim() === '' || n.trim().startsWith('type '));
    if (!onlyTypes && m[3]) found.push(m[3]);
  }
  return found;
}

/**
 * The chain of static value imports from `entry` (a path under src/) to a module importing `pkg`, or null
 * when none does. Type-only imports and import() are not followed: neither loads the module at start.
 */
export function chainTo(entry: string, pkg: string): string[] | null {
  const seen = new Set<string>();
  const visit = (file: string, chain: string[]): string[] | null => {
    if (seen.has(file)) return null;
    seen.add(file);
    for (const spec of valueImports(readFileSync(file, 'utf8'))) {
      if (spec === pkg) return chain;
      if (!spec.startsWith('.')) continue;
      const base = join(dirname(file), spec);
      const next = [`${base}.ts`, `${base}.tsx`, join(base, 'index.ts')].find((p) => existsSync(p));
      const found = next ? visit(next, [...chain, relative(SRC, next)]) : null;
      if (found) return found;
    }
    return null;
  };
  return visit(join(SRC, entry), [entry]);
}
