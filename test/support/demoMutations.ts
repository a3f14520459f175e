import fc from 'fast-check';
import { demoDesign } from '../../src/designs/demoDesign';

/**
 * Random damage to the demo design's JSON tree, shared by the fuzz tests of restore, of the store's
 * open path and of stored documents: a valid design with one or more fields replaced, deleted or scaled.
 */

export type JsonTree = Record<string, unknown> | unknown[];

/** Every path into a JSON tree (objects and arrays included, not just leaves). */
export function allPaths(node: unknown, prefix: (string | number)[] = []): (string | number)[][] {
  if (typeof node !== 'object' || node === null) return [];
  const keys: (string | number)[] = Array.isArray(node) ? node.map((_, i) => i) : Object.keys(node);
  return keys.flatMap((key) => {
    const path = [...prefix, key];
    return [path, ...allPaths((node as Record<string | number, unknown>)[key], path)];
  });
}

export const DEMO_TEXT = JSON.stringify(demoDesign());
export const DEMO_PATHS = allPaths(JSON.parse(DEMO_TEXT));
/** Paths outside the block list, so that process, operating and cell fields are hit as often as blocks. */
export const NON_BLOCK_PATHS = DEMO_PATHS.filter((p) => p[0] !== 'blocks');

/** Replaces (or with `undefined`, deletes) the value at `path` in `root`, in place. */
export function mutate(root: JsonTree, path: readonly (string | number)[], value: unknown): void {
  let node: unknown = root;
  for (const key of path.slice(0, -1)) {
    // An earlier mutation may have replaced a parent with a number or string; then there is nothing to change.
    if (typeof node !== 'object' || node === null) return;
    node = (node as Record<string | number, unknown>)[key];
  }
  const last = path[path.length - 1];
  if (typeof node !== 'object' || node === null || last === undefined) return;
  const container = node as Record<string | number, unknown>;
  if (value === undefined) {
    if (Array.isArray(container) && typeof last === 'number') container.splice(last, 1);
    else Reflect.deleteProperty(container, last);
  } else {
    container[last] = value;
  }
}

/** Values a careless editor, a buggy script or a hostile file might put anywhere. */
export const nastyValue: fc.Arbitrary<unknown> = fc.oneof(
  fc.jsonValue({ maxDepth: 2 }),
  fc.double(), // includes NaN, ±Infinity, −0 and subnormals
  fc.constantFrom(undefined, null, 0, -1, 1, 0.5, 1e-300, 1e300, 16385, 2 ** 53, '', 'mat', 'folded', []),
  fc.integer(),
);

/** A numeric leaf nudged by a factor, to probe limits without leaving the number type. */
const scale = fc.constantFrom(0, -1, 0.5, 2, 10, 1e3, 1e-3, 1e6, 1.0000001);

/** One change to the demo: replace the value at `path` (undefined deletes it), or scale a number there. */
export interface Mutation {
  readonly path: readonly (string | number)[];
  readonly value: unknown;
  readonly factor: number;
  readonly kind: 'replace' | 'scale';
}

const DEMO = JSON.parse(DEMO_TEXT) as { blocks: { type: string }[]; cells: { id: string }[] };
/** Every cell id of the demo: the mats use one, the others are only reached by a cell change. */
export const DEMO_CELL_IDS = DEMO.cells.map((c) => c.id);
const MAT_CELL_PATHS = DEMO.blocks.flatMap((b, i) => (b.type === 'mat' ? [['blocks', i, 'cellId']] : []));

/** A mat switched to another cell of the design: valid on its own, it reaches every read style. */
const cellChange: fc.Arbitrary<Mutation> = fc.record({
  path: fc.constantFrom(...MAT_CELL_PATHS),
  value: fc.constantFrom(...DEMO_CELL_IDS),
  factor: fc.constant(1),
  kind: fc.constant('replace' as const),
});

export const mutation: fc.Arbitrary<Mutation> = fc.oneof(
  fc.record({
    path: fc.oneof(fc.constantFrom(...DEMO_PATHS), fc.constantFrom(...NON_BLOCK_PATHS)),
    value: nastyValue,
    factor: scale,
    kind: fc.constantFrom('replace' as const, 'scale' as const),
  }),
  cellChange,
);

/** Numeric leaves outside the block list. */
export const NUMERIC_NON_BLOCK_PATHS = NON_BLOCK_PATHS.filter((path) => {
  let node: unknown = JSON.parse(DEMO_TEXT);
  for (const key of path) node = (node as Record<string | number, unknown>)[key];
  return typeof node === 'number';
});

/** A numeric leaf outside the block list scaled hard, so that schema limits and zero values are reached. */
export const extremeScaling: fc.Arbitrary<Mutation> = fc.record({
  path: fc.constantFrom(...NUMERIC_NON_BLOCK_PATHS),
  value: fc.constant(null),
  factor: fc.constantFrom(0, 1e-12, 1e-6, 1e-3, 0.1, 0.9, 1.1, 10, 1e3, 1e6, 1e12),
  kind: fc.constant('scale' as const),
});

/**
 * A fresh copy of the demo design with the mutations applied in order; with `cellId`, every mat first
 * uses that cell (so that every read style meets every mutation).
 */
export function mutatedDemo(mutations: readonly Mutation[], cellId?: string): JsonTree {
  const root = JSON.parse(DEMO_TEXT) as JsonTree;
  if (cellId !== undefined) {
    for (const block of (root as { blocks: Record<string, unknown>[] }).blocks)
      if (block.type === 'mat') block.cellId = cellId;
  }
  for (const m of mutations) {
    let value = m.value;
    if (m.kind === 'scale') {
      let current: unknown = root;
      for (const key of m.path) {
        current =
          typeof current === 'object' && current !== null
            ? (current as Record<string | number, unknown>)[key]
            : undefined;
      }
      if (typeof current !== 'number') continue;
      value = current * m.factor;
    }
    mutate(root, m.path, value);
  }
  return root;
}
