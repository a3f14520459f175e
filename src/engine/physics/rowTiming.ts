/**
 * The row timing chain of one mat, first order. Each step has its own function, formula and source;
 * rowTiming() adds them up the way an activate–precharge cycle runs:
 *   tRCD ≈ word line to turn-on + sense-fire wait + latch,
 *   tRAS ≈ max(tRCD, word line to 90 %) + restore,
 *   tRP  ≈ word line fall + equalise,
 *   tRC  = tRAS + tRP.
 * Common practice (no source) for the chain; JEDEC JESD79-4 defines tRCD, tRAS, tRP and tRC (published).
 */

/**
 * Time constant of charge sharing between a cell and its bit line (s): the access transistor charges the
 * series combination of Cs and Cbl, then the signal spreads along the distributed bit line; the Elmore
 * (first-moment) sum of the two:
 *   τ = R_access·Cs·Cbl/(Cs + Cbl) + R_bl·Cbl/2.
 * Source: W. C. Elmore, J. Appl. Phys. 19, 1948 (first-moment delay; published method); combining the two
 * stages: common practice (no source).
 */
export function developmentTimeConstant(
  accessResistance: number,
  storageCapacitance: number,
  bitlineResistance: number,
  bitlineCapacitance: number,
): number {
  const series = (storageCapacitance * bitlineCapacitance) / (storageCapacitance + bitlineCapacitance);
  return accessResistance * series + (bitlineResistance * bitlineCapacitance) / 2;
}

/** Share of the full charge-sharing signal developed after time t: 1 − e^(−t/τ) (single-pole). */
export function developedShare(time: number, timeConstant: number): number {
  if (timeConstant <= 0) return 1;
  return -Math.expm1(-Math.max(0, time) / timeConstant);
}

/**
 * Regeneration time of a cross-coupled latch: the pair difference grows as ΔV0·e^(t/τ) with τ = C/gm, so
 * reaching ΔV1 takes t = (C/gm)·ln(ΔV1/ΔV0). The bit lines hang on the latch nodes, so C = Cbl.
 * Source: latch regeneration, J. Rabaey, A. Chandrakasan, B. Nikolić, Digital Integrated Circuits, 2nd
 * ed., 2003, sense-amplifier section; B. Razavi, "The StrongARM Latch", IEEE SSC Magazine 7(2), 2015
 * (from memory).
 *
 * @returns t (s); NaN without a positive input difference (the latch does not resolve: the figure does
 *   not exist); 0 when the input already exceeds ΔV1.
 */
export function latchTime(
  nodeCapacitance: number,
  latchResistance: number,
  inputDifference: number,
  finalDifference: number,
): number {
  if (!(inputDifference > 0)) return Number.NaN;
  if (inputDifference >= finalDifference) return 0;
  // ln ΔV1 − ln ΔV0, not ln(ΔV1/ΔV0): a subnormal input (a precharge level of 1e-310 V leaves a signal
  // that small) would overflow the quotient to Infinity, while each logarithm stays finite (≥ −745).
  return nodeCapacitance * latchResistance * (Math.log(finalDifference) - Math.log(inputDifference));
}

/**
 * Restore (write-back) time: the latched bit line, at the full level, charges the cell through the access
 * transistor and the bit line; reaching a share f of the level takes t = R·Cs·ln(1/(1 − f)).
 * Source: RC charging (arithmetic); restore through the access device: Keeth & Baker, DRAM Circuit Design,
 * IEEE Press, 2001, ch. 2 (from memory).
 */
export function restoreTime(pathResistance: number, storageCapacitance: number, fraction: number): number {
  return -pathResistance * storageCapacitance * Math.log1p(-Math.min(fraction, 1 - 1e-12));
}

/**
 * Equalise time: the equaliser shorts a pair that the latch left a full swing apart; in the differential
 * mode each line sees half the equaliser resistance plus its own distributed resistance, so the pair
 * difference decays with τ = (R_eq + R_bl)·Cbl/2 and reaches the allowed residual after τ·ln(swing/residual).
 * Source: RC decay with Elmore's first moment for the line (arithmetic; Elmore 1948).
 */
export function equaliseTime(
  equaliserResistance: number,
  bitlineResistance: number,
  bitlineCapacitance: number,
  swing: number,
  residual: number,
): number {
  if (residual >= swing) return 0;
  return ((equaliserResistance + bitlineResistance) * bitlineCapacitance * Math.log(swing / residual)) / 2;
}

/** Every step of a mat's row cycle (s). */
export interface RowTiming {
  /** Word line far end to the access turn-on. */
  readonly wordlineOn: number;
  /** Wait from turn-on to sense-amplifier firing (operating input, or the gain-cell sense time). */
  readonly development: number;
  readonly latch: number;
  /** Word line far end to 90 % (a full 1 can be restored from then on). */
  readonly wordlineNinety: number;
  /** 0 for cells whose read does not destroy the data. */
  readonly restore: number;
  readonly wordlineFall: number;
  readonly equalise: number;
  readonly rcd: number;
  readonly ras: number;
  readonly rp: number;
  readonly rc: number;
}

/** Adds the steps into tRCD, tRAS, tRP and tRC (formulas in the module comment). */
export function rowTiming(steps: {
  wordlineOn: number;
  development: number;
  latch: number;
  wordlineNinety: number;
  restore: number;
  wordlineFall: number;
  equalise: number;
}): RowTiming {
  const rcd = existing(steps.wordlineOn + steps.development + steps.latch);
  const ras = existing(Math.max(rcd, steps.wordlineNinety) + steps.restore);
  const rp = existing(steps.wordlineFall + steps.equalise);
  // Written out field by field rather than spread: the explorer builds one per sweep point.
  return {
    wordlineOn: steps.wordlineOn,
    development: steps.development,
    latch: steps.latch,
    wordlineNinety: steps.wordlineNinety,
    restore: steps.restore,
    wordlineFall: steps.wordlineFall,
    equalise: steps.equalise,
    rcd,
    ras,
    rp,
    rc: existing(ras + rp),
  };
}

/**
 * A sum of steps that never ends (a step of ±Infinity) is a cycle that does not exist: NaN, shown as "—"
 * with its reason, never an infinite time in the totals. NaN passes through unchanged.
 */
function existing(time: number): number {
  return Number.isFinite(time) ? time : Number.NaN;
}
