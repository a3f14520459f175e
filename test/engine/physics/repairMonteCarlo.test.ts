import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  estimateRepairProbability,
  RepairSimulation,
  type RepairMonteCarloRequest,
} from '../../../src/engine/physics/repairMonteCarlo';
import { countProbabilities } from '../../../src/engine/physics/repairSampling';
import { sharedDomainLayout } from '../../../src/engine/physics/repairLayout';
import {
  dieRepairProbability,
  rowColumnRepairProbability,
  sparseRepairProbability,
  type RepairDomain,
} from '../../../src/engine/physics/redundancy';
import { clusteredExpectation } from '../../../src/engine/physics/defectClustering';
import { negativeBinomialYield } from '../../../src/engine/physics/yield';

const NONE = { cells: 0, rows: 0, columns: 0 };

/** `count` domains that each repair their own rows and columns (the classic organisation). */
function mcRequest(
  domain: RepairDomain,
  count: number,
  clustered: boolean,
  rest: { fatalDefects: number; clustering: number; seed: number },
): RepairMonteCarloRequest {
  return {
    layout: sharedDomainLayout(
      count,
      domain.rows,
      domain.columns,
      clustered ? domain.faults : NONE,
      clustered ? NONE : domain.faults,
    ),
    copies: 1,
    spareRows: domain.spareRows,
    spareColumns: domain.spareColumns,
    ...rest,
  };
}

describe('Monte-Carlo repair estimate against the closed forms', () => {
  it('row and column faults only: the exact probability lies in the 95 % interval', () => {
    const domain: RepairDomain = {
      rows: 64,
      columns: 32,
      spareRows: 1,
      spareColumns: 2,
      faults: { cells: 0, rows: 0.05, columns: 0.08 },
    };
    const exact = dieRepairProbability([{ count: 32, domain }], rowColumnRepairProbability);
    const mc = estimateRepairProbability(
      mcRequest(domain, 32, true, { fatalDefects: 0, clustering: Infinity, seed: 11 }),
      20_000,
    );
    expect(mc.trials).toBe(20_000);
    expect(exact).toBeGreaterThanOrEqual(mc.low);
    expect(exact).toBeLessThanOrEqual(mc.high);
  });

  it('two faults on one line need one spare: the exact form counts distinct lines (small mats)', () => {
    const domain: RepairDomain = {
      rows: 4,
      columns: 4,
      spareRows: 1,
      spareColumns: 0,
      faults: { cells: 0, rows: 1.2, columns: 0 },
    };
    const exact = rowColumnRepairProbability(domain);
    const mc = estimateRepairProbability(
      mcRequest(domain, 1, false, { fatalDefects: 0, clustering: Infinity, seed: 5 }),
      20_000,
    );
    expect(exact).toBeGreaterThanOrEqual(mc.low);
    expect(exact).toBeLessThanOrEqual(mc.high);
  });

  it('mixed faults in large mats: the sparse-limit form lies in the interval (and below the estimate)', () => {
    const domain: RepairDomain = {
      rows: 4096,
      columns: 4096,
      spareRows: 2,
      spareColumns: 1,
      faults: { cells: 0.6, rows: 0.1, columns: 0.1 },
    };
    const sparse = dieRepairProbability([{ count: 8, domain }], sparseRepairProbability);
    const mc = estimateRepairProbability(
      mcRequest(domain, 8, false, { fatalDefects: 0, clustering: Infinity, seed: 7 }),
      20_000,
    );
    expect(sparse).toBeGreaterThanOrEqual(mc.low);
    expect(sparse).toBeLessThanOrEqual(mc.high);
  });

  it('no spares, clustered defects: the die yield is the negative-binomial yield', () => {
    const domain: RepairDomain = {
      rows: 128,
      columns: 128,
      spareRows: 0,
      spareColumns: 0,
      faults: { cells: 0.01, rows: 0.002, columns: 0.003 },
    };
    const perDie = 64 * (0.01 + 0.002 + 0.003) + 0.2;
    const expected = negativeBinomialYield(perDie, 1, 1.5);
    const mc = estimateRepairProbability(
      mcRequest(domain, 64, true, { fatalDefects: 0.2, clustering: 1.5, seed: 3 }),
      20_000,
    );
    expect(expected).toBeGreaterThanOrEqual(mc.low);
    expect(expected).toBeLessThanOrEqual(mc.high);
  });

  it('clustered row/column faults: the gamma-mixed exact form lies in the interval', () => {
    const domain: RepairDomain = {
      rows: 256,
      columns: 256,
      spareRows: 1,
      spareColumns: 1,
      faults: { cells: 0, rows: 0.03, columns: 0.03 },
    };
    const alpha = 0.8;
    const exact = clusteredExpectation(
      (x) =>
        dieRepairProbability(
          [{ count: 50, domain: { ...domain, faults: { cells: 0, rows: 0.03 * x, columns: 0.03 * x } } }],
          rowColumnRepairProbability,
        ),
      alpha,
    );
    const mc = estimateRepairProbability(
      mcRequest(domain, 50, true, { fatalDefects: 0, clustering: alpha, seed: 10 }),
      20_000,
    );
    expect(exact).toBeGreaterThanOrEqual(mc.low);
    expect(exact).toBeLessThanOrEqual(mc.high);
  });
});

describe('Monte-Carlo mechanics', () => {
  const request = mcRequest(
    {
      rows: 512,
      columns: 512,
      spareRows: 1,
      spareColumns: 1,
      faults: { cells: 0.02, rows: 0.005, columns: 0.005 },
    },
    256,
    true,
    { fatalDefects: 0.05, clustering: 2, seed: 42 },
  );

  it('the result depends on the seed only, not on how the trials are chunked', () => {
    const whole = new RepairSimulation(request).run(5000);
    const chunked = new RepairSimulation(request);
    chunked.run(1200);
    chunked.run(3000);
    expect(chunked.run(800)).toEqual(whole);
  });

  it('count tables sum to 1 and have the right mean (Poisson and negative binomial; arithmetic)', () => {
    for (const [mean, alpha] of [
      [3, Infinity],
      [3, 0.7],
      [40, 4],
    ] as const) {
      const p = countProbabilities(mean, alpha);
      const total = p.reduce((a, b) => a + b, 0);
      const m = p.reduce((a, b, k) => a + b * k, 0);
      expect(total).toBeCloseTo(1, 12);
      expect(m).toBeCloseTo(mean, 8);
    }
  });

  it(
    'more spares never repair fewer dies for the same seed (common random numbers)',
    { timeout: 60_000 },
    () => {
      fc.assert(
        fc.property(
          fc.integer({ min: 0, max: 2 }),
          fc.integer({ min: 0, max: 2 }),
          fc.integer(),
          (r, c, seed) => {
            const make = (spareRows: number, spareColumns: number) => ({
              ...request,
              seed,
              spareRows,
              spareColumns,
            });
            const base = estimateRepairProbability(make(r, c), 400).repaired;
            expect(estimateRepairProbability(make(r + 1, c), 400).repaired).toBeGreaterThanOrEqual(base);
            expect(estimateRepairProbability(make(r, c + 1), 400).repaired).toBeGreaterThanOrEqual(base);
          },
        ),
        { numRuns: 30 },
      );
    },
  );
});
