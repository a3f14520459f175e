import { describe, expect, it } from 'vitest';
import { offsetSigmaMultiplier } from '../../src/engine/physics/offset';
import { drivenLineTime } from '../../src/engine/physics/rcLine';
import { retentionTime, weakestCellLeakage } from '../../src/engine/physics/retention';
import {
  developedShare,
  developmentTimeConstant,
  latchTime,
  restoreTime,
  rowTiming,
} from '../../src/engine/physics/rowTiming';
import { DYNAMIC_4T_CELL, SRAM_6T_CELL } from '../../src/model/builtins';
import { footprintInF2 } from '../../src/model/cell';

// Reference checks for the row timing chain and the die-scale statistics. Each expected value is a number
// published in the named source; "from memory" says the source was not re-read for this check. Checks
// marked "arithmetic" compare with our own calculation on the stated inputs.

describe('driven distributed RC line (reference)', () => {
  // Source for the coefficients: J. Rabaey, A. Chandrakasan, B. Nikolić, Digital Integrated Circuits,
  // 2nd ed., Prentice Hall, 2003, ch. 4, table of step responses of lumped and distributed RC networks:
  // 0→50 %: lumped 0.69 RC, distributed 0.38 RC; 0→63 %: lumped RC, distributed 0.5 RC; 10→90 %:
  // lumped 2.2 RC, distributed 0.9 RC; 0→90 %: lumped 2.3 RC, distributed 1.0 RC (from memory;
  // shared/REFERENCES.md entries 9 and 22).
  const t = (fraction: number) => drivenLineTime(0, 1, 1, fraction);
  const lumped = (fraction: number) => drivenLineTime(1e9, 1, 1e-9, fraction);

  it('distributed 0→50 % is 0.38 RC', () => expect(t(0.5)).toBeCloseTo(0.38, 2));
  it('distributed 0→63 % is 0.5 RC', () => expect(t(1 - Math.exp(-1))).toBeCloseTo(0.5, 2));
  it('distributed 10→90 % is 0.9 RC', () => expect(t(0.9) - t(0.1)).toBeCloseTo(0.9, 1));
  it('distributed 0→90 % is 1.0 RC', () => expect(t(0.9)).toBeCloseTo(1.0, 1));
  it('lumped (driver-dominated) 0→50 % is 0.69 RC', () => expect(lumped(0.5)).toBeCloseTo(0.69, 2));
  it('lumped (driver-dominated) 0→90 % is 2.3 RC', () => expect(lumped(0.9)).toBeCloseTo(2.3, 1));
  it('lumped (driver-dominated) 10→90 % is 2.2 RC', () =>
    expect(lumped(0.9) - lumped(0.1)).toBeCloseTo(2.2, 1));

  it('the Elmore delay of a uniform wire is RC/2', () => {
    // Source: W. C. Elmore, "The transient response of damped linear networks with particular regard to
    // wideband amplifiers", J. Appl. Phys. 19, 1948; RC/2 for a uniform line in any VLSI text, e.g.
    // Rabaey et al. 2003, ch. 4 (from memory). With no access resistance the development time constant
    // is the bit line's Elmore delay.
    expect(developmentTimeConstant(0, 1e-15, 1000, 1e-12)).toBeCloseTo(0.5e-9, 20);
  });
});

describe('cell charging and latch regeneration (reference)', () => {
  it('an RC charge reaches 95 % after 3τ (2.996τ)', () => {
    // Source: RC charging, 1 − e^(−3) = 95.0 %; e.g. P. Horowitz, W. Hill, The Art of Electronics,
    // 2nd ed., 1989, §1.13 (from memory).
    expect(restoreTime(1, 1, 0.95)).toBeCloseTo(2.996, 3);
    expect(developedShare(3, 1)).toBeCloseTo(0.95, 2);
  });

  it('a latch amplifies 1 mV to 1 V in τ·ln 1000 ≈ 6.9 τ', () => {
    // Source: B. Razavi, "The StrongARM Latch", IEEE Solid-State Circuits Magazine 7(2), 2015,
    // regeneration ΔV0·e^(t/τ), τ = C/gm (from memory); 6.9τ is ln 1000 (arithmetic).
    expect(latchTime(1e-12, 1e3, 1e-3, 1)).toBeCloseTo(6.9078e-9, 12);
    expect(latchTime(1e-12, 1e3, 0, 1)).toBeNaN();
    // Arithmetic: ln(1/5e-311) = 714.49 (the quotient itself would overflow to Infinity).
    expect(latchTime(1e-12, 1e3, 5e-311, 1) / 1e-9).toBeCloseTo(714.49, 1);
  });

  it('tRC = tRAS + tRP, as in the JEDEC DDR4-2400 speed bin (32 ns + 14.16 ns = 46.16 ns)', () => {
    // Source: JEDEC JESD79-4, DDR4-2400R speed bin: tRAS 32 ns, tRP 14.16 ns, tRC 46.16 ns (from memory);
    // the same bin as published in the gem5 simulator's source, src/mem/DRAMInterface.py, class
    // DDR4_2400_8x8 ("DDR4-2400 17-17-17": tRCD = tRP = 14.16 ns, tRAS = 32 ns; read for this check).
    const chain = rowTiming({
      wordlineOn: 0,
      development: 0,
      latch: 14.16e-9,
      wordlineNinety: 0,
      restore: 32e-9 - 14.16e-9,
      wordlineFall: 0,
      equalise: 14.16e-9,
    });
    expect(chain.ras).toBeCloseTo(32e-9, 18);
    expect(chain.rp).toBeCloseTo(14.16e-9, 18);
    expect(chain.rc).toBeCloseTo(46.16e-9, 18);
  });
});

