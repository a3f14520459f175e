/**
 * Initial JavaScript of the production build: what a browser must fetch and run before the app can
 * draw (`npm run bench:size` builds first; `bench:canvas` prints the same line). The entry script and
 * everything it imports statically (index.html's module preloads), following each chunk's own static
 * imports too, compressed with gzip at zlib's default level (6, what web servers commonly use; Vite's
 * own size report reads about 2 kB higher for the same file). Chunks loaded with import()
 * (explorer, variants, dialogs, restore and the edit check) are not counted.
 */
import { readFileSync } from 'node:fs';
import { cpus, loadavg } from 'node:os';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { gzipSync } from 'node:zlib';

/** The budget (kB of gzip, 1 kB = 1000 bytes). */
export const INITIAL_JS_GOAL_KB = 200;

export interface InitialJs {
  readonly files: readonly { readonly name: string; readonly raw: number; readonly gzip: number }[];
  readonly raw: number;
  readonly gzip: number;
}

/** Static imports of one built chunk: `import … from "./x.js"` and `import "./x.js"`. */
function staticImports(code: string): string[] {
  const found: string[] = [];
  for (const m of code.matchAll(/(?:^|[;}\s])import\s*(?:[\w$*{}\s,]+from\s*)?["']\.\/([^"']+\.js)["']/g)) {
    if (m[1]) found.push(m[1]);
  }
  return found;
}

export function initialJs(dist: string): InitialJs {
  const html = readFileSync(join(dist, 'index.html'), 'utf8');
  const wanted = [
    ...html.matchAll(/<script[^>]*type="module"[^>]*src="\/?([^"]+\.js)"/g),
    ...html.matchAll(/<link[^>]*rel="modulepreload"[^>]*href="\/?([^"]+\.js)"/g),
  ].map((m) => m[1] as string);
  const seen = new Set<string>();
  const files: { name: string; raw: number; gzip: number }[] = [];
  while (wanted.length > 0) {
    const name = wanted.shift() as string;
    if (seen.has(name)) continue;
    seen.add(name);
    const code = readFileSync(join(dist, name));
    files.push({ name, raw: code.length, gzip: gzipSync(code).length });
    const folder = name.includes('/') ? name.slice(0, name.lastIndexOf('/') + 1) : '';
    for (const next of staticImports(code.toString('utf8'))) wanted.push(folder + next);
  }
  return {
    files,
    raw: files.reduce((sum, f) => sum + f.raw, 0),
    gzip: files.reduce((sum, f) => sum + f.gzip, 0),
  };
}

/** One line in the benches' style: the size (a single build: runs 1) beside the goal. */
export function initialJsLine(dist: string): string {
  const size = initialJs(dist);
  const kB = size.gzip / 1000;
  const verdict = `≤ ${INITIAL_JS_GOAL_KB} kB gzip: ${kB <= INITIAL_JS_GOAL_KB ? 'met' : 'NOT met'}`;
  return (
    `initial JS (entry + static imports, ${size.files.length} files, ${(size.raw / 1000).toFixed(1)} kB raw)`.padEnd(
      60,
    ) +
    ` runs 1  ${kB.toFixed(1)} kB gzip  ${verdict}  load ${loadavg()
      .map((l) => l.toFixed(2))
      .join(' ')}`
  );
}

if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const dist = fileURLToPath(new URL('../../dist', import.meta.url));
  const size = initialJs(dist);
  console.log(`Matloom initial JavaScript, production build in dist/ (${cpus().length} CPUs).`);
  for (const f of size.files) {
    console.log(
      `  ${f.name.padEnd(40)} ${(f.raw / 1000).toFixed(1).padStart(7)} kB raw ${(f.gzip / 1000).toFixed(1).padStart(6)} kB gzip`,
    );
  }
  console.log(initialJsLine(dist));
}
