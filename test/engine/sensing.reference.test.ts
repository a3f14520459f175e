import { describe, expect, it } from 'vitest';
import { chargeSharingSignal, chargeTransferRatio, readSignals } from '../../src/engine/physics/sensing';

describe('charge sharing against published worked figures', () => {
  it('Keeth & Baker style 1T1C read: 3.3 V, Vcc/2 precharge, Cs = 50 fF, Cbl = 300 fF', () => {
    // Source: B. Keeth, R. J. Baker, "DRAM Circuit Design: A Tutorial", IEEE Press, 2001, ch. 1 (from memory);
    // ΔV = 235.7 mV, CTR = 0.1429 as listed in shared/REFERENCES.md entry 1.
    const ctr = chargeTransferRatio(50e-15, 300e-15);
    expect(ctr).toBeCloseTo(0.1429, 4);
    expect(chargeSharingSignal(3.3, 1.65, ctr)).toBeCloseTo(0.2357, 4);
    const signals = readSignals(3.3, 1.65, ctr);
    expect(signals.signalHigh).toBeCloseTo(0.2357, 4);
    expect(signals.signalLow).toBeCloseTo(0.2357, 4);
    expect(signals.senseSignal).toBeCloseTo(0.2357, 4);
  });

  it('Weste & Harris form ΔV = (VDD/2)·Ccell/(Ccell + Cbit) with VDD 2.58, Ccell 5.98, Cbit 12.38', () => {
    // Source: N. Weste, D. Harris, "CMOS VLSI Design", 4th ed., 2011, memory chapter (published formula;
    // arithmetic) → 0.4202 V. Only the ratio matters, so the unit cancels.
    const ctr = chargeTransferRatio(5.98, 12.38);
    expect(chargeSharingSignal(2.58, 2.58 / 2, ctr)).toBeCloseTo(0.4202, 4);
  });

  it('full-VDD precharge reading a stored 0: Cs 20 fF, Cbl 500 fF, 3.3 V settles at 3.1731 V', () => {
    // Source: charge conservation, 3.3·500/520 (arithmetic; shared/REFERENCES.md entry 3).
    const ctr = chargeTransferRatio(20e-15, 500e-15);
    const delta = chargeSharingSignal(0, 3.3, ctr);
    expect(3.3 + delta).toBeCloseTo(3.1731, 4);
    expect(-delta).toBeCloseTo(0.1269, 4);
  });

  it('commodity ratios Cbl/Cs of 3 to 10 give CTR from 0.25 down to 0.09', () => {
    // Source: common practice (no source): Cbl/Cs ≈ 3–10 and CTR ≈ 0.1–0.25 (shared/REFERENCES.md entry 4).
    expect(chargeTransferRatio(1, 3)).toBeCloseTo(0.25, 6);
    expect(chargeTransferRatio(1, 10)).toBeCloseTo(1 / 11, 6);
  });

  it('a weak 1 below the precharge level reads as the wrong value', () => {
    // Source: follows from charge conservation (arithmetic): V1 < Vpre gives a negative signal.
    const signals = readSignals(0.5, 0.55, 0.15);
    expect(signals.signalHigh).toBeLessThan(0);
    expect(signals.senseSignal).toBe(signals.signalHigh);
  });
});
