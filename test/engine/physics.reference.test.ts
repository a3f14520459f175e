import { describe, expect, it } from 'vitest';
import {
  activationEnergyForRatio,
  bitlinePairEnergy,
  BOLTZMANN,
  DISTRIBUTED_RC_50,
  drivenLineDelay,
  inverseNormal,
  LUMPED_RC_50,
  leakageAtTemperature,
  offsetSigmaMultiplier,
  pelgromSigma,
  refreshBusyFraction,
  refreshInterval,
  retentionTime,
  rowsPerRefreshCommand,
  stackOffsets,
  upperTailQuantile,
} from '../../src/engine';
import { ELECTRON_CHARGE } from '../../src/model/builtins';

describe('sense-amplifier offset', () => {
  it('Pelgrom σ = A_VT/√(WL): 2.5 mV·µm, W 0.5 µm, L 0.1 µm → 11.18 mV, 5σ = 55.9 mV', () => {
    // Source: M. Pelgrom, A. Duinmaijer, A. Welbers, "Matching Properties of MOS Transistors", IEEE JSSC 24(5),
    // 1989 (published law); A_VT = 2.5 mV·µm from memory; arithmetic (shared/REFERENCES.md entry 14).
    const sigma = pelgromSigma(2.5e-9, 0.5e-6, 0.1e-6);
    expect(sigma).toBeCloseTo(11.18e-3, 5);
    expect(5 * sigma).toBeCloseTo(55.9e-3, 4);
  });

  it('Geib et al.: a 27 mV 5σ offset and 10 mV asymmetry stack to 37 mV linearly, 28.8 mV as RSS', () => {
    // Source: H. Geib et al., IEEE JSSC, July 1992 (published values); arithmetic for the RSS.
    expect(stackOffsets(27e-3, 10e-3, 'linear')).toBeCloseTo(37e-3, 12);
    expect(stackOffsets(27e-3, 10e-3, 'rss')).toBeCloseTo(28.79e-3, 5);
  });

  it.each([
    [0.975, 1.959964],
    [0.84134474, 1.0],
    [0.9986501, 3.0],
    [0.5, 0],
    [0.025, -1.959964],
  ])('Φ⁻¹(%f) = %f', (p, z) => {
    // Source: M. Abramowitz, I. Stegun, Handbook of Mathematical Functions, 1964, Table 26.1 (from memory).
    expect(inverseNormal(p)).toBeCloseTo(z, 5);
  });

  it('a one-sided 5σ tail is 2.8665e-7; both tails count, so k = 5 for 1 failure in 1.7443 million amplifiers', () => {
    // Source: Abramowitz & Stegun, Table 26.1, Q(5) = 2.8665e-7 (from memory); two-tailed budget
    // 2·Q(k) = f/N (common practice, no source): N = 1/(2·2.8665e-7) = 1.7443e6.
    expect(upperTailQuantile(2.8665e-7)).toBeCloseTo(5, 3);
    expect(offsetSigmaMultiplier(1 / (2 * 2.8665e-7), 1)).toBeCloseTo(5, 3);
    expect(offsetSigmaMultiplier(10, 20)).toBe(0);
  });
});

describe('retention and temperature', () => {
  it('constant-current leak: Cs 25 fF, ΔV 0.3 V: 1 fA → 7.5 s, 100 fA → 75 ms', () => {
    // Source: Q = C·V = I·t (arithmetic); femtoampere cell leakage, IEICE Trans. Electron. E79-C(12):1707, 1996
    // (shared/REFERENCES.md entry 7).
    expect(retentionTime(25e-15, 0.3, 1e-15)).toBeCloseTo(7.5, 9);
    expect(retentionTime(25e-15, 0.3, 100e-15)).toBeCloseTo(75e-3, 12);
  });

  it('Arrhenius: Ea 0.6 eV multiplies leakage by 1.70 from 85 °C to 95 °C', () => {
    // Source: Arrhenius law with k = 1.380649e-23 J/K (BIPM SI Brochure, 9th ed., 2019); ×1.70 from
    // shared/REFERENCES.md entry 8 (arithmetic).
    const ratio = leakageAtTemperature(1, 358.15, 0.6 * ELECTRON_CHARGE, 368.15);
    expect(ratio).toBeCloseTo(1.7, 2);
  });

  it('retention halving per 10 °C near 90 °C means Ea ≈ 0.79 eV', () => {
    // Source: common practice (retention halves per 10 °C); shared/REFERENCES.md entry 8 (arithmetic).
    const ea = activationEnergyForRatio(2, 358.15, 368.15) / ELECTRON_CHARGE;
    expect(ea).toBeCloseTo(0.79, 2);
  });

  it('SI constants are the exact 2019 values', () => {
    // Source: BIPM, The International System of Units (SI Brochure), 9th ed., 2019, Table 1 (published).
    expect(BOLTZMANN).toBe(1.380649e-23);
    expect(ELECTRON_CHARGE).toBe(1.602176634e-19);
  });
});

