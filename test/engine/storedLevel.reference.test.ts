import { describe, expect, it } from 'vitest';
import { storedHighLevel, thresholdWithBodyEffect } from '../../src/engine/physics/storedLevel';
import { processWith } from '../support/designs';

describe('access-transistor threshold and stored-1 level', () => {
  it('body effect: Vt0 0.43 V, γ 0.4 V^½, 2φF 0.6 V, VSB 2.5 V gives about 0.82 V', () => {
    // Source: J. Rabaey, A. Chandrakasan, B. Nikolić, "Digital Integrated Circuits", 2nd ed., 2003,
    // ch. 3, 0.25 µm NMOS parameters and body-effect example (from memory). Exact: 0.43 + 0.4·(√3.1 − √0.6).
    const p = processWith({
      accessThresholdVoltage: 0.43,
      bodyEffectCoefficient: 0.4,
      surfacePotential: 0.6,
    });
    expect(thresholdWithBodyEffect(p, 2.5)).toBeCloseTo(0.43 + 0.4 * (Math.sqrt(3.1) - Math.sqrt(0.6)), 12);
    expect(thresholdWithBodyEffect(p, 2.5)).toBeCloseTo(0.824, 3);
    expect(thresholdWithBodyEffect(p, 0)).toBe(0.43);
  });

  it('DDR4 levels: VDD 1.2 V with VPP 2.5 V store a full 1', () => {
    // Source: Micron DDR4 SDRAM datasheet, VDD = 1.2 V, VPP = 2.5 V (published); access-device
    // Vt0 0.7 V, γ 0.5 V^½, 2φF 0.8 V are typical values (from memory). VDD + Vt(VDD) = 2.16 V < 2.5 V.
    const p = processWith({
      arrayVoltage: 1.2,
      prechargeVoltage: 0.6,
      wordlineHighVoltage: 2.5,
      accessThresholdVoltage: 0.7,
      bodyEffectCoefficient: 0.5,
      surfacePotential: 0.8,
    });
    const high = storedHighLevel(p);
    expect(high.level).toBe(1.2);
    expect(high.limitedByWordline).toBe(false);
    expect(high.wordlineHighNeeded).toBeCloseTo(1.2 + 0.7 + 0.5 * (Math.sqrt(2) - Math.sqrt(0.8)), 12);
  });

  it('an unboosted word line (VPP = VDD) stores VPP − Vt(V1), found self-consistently', () => {
    // Source: VPP ≥ VDD + Vt rule, shared/REFERENCES.md entry 20 (common practice); the fixed point is checked
    // by substituting it back (arithmetic).
    const p = processWith({ arrayVoltage: 1.8, prechargeVoltage: 0.9, wordlineHighVoltage: 1.8 });
    const high = storedHighLevel(p);
    expect(high.limitedByWordline).toBe(true);
    expect(high.level).toBeGreaterThan(0);
    expect(high.level).toBeLessThan(1.8 - p.accessThresholdVoltage);
    expect(high.level + thresholdWithBodyEffect(p, high.level)).toBeCloseTo(1.8, 9);
  });

  it('a word line below the zero-bias threshold cannot write a 1 at all', () => {
    // Source: follows from V1 = VPP − Vt(V1) (arithmetic).
    const p = processWith({ wordlineHighVoltage: 0.5, accessThresholdVoltage: 0.75 });
    expect(storedHighLevel(p).level).toBe(0);
  });
});
