import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../src/engine';
import { pairsInRanges, pairsOfServingStrips } from '../../src/engine/evaluation/backToBackStrips';
import { facingPairs, PairList } from '../../src/engine/evaluation/facingStrips';
import { ServingForest } from '../../src/engine/evaluation/servingForest';
import { mayFaceInRange, StripRange } from '../../src/engine/evaluation/stripRanges';
import { gridFloorplan } from '../../src/designs/gridFloorplan';
import { BLOCK_TYPE_CODES, blockTable } from '../../src/geometry/blockTable';
import { ABUTMENT_TOLERANCE } from '../../src/geometry/rect';
import type { Block, Strip } from '../../src/model/block';
import { DEMO_PROCESS, FOLDED_8F2_CELL } from '../../src/model/builtins';
import { designWith } from '../support/designs';

/** 64 folded-cell pitches (2F at F = 18 nm), as in layoutFast.test.ts (arithmetic). */
const UNIT = 64 * 2 * 18e-9;

/** Offsets around "exactly abutting" that straddle the tolerance by an ulp or so. */
const NUDGES = [
  0,
  ABUTMENT_TOLERANCE,
  -ABUTMENT_TOLERANCE,
  2 * ABUTMENT_TOLERANCE,
  -2 * ABUTMENT_TOLERANCE,
  1e-24,
];

/** Strips in a row of starts on a coarse grid, some placed against another's far edge within a nudge. */
const stripsArb = fc
  .array(
    fc.record({
      gridStart: fc.integer({ min: 0, max: 12 }),
      thickness: fc.constantFrom(UNIT, 2 * UNIT, UNIT / 3, 0.5 * ABUTMENT_TOLERANCE, 3 * ABUTMENT_TOLERANCE),
      against: fc.option(fc.nat(), { freq: 2 }),
      nudge: fc.constantFrom(...NUDGES),
      scale: fc.constantFrom(1, 1 + 2 ** -40),
      length: fc.integer({ min: 1, max: 4 }),
    }),
    { minLength: 1, maxLength: 16 },
  )
  .map((specs) => {
    const across: number[] = [];
    const thickness: number[] = [];
    for (const s of specs) {
      const k = across.length;
      const onto = s.against === null || k === 0 ? -1 : s.against % k;
      across.push(
        onto < 0
          ? s.gridStart * UNIT * s.scale
          : (across[onto] as number) + (thickness[onto] as number) + s.nudge,
      );
      thickness.push(s.thickness);
    }
    return { across, thickness, length: specs.map((s) => s.length * UNIT) };
  });

/** The strips at positions 2 … 2 + n − 1 of a table whose first two positions are something else. */
function shifted(values: readonly number[]): Float64Array {
  return Float64Array.from([7, -3, ...values]);
}

describe('the back-to-back shortcut for strips listed as one stretch (stripRanges.ts)', () => {
  it('says no strips face only when the search finds no pair', () => {
    let saidNo = 0;
    fc.assert(
      fc.property(stripsArb, ({ across, thickness, length }) => {
        const n = across.length;
        const strips = Int32Array.from({ length: n }, (_, s) => s + 2);
        const pairs = new PairList();
        const a = shifted(across);
        const t = shifted(thickness);
        facingPairs(strips, a, t, shifted(across.map(() => 0)), shifted(length), pairs);
        const may = mayFaceInRange(a, t, 2, n + 1);
        if (!may) saidNo++;
        if (pairs.length > 0) expect(may).toBe(true);
      }),
      { numRuns: 3000 },
    );
    // Not a test that cannot fail: the shortcut must actually answer "no" for many of these rows.
    expect(saidNo).toBeGreaterThan(300);
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
          const fast = pairsInRanges(table, facing);
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
