import { describe, expect, it } from 'vitest';
import { offsetSigmaMultiplier } from '../../src/engine/physics/offset';
import { normalUpperTail } from '../../src/engine/physics/normalTail';
import { leakageAtTemperature, retentionTime } from '../../src/engine/physics/retention';
import { ELECTRON_CHARGE } from '../../src/model/builtins';
import { developedShare, restoreTime } from '../../src/engine/physics/rowTiming';
import { chargeSharingSignal, chargeTransferRatio } from '../../src/engine/physics/sensing';
import { storedHighLevel, thresholdWithBodyEffect } from '../../src/engine/physics/storedLevel';
import { processWith } from '../support/designs';

// Reference checks whose expected values were read, for this file, in a published worked answer or table
// (the place is named beside each check). Each runs our engine function on the published inputs and allows
// only the rounding of the published answer. "From memory" and "arithmetic" mark the checks that are not.

describe('threshold and stored level with and without body effect (published answers)', () => {
  it('Vt0 0.8 V, 2φF 0.7 V, γ 0.4 V^½, VSB 3 V → Vt = 1.23 V', () => {
    // Source: interviewsolution.com, "An NMOS transistor has Vt0 = 0.8 V, 2φf = 0.7 V, and γ = 0.4 V^1/2.
    // Find Vt when VSB = 3 V", a question from the body-effect topic of a MOSFET chapter: "Right answer is
    // (b) 1.23 V" (published; read for this check). Rounded to 10 mV.
    const p = processWith({ accessThresholdVoltage: 0.8, bodyEffectCoefficient: 0.4, surfacePotential: 0.7 });
    expect(Math.abs(thresholdWithBodyEffect(p, 3) - 1.23)).toBeLessThan(0.005);
  });

  it('a pass transistor with a 5 V gate and Vt 1 V passes 5 V as 4 V, and a second one passes 4 V as 4 V', () => {
    // Source: questions.zollege.in, "The following circuit employing pass transistor logic, all NMOS
    // transistors are identical with a threshold voltage of 1 V. Ignoring the body-effect, the output voltages
    // at P, Q and R are": "The Correct Option is A" = 4 V, 4 V, 4 V (published; read for this check).
    // The first device is word-line limited (VPP − Vt), the second is not (its input is already below it).
    const first = storedHighLevel(
      processWith({
        arrayVoltage: 5,
        wordlineHighVoltage: 5,
        accessThresholdVoltage: 1,
        bodyEffectCoefficient: 0,
      }),
    );
    expect(first.level).toBeCloseTo(4, 9);
    expect(first.limitedByWordline).toBe(true);
    const second = storedHighLevel(
      processWith({
        arrayVoltage: 4,
        wordlineHighVoltage: 5,
        accessThresholdVoltage: 1,
        bodyEffectCoefficient: 0,
      }),
    );
    expect(second.level).toBeCloseTo(4, 9);
    expect(second.limitedByWordline).toBe(false);
  });

  it('0.25 µm NMOS (Vt0 0.43 V, γ 0.4, 2φF 0.6 V) passing 2.5 V with a 2.5 V gate stops near 1.8 V', () => {
    // Source: J. Rabaey, A. Chandrakasan, B. Nikolić, Digital Integrated Circuits, 2nd ed., 2003, pass-
    // transistor section: an NMOS pass device in the generic 0.25 µm process pulls its output only to about
    // 1.8 V because of the threshold drop with body effect (from memory). The 0.25 µm parameters are the
    // book's (Vt0 0.43 V, γ 0.4 V^½, 2φF 0.6 V), listed the same way in a problem copied on solutionspile.com
    // (read). Our self-consistent solve gives 1.76 V; the book's "1.8 V" is rounded to 0.1 V.
    const high = storedHighLevel(
      processWith({
        arrayVoltage: 2.5,
        wordlineHighVoltage: 2.5,
        accessThresholdVoltage: 0.43,
        bodyEffectCoefficient: 0.4,
        surfacePotential: 0.6,
      }),
    );
    expect(high.limitedByWordline).toBe(true);
    expect(Math.abs(high.level - 1.8)).toBeLessThan(0.05);
  });

  it('with Vt(3 V) = 1.23 V published, a 4.23 V word line stores 3.0 V (arithmetic on a published figure)', () => {
    // Arithmetic: the published threshold of the first check, fed back through our self-consistent
    // V1 = VPP − Vt(V1) solve with VPP = 3 V + 1.23 V. Expected within the 5 mV rounding of 1.23 V.
    const high = storedHighLevel(
      processWith({
        arrayVoltage: 5,
        wordlineHighVoltage: 4.23,
        accessThresholdVoltage: 0.8,
        bodyEffectCoefficient: 0.4,
        surfacePotential: 0.7,
      }),
    );
    expect(Math.abs(high.level - 3)).toBeLessThan(0.01);
  });
});

