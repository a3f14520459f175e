import { describe, expect, it } from 'vitest';
import { wilsonInterval } from '../../../src/engine/physics/binomialInterval';
import { clusteredExpectation } from '../../../src/engine/physics/defectClustering';
import { normalUpperTail } from '../../../src/engine/physics/normalTail';
import { binomialCdf, dieRepairProbability, poissonCdf } from '../../../src/engine/physics/redundancy';
import {
  goodDiesPerWafer,
  grossDiesPerWafer,
  negativeBinomialYield,
  poissonYield,
} from '../../../src/engine/physics/yield';

const CM2 = 1e-4; // m² per cm²
const MM2 = 1e-6; // m² per mm²
const MM = 1e-3;

describe('gross dies per wafer, π(d/2)²/S − πd/√(2S)', () => {
  it('216 mm² die on a 300 mm wafer → 282 dies', () => {
    // Source: J. L. Hennessy, D. A. Patterson, "Computer Architecture: A Quantitative Approach", 5th ed.,
    // 2012, Figure 1.15 caption: "At 216 mm², the formula for dies per wafer estimates 282" [published].
    // The formula gives 281.9; the caption rounds it.
    expect(Math.round(grossDiesPerWafer(300 * MM, 216 * MM2))).toBe(282);
  });

  it('200 mm wafer: 115 mm² → 231 dies, 300 mm² → 79 dies', () => {
    // Source: Cornell ECE 4750 / CS 4420 Computer Architecture, Homework 1 solution, problem 1.1 (an exercise of
    // Hennessy & Patterson): Alpha 21264C 115 mm² → 231, Itanium 300 mm² → 79 on a 200 mm wafer [published].
    expect(Math.floor(grossDiesPerWafer(200 * MM, 115 * MM2))).toBe(231);
    expect(Math.floor(grossDiesPerWafer(200 * MM, 300 * MM2))).toBe(79);
  });
});

describe('negative-binomial (clustered) die yield, (1 + A·D/α)^(−α)', () => {
  it('115 mm², 0.5 defects/cm², α = 4, wafer yield 0.95 → 0.55; 231 dies → about 127 good', () => {
    // Source: Cornell ECE 4750 / CS 4420, Homework 1 solution, problem 1.1 (Alpha 21264C) [published].
    const dieYield = 0.95 * negativeBinomialYield(115 * MM2, 0.5 / CM2, 4);
    // The solution prints the yield cut to two decimals (0.555 → 0.55) and multiplies 231 × 0.55 = 127.05.
    expect(dieYield).toBeGreaterThanOrEqual(0.55);
    expect(dieYield).toBeLessThan(0.56);
    expect(Math.abs(goodDiesPerWafer(231, dieYield) - 127.05)).toBeLessThan(231 * 0.01);
  });

  it('389 mm² at 0.3/cm² → 0.36 and 380 mm² at 0.75/cm² → 0.12 (α = 4)', () => {
    // Source: CPE 432 Computer Design, Homework 1 solution, "chip fabrication cost" (IBM Power5 and Sun
    // Niagara figures of Hennessy & Patterson, 4th ed.) [published].
    expect(negativeBinomialYield(389 * MM2, 0.3 / CM2, 4)).toBeCloseTo(0.36, 2);
    expect(negativeBinomialYield(380 * MM2, 0.75 / CM2, 4)).toBeCloseTo(0.12, 2);
  });

  it('tends to the Poisson yield as α grows (arithmetic)', () => {
    expect(negativeBinomialYield(1 * CM2, 1 / CM2, 1e9)).toBeCloseTo(Math.exp(-1), 8);
    expect(negativeBinomialYield(1 * CM2, 1 / CM2, Infinity)).toBe(Math.exp(-1));
  });

  it('is the gamma-mixed Poisson yield: E[e^(−λX)] with X ~ Gamma(α, mean 1) (arithmetic)', () => {
    for (const alpha of [0.5, 1, 2, 4]) {
      for (const lambda of [0.1, 1, 3]) {
        const mixed = clusteredExpectation((x) => Math.exp(-lambda * x), alpha);
        expect(mixed).toBeCloseTo(negativeBinomialYield(lambda, 1, alpha), 7);
      }
    }
  });
});

describe('Poisson die yield, exp(−A·D)', () => {
  it('1 defect/cm²: 2.3 cm² → 0.1, 1.0 cm² → 0.37', () => {
    // Source: M. J. Flynn, "Computer Architecture: Pipelined and Parallel Processor Design", Jones & Bartlett,
    // 1995, p. 89 (worked example beside Figure 2.20) [published].
    expect(poissonYield(2.3 * CM2, 1 / CM2)).toBeCloseTo(0.1, 2);
    expect(poissonYield(1.0 * CM2, 1 / CM2)).toBeCloseTo(0.37, 2);
  });
});

describe('redundancy: repairable when faults ≤ spares', () => {
  it('256 sense amplifiers at 99.5 % each, none spare: 27.7 % per block, 0.6 % for four blocks; with 25 repairable ≈ 1', () => {
    // Source: MIT 6.780J / 2.830J "Control of Manufacturing Processes", Spring 2008, Assignment 5 solutions,
    // part 2 (a)–(c): (0.995)^256 = 27.7 %, (0.277)^4 = 0.6 %, and Σ_{k≤25} e^(−1.28)·1.28^k/k! ≈ 1 [published].
    const block = binomialCdf(0, 256, 0.005);
    expect(block).toBeCloseTo(0.277, 3);
    const domain = {
      rows: 256,
      columns: 1,
      spareRows: 0,
      spareColumns: 0,
      faults: { cells: 0, rows: 0, columns: 0 },
    };
    expect(dieRepairProbability([{ count: 4, domain }], () => block)).toBeCloseTo(0.006, 3);
    expect(binomialCdf(25, 256, 0.005)).toBeGreaterThan(1 - 1e-12);
    expect(poissonCdf(25, 1.28)).toBeGreaterThan(1 - 1e-12);
  });
});

describe('statistics used by the yield figures', () => {
  it('Wilson score interval, 95 %: 81/263 → 0.2553–0.3662, 15/148 → 0.0624–0.1605, 0/20 → 0–0.1611, 1/29 → 0.0061–0.1718', () => {
    // Source: R. G. Newcombe, "Two-sided confidence intervals for the single proportion: comparison of seven
    // methods", Statistics in Medicine 17, 1998, Table II, method 3 (score method without continuity
    // correction) [from memory].
    const cases: [number, number, number, number][] = [
      [81, 263, 0.2553, 0.3662],
      [15, 148, 0.0624, 0.1605],
      [0, 20, 0, 0.1611],
      [1, 29, 0.0061, 0.1718],
    ];
    for (const [k, n, low, high] of cases) {
      const interval = wilsonInterval(k, n);
      expect(interval.low).toBeCloseTo(low, 4);
      expect(interval.high).toBeCloseTo(high, 4);
    }
  });

  it('normal upper tail Q(z): Q(1) = 0.158655, Q(3) = 1.349898e-3, Q(5) = 2.866516e-7', () => {
    // Source: M. Abramowitz, I. A. Stegun, "Handbook of Mathematical Functions", 1964, Table 26.1 [from memory].
    expect(normalUpperTail(1)).toBeCloseTo(0.158655, 6);
    expect(normalUpperTail(3) / 1.349898e-3).toBeCloseTo(1, 6);
    expect(normalUpperTail(5) / 2.866516e-7).toBeCloseTo(1, 6);
  });
});
