import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { facingPairs, PairList } from '../../src/engine/evaluation/facingStrips';
import { ABUTMENT_TOLERANCE } from '../../src/geometry/rect';

/** A coarse grid step (m) so that edges meet often (arithmetic: 64 folded-cell pitches at F = 18 nm). */
const UNIT = 64 * 2 * 18e-9;

/** Offsets around "exactly abutting" that straddle the tolerance by an ulp or so. */
const NUDGES = [0, 0, 0, ABUTMENT_TOLERANCE, -ABUTMENT_TOLERANCE, 2 * ABUTMENT_TOLERANCE, -1e-24];

/**
 * Pairs by definition, pair by pair: strip j's start within the tolerance of strip i's far edge, and the
 * two overlapping along the strip by more than the tolerance; for each strip in turn, its partners by
 * start, then by position.
 */
function pairsByDefinition(
  across: Float64Array,
  thickness: Float64Array,
  along: Float64Array,
  length: Float64Array,
): number[] {
  const out: number[] = [];
  const n = across.length;
  for (let i = 0; i < n; i++) {
    const edge = (across[i] as number) + (thickness[i] as number);
    const partners: number[] = [];
    for (let j = 0; j < n; j++) {
      if (j === i) continue;
      const start = across[j] as number;
      if (!(start >= edge - ABUTMENT_TOLERANCE && start <= edge + ABUTMENT_TOLERANCE)) continue;
      const overlap =
        Math.min((along[i] as number) + (length[i] as number), (along[j] as number) + (length[j] as number)) -
        Math.max(along[i] as number, along[j] as number);
      if (overlap > ABUTMENT_TOLERANCE) partners.push(j);
    }
    partners.sort((a, b) => (across[a] as number) - (across[b] as number) || a - b);
    for (const j of partners) out.push(i, j);
  }
  return out;
}

/**
 * Rows of standing strips that repeat a pattern of starts and thicknesses (the period the search's
 * prefilter looks for), some rows changed at one strip: moved across, made thicker or thinner, nudged
 * around the tolerance, so that a strip like the one a period before it and one that is not both occur.
 */
const rowsArb = fc.record({
  pattern: fc.array(fc.record({ gap: fc.integer({ min: 1, max: 3 }), w: fc.integer({ min: 1, max: 3 }) }), {
    minLength: 1,
    maxLength: 6,
  }),
  rows: fc.integer({ min: 1, max: 6 }),
  changes: fc.array(
    fc.record({
      row: fc.nat(),
      strip: fc.nat(),
      dx: fc.integer({ min: -3, max: 3 }),
      dw: fc.constantFrom(0, 0, 1, -1, 0.5),
      nudge: fc.constantFrom(...NUDGES),
      /** Made just thick enough to reach the next strip's start, in place (a strip whose start repeats). */
      reach: fc.boolean(),
    }),
    { maxLength: 4 },
  ),
  /** The first strips alike (a leading stretch the period search steps over). */
  lead: fc.integer({ min: 0, max: 3 }),
});

describe('back-to-back search (facingPairs) with its prefilter over repeating rows', () => {
  it('finds the pairs the definition gives, pair by pair', () => {
    let withPairs = 0;
    fc.assert(
      fc.property(rowsArb, (g) => {
        const across: number[] = [];
        const thickness: number[] = [];
        const along: number[] = [];
        const length: number[] = [];
        for (let l = 0; l < g.lead; l++) {
          across.push(0);
          thickness.push(UNIT);
          along.push(-10 * UNIT);
          length.push(2 * UNIT);
        }
        for (let r = 0; r < g.rows; r++) {
          let x = 0;
          for (const p of g.pattern) {
            x += p.gap * UNIT;
            across.push(x);
            thickness.push(p.w * UNIT);
            along.push(r * 4 * UNIT);
            length.push(4 * UNIT);
            x += p.w * UNIT;
          }
        }
        for (const c of g.changes) {
          const at = g.lead + ((c.row % g.rows) * g.pattern.length + (c.strip % g.pattern.length));
          if (c.reach && at + 1 < across.length) {
            thickness[at] = (across[at + 1] as number) - (across[at] as number) + c.nudge;
            continue;
          }
          across[at] = (across[at] as number) + c.dx * UNIT + c.nudge;
          thickness[at] = Math.max(UNIT / 2, (thickness[at] as number) + c.dw * UNIT);
        }
        const a = Float64Array.from(across);
        const t = Float64Array.from(thickness);
        const s = Float64Array.from(along);
        const l = Float64Array.from(length);
        const strips = Int32Array.from(across.keys());
        const pairs = new PairList();
        facingPairs(strips, a, t, s, l, pairs);
        const expected = pairsByDefinition(a, t, s, l);
        if (expected.length > 0) withPairs++;
        expect([...pairs.toArray()]).toEqual(expected);
      }),
      { numRuns: 2000 },
    );
    // The cases must include strips that face (else a prefilter saying "never" would pass).
    expect(withPairs).toBeGreaterThan(100);
  }, 60_000);
});