describe('leakage budget and retention (published answers)', () => {
  it('35 fF at 1.5 V leaking 0.30 fC/s loses 2.0 % in 3.5 s', () => {
    // Source: D. C. Giancoli, Physics: Principles with Applications, 7th ed., ch. 17 (Electric Potential),
    // general problem 94 (a DRAM cell); worked answer on vaia.com: "(b) … 3.5 s" (published; read).
    expect(Math.abs(retentionTime(35e-15, 0.02 * 1.5, 0.3e-15) - 3.5)).toBeLessThan(0.05);
  });

  it('a 5 V cell refreshed every 20 ms losing ≤ 0.5 V to 0.1 pA has 4 fF', () => {
    // Source: GATE ECE 1996, question 2.11 (ec.gateoverflow.in/2422): options 4e-6, 4e-9, 4e-12, 4e-15 F
    // (published, read); the answer key's choice 4e-15 F is from memory. Only that option gives 20 ms.
    expect(retentionTime(4e-15, 0.5, 0.1e-12)).toBeCloseTo(20e-3, 12);
    for (const wrong of [4e-6, 4e-9, 4e-12]) expect(retentionTime(wrong, 0.5, 0.1e-12)).toBeGreaterThan(19);
  });

  it('38 fF, VDD 2.5 V, Vt 0.5 V, Cbl 454 fF, 28 mV to sense, 9 µs refresh → at most 6.9 nA of leakage', () => {
    // Source: a DRAM problem on doubtrix.com (study-help-day/electrical-engineering/2024-05-5): "A DRAM
    // cell uses a storage capacitor of 38 fF, VDD = 2.5 V and VT = 0.5 V for the NMOS access FET. If the
    // bit line capacitance is 454 fF, the sense amp can detect voltages down to 28 mV as a valid one, and the
    // memory is refreshed every 9 μsec, what is the maximum leakage current that can be tolerated in
    // nanoamps? The correct answer is 6.9" (published; read). The answer follows with the bit line at 0 V
    // before the read (with a VDD/2 precharge the same steps give 1.64 nA), so the precharge here is 0 V.
    const p = processWith({
      arrayVoltage: 2.5,
      wordlineHighVoltage: 2.5,
      accessThresholdVoltage: 0.5,
      bodyEffectCoefficient: 0,
      prechargeVoltage: 0,
    });
    const stored = storedHighLevel(p).level; // VDD − Vt = 2.0 V, word-line limited.
    expect(stored).toBeCloseTo(2, 9);
    const ratio = chargeTransferRatio(38e-15, 454e-15);
    // Weakest 1 that still moves the bit line by 28 mV: the signal is linear in the cell voltage.
    const weakest = 28e-3 / chargeSharingSignal(1, p.prechargeVoltage, ratio);
    expect(chargeSharingSignal(weakest, p.prechargeVoltage, ratio)).toBeCloseTo(28e-3, 12);
    // retentionTime(Cs, ΔV, 1 A) is the charge Cs·ΔV that may leak; spread over 9 µs it is the current.
    const tolerable = retentionTime(38e-15, stored - weakest, 1) / 9e-6;
    expect(Math.abs(tolerable / 1e-9 - 6.9)).toBeLessThan(0.05);
  });
});

describe('two-tailed k for the offset budget (published normal table)', () => {
  // Source: M. Abramowitz, I. A. Stegun, Handbook of Mathematical Functions, 1964, Table 26.1, P(z) at
  // z = 1.96, 2, 2.58 to 15 digits, as transcribed in the J software's normal-distribution tests
  // (github.com/jsoftware/stats_distribs, test_normal.ijs, "from Handbook of Mathematical Functions by
  // Abramowitz and Stegun, Table 26.1"; read for this check). Both tails count: one failure allowed among
  // N = 1/(2·(1 − P(z))) sense amplifiers must give k = z.
  it.each([
    [1.96, 0.97500210485178],
    [2, 0.977249868051821],
    [2.58, 0.99505998424223],
  ])('k = %f for one failure in 1/(2·(1 − %f)) amplifiers', (z, p) => {
    const tail = 1 - p;
    expect(Math.abs(normalUpperTail(z) / tail - 1)).toBeLessThan(1e-10);
    expect(offsetSigmaMultiplier(1 / (2 * tail), 1)).toBeCloseTo(z, 8);
  });
});

