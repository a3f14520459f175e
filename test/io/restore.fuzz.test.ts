import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../src/engine/evaluation/evaluate';
import { MAX_DESIGN_TEXT_LENGTH, restoreDesign } from '../../src/io/restore';
import { demoDesign } from '../../src/designs/demoDesign';
import { designSchema } from '../../src/model/designSchema';
import {
  DEMO_CELL_IDS,
  DEMO_TEXT,
  extremeScaling,
  mutate,
  mutatedDemo,
  mutation,
  type JsonTree,
} from '../support/demoMutations';
import { figureProblems } from '../support/figureInvariants';

// Source for every property here: common practice (no source): a loader never throws on bad input, and
// whatever it accepts is a valid design the engine can evaluate into sound figures: every per-mat and
// whole-design figure finite, or NaN ("does not exist") with a specific reason, never ±Infinity,
// non-negative where physical and within its bound (test/support/figureInvariants.ts).

/** Restores, and for an accepted design checks that it validates and evaluates to finite totals. */
function restoreAndCheck(input: unknown): void {
  const result = restoreDesign(input);
  if (!result.ok) {
    expect(result.errors.length).toBeGreaterThan(0);
    expect(result.errors.length).toBeLessThanOrEqual(20);
    // Messages quote the file's strings cut short: each stays a readable line.
    for (const e of result.errors) {
      expect(typeof e).toBe('string');
      expect(e.length).toBeLessThan(600);
    }
    return;
  }
  expect(designSchema.safeParse(result.design).success).toBe(true);
  const report = evaluate(result.design);
  expect(figureProblems(report, result.design)).toEqual([]);
}

/** A design text nested this deep is refused as a design, never a crash (JSON.parse handles the depth). */
function deeplyNested(depth: number): string {
  return `${'['.repeat(depth)}${']'.repeat(depth)}`;
}

/** The demo as it is, or with every mat on one of its cells (so that every read style is fuzzed). */
const cellChoice = fc.option(fc.constantFrom(...DEMO_CELL_IDS), { freq: 2 });

/** Thousands of generated cases take a few seconds; allow for a busy machine (not a speed assertion). */
const FUZZ_TIMEOUT = { timeout: 60_000 };
/**
 * The mutation fuzzes evaluate every accepted design: ~14 s of CPU on this machine, ~40 s of wall time at
 * a load of 11 on 2 cores; the limit leaves room for a busier machine (not a speed assertion).
 */
const EVALUATING_FUZZ_TIMEOUT = { timeout: 240_000 };

describe('restoreDesign under fuzzing', () => {
  it('refuses deep nesting, long strings, __proto__ keys and oversize text with bounded messages', () => {
    restoreAndCheck(deeplyNested(5000));
    restoreAndCheck({ format: 'x'.repeat(100_000) });
    restoreAndCheck(`{"__proto__":{"format":"matloom-design"},"version":1}`);
    expect(({} as Record<string, unknown>).format).toBeUndefined();
    const long = JSON.parse(DEMO_TEXT) as Record<string, unknown>;
    long.name = 'n'.repeat(10_000);
    restoreAndCheck(long);
    const restored = restoreDesign(' '.repeat(MAX_DESIGN_TEXT_LENGTH + 1));
    expect(restored.ok).toBe(false);
  });

  it('never throws on arbitrary JSON values, as text or as objects', FUZZ_TIMEOUT, () => {
    fc.assert(
      fc.property(fc.jsonValue(), (value) => {
        restoreAndCheck(value);
        restoreAndCheck(JSON.stringify(value));
      }),
      { numRuns: 2000 },
    );
  });

  it('never throws on arbitrary text', FUZZ_TIMEOUT, () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary', maxLength: 200 }), (text) => {
        restoreAndCheck(text);
      }),
      { numRuns: 2000 },
    );
  });

  it('never throws on objects that look like a design but carry junk', FUZZ_TIMEOUT, () => {
    const designLike = fc.record(
      {
        format: fc.oneof(fc.constant('matloom-design'), fc.anything()),
        version: fc.oneof(fc.constant(1), fc.anything()),
        name: fc.anything(),
        lengthUnit: fc.oneof(fc.constant('m'), fc.anything()),
        process: fc.anything(),
        operating: fc.anything(),
        cells: fc.anything(),
        blocks: fc.oneof(fc.array(fc.anything(), { maxLength: 5 }), fc.anything()),
      },
      { requiredKeys: [] },
    );
    fc.assert(
      fc.property(designLike, (value) => restoreAndCheck(value)),
      { numRuns: 2000 },
    );
  });

  it(
    'the demo design (any cell) with one to four random field mutations: refused with messages, or sound figures',
    EVALUATING_FUZZ_TIMEOUT,
    () => {
      fc.assert(
        fc.property(cellChoice, fc.array(mutation, { minLength: 1, maxLength: 4 }), (cellId, mutations) => {
          const design = mutatedDemo(mutations, cellId ?? undefined);
          restoreAndCheck(design);
          // Through text as well: NaN and Infinity become null there, which must also be refused cleanly.
          restoreAndCheck(JSON.stringify(design));
        }),
        { numRuns: 3000 },
      );
    },
  );

  it(
    'process, operating and cell numbers pushed to extremes (any cell): refused, or sound figures',
    EVALUATING_FUZZ_TIMEOUT,
    () => {
      // Numeric leaves outside the block list, scaled hard so that schema limits and zero values are reached.
      fc.assert(
        fc.property(
          cellChoice,
          fc.array(extremeScaling, { minLength: 1, maxLength: 6 }),
          (cellId, mutations) => {
            restoreAndCheck(mutatedDemo(mutations, cellId ?? undefined));
          },
        ),
        { numRuns: 3000 },
      );
    },
  );

  it('a subnormal precharge level (once found by the mutation fuzz) gives no infinite row timing', () => {
    // Source: arithmetic. Vpre = 1e-310 V leaves a stored-0 signal near 5e-311 V; the latch time's
    // ln(ΔV1/ΔV0) overflowed to Infinity and carried tRCD, tRC, tRFC and the busy fraction with it
    // (5 non-finite totals). The latch now takes ln ΔV1 − ln ΔV0, which stays finite.
    const demo = JSON.parse(DEMO_TEXT) as JsonTree;
    mutate(demo, ['process', 'prechargeVoltage'], 1e-310);
    const result = restoreDesign(demo);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    const totals = evaluate(result.design).totals;
    expect(figureProblems(evaluate(result.design), result.design)).toEqual([]);
    expect(Number.isFinite(totals.worstRowCycleTime)).toBe(true);
    expect(Number.isFinite(totals.refresh.busyFraction)).toBe(true);
  });

  it('zero cell leakage still gives finite retention (the engine floors leakage at 1e-30 A)', () => {
    // Source: arithmetic (Cs·ΔV / 0 would be ∞).
    const design = demoDesign();
    const zeroLeakage = { ...design, process: { ...design.process, cellLeakageCurrent: 0 } };
    const report = evaluate(zeroLeakage);
    expect(figureProblems(report, zeroLeakage)).toEqual([]);
  });
});
