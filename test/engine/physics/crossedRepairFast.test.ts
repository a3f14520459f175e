import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  crossedRepairLowerBound,
  splitPlanDomainProbability,
  type LineDomainClass,
} from '../../../src/engine/physics/crossedRepair';
import { poissonCdf, poissonCdfTable } from '../../../src/engine/physics/redundancy';
import { gridRepairPlan, type MatShare } from '../../../src/engine/evaluation/repairDomains';
import { DEFAULT_REPAIR } from '../../../src/model/builtins';
import {
  plainCrossedRepairLowerBound,
  plainSplitPlanDomainProbability,
} from '../../support/redundancyOracle';
import { plainGridRepairPlan } from '../../support/gridRepairOracle';

// The crossed repair bound shares one call's repeated domains, tiles and Poisson tables; these properties
// hold it equal, bit for bit (Object.is), to the plain formulas computed class by class
// (test/support/redundancyOracle.ts, the code as it was). Arithmetic tests: same formulas both sides.

const mean = fc.oneof(
  fc.constant(0),
  fc.double({ min: 1e-9, max: 3, noNaN: true }),
  fc.double({ min: 3, max: 2000, noNaN: true }),
);
const spares = fc.integer({ min: 0, max: 6 });
const tile = fc.record({
  count: fc.integer({ min: 1, max: 70 }),
  cellFaults: mean,
  columnFaults: mean,
  columnSpares: fc.integer({ min: 0, max: 6 }),
});
const domain = fc.record({
  count: fc.integer({ min: 0, max: 300 }),
  lines: fc.oneof(fc.integer({ min: 1, max: 8 }), fc.integer({ min: 8, max: 100_000 })),
  lineFaults: mean,
  cellFaults: mean,
});

/**
 * Row classes that often repeat one domain (as a grid's mat rows do) and whose tiles come from a small pool
 * of kinds with counts that sometimes agree (so the shared tile distributions are hit and missed).
 */
const rowClasses = fc
  .record({
    shared: domain,
    pool: fc.array(tile, { minLength: 1, maxLength: 3 }),
    kinds: fc.array(
      fc.tuple(
        fc.integer({ min: 0, max: 300 }),
        fc.array(fc.tuple(fc.nat(2), fc.constantFrom(1, 2, 7, 32)), { maxLength: 3 }),
      ),
      { minLength: 1, maxLength: 4 },
    ),
    others: fc.array(domain, { maxLength: 2 }),
    withTiles: fc.boolean(),
  })
  .map(({ shared, pool, kinds, others, withTiles }): LineDomainClass[] => [
    ...kinds.map(([count, picks]) => {
      const tiles = picks.map(([k, n]) => ({
        ...(pool[k % pool.length] as (typeof pool)[number]),
        count: n,
      }));
      return { ...shared, count, ...(withTiles ? { tiles } : {}) };
    }),
    ...others.map((d) => ({ ...d, ...(withTiles ? { tiles: [] } : {}) })),
  ]);

describe('crossed repair bound with shared terms', () => {
  it('poissonCdfTable(k, λ)[i] is poissonCdf(i, λ) bit for bit', () => {
    fc.assert(
      fc.property(fc.integer({ min: -1, max: 12 }), mean, (k, m) => {
        const table = poissonCdfTable(k, m);
        expect(table.length).toBe(Math.max(0, k + 1));
        for (let i = 0; i <= k; i++) expect(Object.is(table[i], poissonCdf(i, m))).toBe(true);
      }),
      { numRuns: 2000 },
    );
  });

  it('equals the plain bound class by class on random domains', () => {
    fc.assert(
      fc.property(rowClasses, fc.array(domain, { maxLength: 3 }), spares, spares, (rows, columns, r, c) => {
        const fast = crossedRepairLowerBound(rows, columns, r, c);
        const plain = plainCrossedRepairLowerBound(rows, columns, r, c);
        expect(Object.is(fast, plain), `${fast} vs ${plain}`).toBe(true);
      }),
      { numRuns: 3000 },
    );
  }, 60_000);

  it('the split plan of one domain equals the plain one', () => {
    fc.assert(
      fc.property(domain, spares, fc.array(tile, { maxLength: 4 }), (d, r, tiles) => {
        const fast = splitPlanDomainProbability(d.lines, d.lineFaults, r, tiles);
        const plain = plainSplitPlanDomainProbability(d.lines, d.lineFaults, r, tiles);
        expect(Object.is(fast, plain)).toBe(true);
      }),
      { numRuns: 2000 },
    );
  }, 60_000);

  it('gridRepairPlan by row kinds equals the plan made mat row by mat row', () => {
    const faults = fc.record({ cells: mean, rows: mean, columns: mean });
    const share = fc.record({
      rows: fc.integer({ min: 1, max: 2048 }),
      columns: fc.integer({ min: 2, max: 4096 }),
      area: fc.double({ min: 1e-12, max: 1e-7, noNaN: true }),
      defects: faults,
      parametric: faults,
    });
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 400 }),
        fc.integer({ min: 1, max: 64 }),
        fc.constantFrom('mat', 'matRow', 'bank') as fc.Arbitrary<'mat' | 'matRow' | 'bank'>,
        spares,
        spares,
        share,
        (matRows, matColumns, repairDomain, spareRows, spareColumns, s: MatShare) => {
          const settings = { ...DEFAULT_REPAIR, repairDomain, spareRows, spareColumns };
          const shape = { matRows, matColumns, stripArea: 3e-10 };
          expect(gridRepairPlan(shape, settings, s)).toEqual(plainGridRepairPlan(shape, settings, s));
        },
      ),
      { numRuns: 1000 },
    );
  }, 60_000);
});
