import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../src/engine';
import { pairsInRanges, pairsOfServingStrips } from '../../src/engine/evaluation/backToBackStrips';
import { ServingForest } from '../../src/engine/evaluation/servingForest';
import { mayFaceInRuns, StripRange } from '../../src/engine/evaluation/stripRanges';
import { evaluationNeighbours } from '../../src/engine/evaluation/evaluate';
import { blockRuns } from '../../src/geometry/blockRuns';
import { gridFloorplan } from '../../src/designs/gridFloorplan';
import { BLOCK_TYPE_CODES, blockTable } from '../../src/geometry/blockTable';
import { ABUTMENT_TOLERANCE } from '../../src/geometry/rect';
import type { Block, Strip } from '../../src/model/block';
import { DEMO_PROCESS, FOLDED_8F2_CELL } from '../../src/model/builtins';
import { designWith, strip } from '../support/designs';

/** 64 folded-cell pitches (2F at F = 18 nm), as in layoutFast.test.ts (arithmetic). */
const UNIT = 64 * 2 * 18e-9;

/** Offsets around "exactly abutting" that straddle the tolerance by an ulp or so. */
const NUDGES = [0, 0, ABUTMENT_TOLERANCE, -ABUTMENT_TOLERANCE, 2 * ABUTMENT_TOLERANCE, -1e-24, 1e-24];

/**
 * Rows of strips of one type, each row a pattern of left edges and widths (often one shared by other
 * rows, so that runs share layouts), at row positions on a coarse grid nudged around the tolerance, some
 * rows against the one before.
 */
const rowsArb = fc.record({
  patterns: fc.array(
    fc.array(
      fc.record({
        gap: fc.integer({ min: 0, max: 2 }),
        w: fc.integer({ min: 1, max: 3 }),
        nudge: fc.constantFrom(...NUDGES),
      }),
      { minLength: 1, maxLength: 5 },
    ),
    { minLength: 1, maxLength: 3 },
  ),
  rows: fc.array(
    fc.record({
      pattern: fc.nat(),
      gy: fc.integer({ min: 0, max: 12 }),
      h: fc.constantFrom(1, 2, 3),
      against: fc.boolean(),
      nudge: fc.constantFrom(...NUDGES),
    }),
    { minLength: 1, maxLength: 8 },
  ),
});

/** True when some strip's far edge lies within the tolerance of some strip's start, pair by pair. */
function someEdgeNearAStartByPairs(across: Float64Array, thickness: Float64Array): boolean {
  for (let i = 0; i < across.length; i++) {
    const edge = (across[i] as number) + (thickness[i] as number);
    for (let j = 0; j < across.length; j++) {
      const start = across[j] as number;
      if (start >= edge - ABUTMENT_TOLERANCE && start <= edge + ABUTMENT_TOLERANCE) return true;
    }
  }
  return false;
}