describe('die-scale statistics (reference)', () => {
  it('two-tailed k: 5 % of amplifiers outside ±1.96σ', () => {
    // Source: standard normal table, P(|Z| > 1.960) = 0.05, e.g. M. Abramowitz, I. Stegun, Handbook of
    // Mathematical Functions, 1964, Table 26.1 (from memory). 1 allowed failure in 20 amplifiers.
    expect(offsetSigmaMultiplier(20, 1)).toBeCloseTo(1.96, 2);
  });

  it('two-tailed k: 0.27 % outside ±3σ (the 68–95–99.7 rule)', () => {
    // Source: Abramowitz & Stegun 1964, Table 26.1: 2·Q(3) = 0.0026998 (from memory).
    expect(offsetSigmaMultiplier(1 / 0.0026998, 1)).toBeCloseTo(3, 3);
  });

  it('the weakest of 10 tail cells sits near the expected maximum of 10 normals, 1.5388σ', () => {
    // Source: L. H. C. Tippett, "On the extreme individuals and the range of samples taken from a normal
    // population", Biometrika 17, 1925: E[max of 10] = 1.53875 (from memory). Blom's position is an
    // approximation, so within 0.01σ.
    const z = Math.log(weakestCellLeakage(1e-18, 1, 1, 1, 10));
    expect(z).toBeCloseTo(1.5388, 1);
    expect(Math.abs(z - 1.53875)).toBeLessThan(0.01);
  });

  it('the weakest of 100 tail cells: expected maximum of 100 normals, 2.5076σ', () => {
    // Source: Tippett 1925, Biometrika 17: E[max of 100] = 2.50759 (from memory); within 0.01σ.
    const z = Math.log(weakestCellLeakage(1e-18, 1, 1, 1, 100));
    expect(Math.abs(z - 2.50759)).toBeLessThan(0.01);
  });
});

describe('reference cell footprints', () => {
  it('the 6T SRAM reference cell is 140 F²', () => {
    // Source: "Memory characteristics of silicon nanowire transistors generated by weak impact
    // ionization", Scientific Reports 7, 2017, Table 2: standard 6T SRAM 140 F² (published).
    expect(footprintInF2(SRAM_6T_CELL, 16e-9)).toBeCloseTo(140, 9);
  });

  it('the 4T dynamic cell is within 3 % of the loadless 4T cell, 1.9 µm² at 0.18 µm (58.6 F²)', () => {
    // Source: K. Noda et al., "A 1.9-µm² loadless CMOS four-transistor SRAM cell in a 0.18-µm logic
    // technology", IEDM 1998 (from memory): 1.9e-12 / (0.18e-6)² = 58.64 F².
    const published = 1.9e-12 / 0.18e-6 ** 2;
    expect(Math.abs(footprintInF2(DYNAMIC_4T_CELL, 18e-9) / published - 1)).toBeLessThan(0.03);
  });
});

describe('a textbook-style 1T1C cell problem (published inputs, our arithmetic)', () => {
  // Source: a course problem found in the search corpus (askfilo.com / doubtrix.com copies; its book is not
  // named there): a 20 fF cell charged to 3.3 V, written through a 6 kΩ access transistor from a bit-line
  // driver of 1 kΩ; read onto a 500 fF bit line precharged to 3.3 V; at most 2 pA of leakage and 0.5 V of
  // tolerated loss. The pages give no answers: the expected values below are arithmetic on those inputs.
  it('writing a 1 to 95 % takes (6 kΩ + 1 kΩ)·20 fF·ln 20 = 0.419 ns (arithmetic)', () => {
    expect(restoreTime(7e3, 20e-15, 0.95)).toBeCloseTo(7e3 * 20e-15 * Math.log(20), 18);
    expect(restoreTime(7e3, 20e-15, 0.95) * 1e9).toBeCloseTo(0.4194, 4);
  });

  it('a 2 pA leak costs 0.5 V of a 20 fF cell in 5 ms (arithmetic)', () => {
    expect(retentionTime(20e-15, 0.5, 2e-12)).toBeCloseTo(5e-3, 12);
  });
});
