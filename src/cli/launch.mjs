/**
 * `npm run evaluate`: starts the evaluation CLI in plain Node. The CLI and the packages it uses are
 * bundled into one file in node_modules/.cache/matloom/ with esbuild, again only when a source file or
 * package.json is newer than the bundle; every other run imports the bundle directly. Compiling
 * TypeScript on each start cost about a second, several times the evaluation itself. No set-up step:
 * the first run (or the first after an edit) builds it.
 */
import { mkdirSync, readdirSync, renameSync, statSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '../..');
const entry = join(root, 'src/cli/evaluate.ts');
const bundle = join(root, 'node_modules/.cache/matloom/evaluate.mjs');

/** Latest modification time (ms) of the TypeScript sources under `dir`. */
function newestSource(dir) {
  let newest = 0;
  for (const item of readdirSync(dir, { withFileTypes: true })) {
    const path = join(dir, item.name);
    if (item.isDirectory()) newest = Math.max(newest, newestSource(path));
    else if (/\.tsx?$/.test(item.name)) newest = Math.max(newest, statSync(path).mtimeMs);
  }
  return newest;
}

function modified(path) {
  try {
    return statSync(path).mtimeMs;
  } catch {
    return -1;
  }
}

const sources = Math.max(newestSource(join(root, 'src')), modified(join(root, 'package.json')));
if (modified(bundle) < sources) {
  const { buildSync } = await import('esbuild');
  mkdirSync(dirname(bundle), { recursive: true });
  // Written beside and renamed, so a run started meanwhile never imports half a file.
  const partial = `${bundle}.${process.pid}.tmp`;
  buildSync({
    entryPoints: [entry],
    outfile: partial,
    bundle: true,
    platform: 'node',
    format: 'esm',
    target: 'node20',
    logLevel: 'error',
  });
  renameSync(partial, bundle);
}
await import(pathToFileURL(bundle).href);