describe('restore: first-order RC charging (published table)', () => {
  // Source: US Army technical manual on electricity fundamentals, as published on armymunitions.tpub.com
  // (Mm07047, page Mm070470022): after 1, 2, 3, 4, 5 time constants a capacitor holds 63.2, 86.5, 95.1, 98.2,
  // 99.3 % of the applied voltage (published; read). The manual builds each row from the rounded 63.2 %, so
  // its 95.1 % is 1 − e⁻³ = 95.02 %: allow 0.1 percentage point.
  it.each([
    [1, 0.632],
    [2, 0.865],
    [3, 0.951],
    [4, 0.982],
    [5, 0.993],
  ])('after %i τ the cell is at %f of the level', (n, share) => {
    expect(Math.abs(developedShare(n, 1) - share)).toBeLessThan(0.001);
  });

  it('95 % of the level takes −ln 0.05 = 2.996 τ', () => {
    // Source: curioustab.com, "capacitor RC charging 95 percent, how many time constants": "t / tau =
    // -ln(0.05) ≈ 2.996 … about 3 time constants" (published; read). Our restore time with R·Cs = 1 s.
    expect(restoreTime(1, 1, 0.95)).toBeCloseTo(2.996, 3);
    expect(restoreTime(6e3, 20e-15, 0.95) / (6e3 * 20e-15)).toBeCloseTo(2.996, 3);
  });
});

describe('retention scaling with temperature: Arrhenius acceleration (published tables)', () => {
  // These check our Arrhenius scaling of leakage (and so of retention) against published acceleration factors
  // of IC reliability work; they do not check a DRAM activation energy, which stays a process input.
  const kelvin = (celsius: number) => celsius + 273.15;

  it.each([
    [150, 258],
    [135, 128],
    [125, 77],
    [85, 8],
  ])(
    'Ea 0.7 eV: leakage at %i °C is %i times that at 55 °C, and retention that many times shorter',
    (hot, factor) => {
      // Source: Analog Devices, "Details of reliability calculations" (analog.com/jp/support/quality-and-
      // reliability/reliability/wafer-fabrication-data/details-of-reliability-calculations.html, read in Japanese):
      // Arrhenius acceleration from the test temperature to 55 °C use with Ea = 0.7 eV: 150 °C → 258,
      // 135 °C → 128, 125 °C → 77, 85 °C → 8 (published; read). The table prints whole numbers (77 for 77.6,
      // 258 for 259.2 with k = 8.617e-5 eV/K and 273.15 K): allow 1.5 % or 0.5.
      const ratio = leakageAtTemperature(1, kelvin(55), 0.7 * ELECTRON_CHARGE, kelvin(hot));
      expect(Math.abs(ratio - factor)).toBeLessThan(Math.max(0.5, 0.015 * factor));
      // Constant-current retention of one cell at both temperatures (25 fF, 0.3 V, 1 fA at 55 °C).
      const cool = retentionTime(25e-15, 0.3, 1e-15);
      const warm = retentionTime(25e-15, 0.3, 1e-15 * ratio);
      expect(cool / warm).toBeCloseTo(ratio, 9);
    },
  );

  it('Ea 1.2 eV from 60 °C to 100 °C accelerates by 88.2957', () => {
    // Source: the "reliability" Python library's documented example of acceleration_factor (Physics of
    // Failure; its docs at reliability.readthedocs.io, copied in github.com/Shakeman/reliability,
    // reliability/example.py): "acceleration_factor(T_use=60, T_acc=100, Ea=1.2) … Acceleration Factor:
    // 88.29574588463338" (published; read). Both use k/q = 8.617333262e-5 eV/K, so the match is to 1e-9.
    const ratio = leakageAtTemperature(1, kelvin(60), 1.2 * ELECTRON_CHARGE, kelvin(100));
    expect(Math.abs(ratio / 88.29574588463338 - 1)).toBeLessThan(1e-9);
  });
});