describe('the back-to-back shortcut for strips listed as one stretch (stripRanges.ts)', () => {
  it('finds an edge near a start from the runs exactly when the strips have one', () => {
    let near = 0;
    let far = 0;
    fc.assert(
      fc.property(rowsArb, fc.boolean(), ({ patterns, rows }, lying) => {
        const blocks: Block[] = [];
        let lastBottom = 0;
        rows.forEach((row, r) => {
          const pattern = patterns[row.pattern % patterns.length] ?? [];
          const y = row.against ? lastBottom + row.nudge : row.gy * UNIT;
          let x = 0;
          pattern.forEach((b, n) => {
            const at = x + b.gap * UNIT + b.nudge;
            blocks.push(strip(`r${r}s${n}`, 'senseAmpStrip', at, y, b.w * UNIT, row.h * UNIT));
            x = at + b.w * UNIT;
          });
          lastBottom = y + row.h * UNIT;
        });
        const table = blockTable(designWith(blocks));
        const runs = blockRuns(table, table.type, ABUTMENT_TOLERANCE, table.count);
        if (runs === null) return;
        const may = mayFaceInRuns(runs, table.x, table.width, 0, table.count - 1, lying);
        const across = lying ? table.y : table.x;
        const thickness = lying ? table.height : table.width;
        expect(may).toBe(someEdgeNearAStartByPairs(across, thickness));
        if (may) near++;
        else far++;
      }),
      { numRuns: 2000 },
    );
    // Not a test that cannot fail: both answers come up often.
    expect(Math.min(near, far)).toBeGreaterThan(200);
  }, 60_000);

  it('takes a stretch only when it holds every block of the type, and nothing else, facing one way', () => {
    const row = fc.array(fc.tuple(fc.nat(BLOCK_TYPE_CODES.length - 1), fc.nat(2)), { maxLength: 12 });
    fc.assert(
      fc.property(row, fc.nat(BLOCK_TYPE_CODES.length - 1), (blocks, code) => {
        const type = Uint8Array.from(blocks, ([t]) => t);
        const facing = Uint8Array.from(blocks, ([, f]) => f);
        const at = blocks.flatMap(([t], i) => (t === code ? [i] : []));
        const range = StripRange.of(type, facing, code);
        if (at.length === 0) {
          expect(range?.to).toBe(-1);
          return;
        }
        const from = at[0] as number;
        const to = at[at.length - 1] as number;
        const f = facing[from] as number;
        const one = at.length === to - from + 1 && f !== 0 && at.every((i) => facing[i] === f);
        expect(range === null ? null : [range.from, range.to, range.facing]).toEqual(
          one ? [from, to, f] : null,
        );
      }),
      { numRuns: 2000 },
    );
  }, 60_000);

  it('gives the pairs of the general path on tiled arrays with strips cut, copied and moved', () => {
    let shortcut = 0;
    let shortcutWithPairs = 0;
    const change = fc.record({
      what: fc.constantFrom('split', 'copyOver', 'move'),
      pick: fc.nat(),
      d: fc.integer({ min: -2, max: 2 }),
    });
    fc.assert(
      fc.property(
        fc.record({
          rows: fc.integer({ min: 1, max: 4 }),
          columns: fc.integer({ min: 1, max: 4 }),
          senseAmp: fc.integer({ min: 1, max: 3 }),
          driver: fc.integer({ min: 1, max: 3 }),
          changes: fc.array(change, { maxLength: 4 }),
        }),
        (g) => {
          let blocks: Block[] = gridFloorplan({
            cell: FOLDED_8F2_CELL,
            featureSize: DEMO_PROCESS.featureSize,
            matRows: g.rows,
            matColumns: g.columns,
            cellsPerBitline: 128,
            cellsPerWordline: 128,
            senseAmpStripHeight: g.senseAmp * UNIT,
            wordlineDriverStripWidth: g.driver * UNIT,
            rowDecoderWidth: 2 * UNIT,
            columnDecoderHeight: 2 * UNIT,
          });
          g.changes.forEach((c, n) => {
            const strips = blocks.flatMap((b, at) =>
              b.type === 'mat' || b.type.endsWith('Decoder') ? [] : [at],
            );
            const at = strips[c.pick % strips.length] as number;
            const b = blocks[at] as Strip;
            const lying = b.width >= b.height;
            const next = blocks.slice();
            if (c.what === 'split') {
              const half = lying ? { height: b.height / 2 } : { width: b.width / 2 };
              const second = lying ? { y: b.y + b.height / 2 } : { x: b.x + b.width / 2 };
              next.splice(at, 1, { ...b, ...half }, { ...b, ...half, ...second, id: `cut${n}` });
            } else if (c.what === 'copyOver') next.splice(at + 1, 0, { ...b, id: `copy${n}` });
            else next[at] = lying ? { ...b, y: b.y + (c.d * UNIT) / 2 } : { ...b, x: b.x + (c.d * UNIT) / 2 };
            blocks = next;
          });
          const design = designWith(blocks);
          const table = blockTable(design);
          const { facing } = ServingForest.of(evaluate(design).mats, table);
          // The runs evaluate() passes when its neighbour pass is banded, else cut here.
          const runs =
            evaluationNeighbours(table).runs ?? blockRuns(table, table.type, ABUTMENT_TOLERANCE, table.count);
          const fast = pairsInRanges(table, facing, runs);
          if (fast === null) return;
          shortcut++;
          if (fast.some((p) => p.length > 0)) shortcutWithPairs++;
          expect(fast).toEqual(pairsOfServingStrips(table, facing));
        },
      ),
      { numRuns: 400 },
    );
    expect(shortcut).toBeGreaterThan(100);
    expect(shortcutWithPairs).toBeGreaterThan(10);
  }, 60_000);
});