describe('wire delay conventions', () => {
  it('a distributed RC line reaches 50 % at 0.38·RC and a lumped one at 0.69·RC', () => {
    // Source: J. Rabaey, A. Chandrakasan, B. Nikolić, Digital Integrated Circuits, 2nd ed., 2003, ch. 4 (from
    // memory; 0.3787 exact from the diffusion equation) (shared/REFERENCES.md entry 9).
    expect(DISTRIBUTED_RC_50).toBeCloseTo(0.38, 2);
    expect(LUMPED_RC_50).toBeCloseTo(0.693, 3);
    expect(drivenLineDelay(0, 1000, 1e-12)).toBeCloseTo(0.38e-9, 15);
    expect(drivenLineDelay(1000, 0, 1e-12)).toBeCloseTo(0.693e-9, 12);
  });

  it('driver and wire terms add: 0.69·Rd·C + 0.38·Rw·C', () => {
    // Source: Rabaey et al., 2003, ch. 4, driver plus distributed wire (from memory); arithmetic.
    expect(drivenLineDelay(2000, 5000, 50e-15)).toBeCloseTo(
      Math.LN2 * 2000 * 50e-15 + 0.38 * 5000 * 50e-15,
      20,
    );
  });
});

describe('refresh (published standards and datasheets)', () => {
  it('tREFI = 64 ms / 8192 = 7.8125 µs and 32 ms / 8192 = 3.906 µs', () => {
    // Source: Micron DDR3 SDRAM datasheet, refresh table; JEDEC JESD79-3 (published).
    expect(refreshInterval(64e-3, 8192)).toBeCloseTo(7.8125e-6, 15);
    expect(refreshInterval(32e-3, 8192)).toBeCloseTo(3.90625e-6, 15);
  });

  it.each([
    [110e-9, 0.0141],
    [160e-9, 0.0205],
    [260e-9, 0.0333],
    [350e-9, 0.0448],
  ])('DDR3 tRFC %f s gives a busy fraction of %f at tREFI 7.8125 µs', (trfc, busy) => {
    // Source: Micron DDR3 SDRAM datasheet, tRFC for 1/2/4/8 Gb (published); arithmetic.
    expect(refreshBusyFraction(trfc, 7.8125e-6)).toBeCloseTo(busy, 4);
  });

  it('64 K rows → 8 rows per command, 128 K rows → 16', () => {
    // Source: arithmetic on published organisations (shared/REFERENCES.md entry 12).
    expect(rowsPerRefreshCommand(65536, 8192)).toBe(8);
    expect(rowsPerRefreshCommand(131072, 8192)).toBe(16);
  });
});

describe('energy', () => {
  it('half-VDD precharge: 80 fF at 1.1 V is 48.4 fJ per pair and 396.5 pJ per 8192-pair page', () => {
    // Source: common-practice derivation E = Cbl·VDD²/2 per pair (shared/REFERENCES.md entry 13); arithmetic.
    expect(bitlinePairEnergy(1, 80e-15, 1.1)).toBeCloseTo(48.4e-15, 18);
    // The published figure is rounded to 0.1 pJ.
    expect(Math.abs(bitlinePairEnergy(8192, 80e-15, 1.1) - 396.5e-12)).toBeLessThan(0.05e-12);
  });
});
