/**
 * Expected faults per mat (or per repair domain) from the three failure sources: random defects with kill
 * ratios, sense amplifiers whose offset exceeds the developed signal, and weak cells whose retention is
 * shorter than the refresh window. Plain numbers, SI units.
 */
import { normalUpperTail } from './normalTail';

/** Expected numbers of faulty cells, word lines (rows) and bit-line pairs (columns) in one region. */
export interface FaultCounts {
  /** Single faulty cells, each repairable by a spare row or a spare column. */
  readonly cells: number;
  /** Whole faulty word lines; only a spare row repairs one. */
  readonly rows: number;
  /** Whole faulty bit-line pairs (a column with its sense amplifier); only a spare column repairs one. */
  readonly columns: number;
}

/** Fraction of the defects landing in an array that kill one cell, one word line or one bit-line pair. */
export interface KillRatios {
  readonly singleCell: number;
  readonly wordLine: number;
  readonly bitLine: number;
}

export const NO_FAULTS: FaultCounts = { cells: 0, rows: 0, columns: 0 };

/**
 * Faults from random defects in an array region: defects fall at density D (per m²) over the region's area
 * A; a fraction k of them (the kill ratio, the critical-area share of each fault kind) makes a fault, so
 * λ = D·A·k for each kind. Poisson statistics; clustering is applied at die scale by the yield model.
 * Source: the critical-area / kill-ratio method of defect yield modelling (Stapper; W. Maly) [from memory].
 */
export function defectFaults(area: number, defectDensity: number, kill: KillRatios): FaultCounts {
  const defects = area * defectDensity;
  return {
    cells: defects * kill.singleCell,
    rows: defects * kill.wordLine,
    columns: defects * kill.bitLine,
  };
}

/**
 * Probability that a sense amplifier fails: its input offset, Gaussian with σ, exceeds the developed signal
 * ΔV in the direction that opposes the datum. Either sign of offset opposes one of the two data, so both
 * tails count: p = 2·Q(ΔV/σ). A failing sense amplifier loses its whole bit-line pair: a column fault.
 * Source: common practice (no source); two-tailed offset budget as in the reference shelf, entry 24.
 */
export function senseAmpFailureProbability(developedSignal: number, offsetSigma: number): number {
  if (!(offsetSigma > 0)) return developedSignal > 0 ? 0 : 1;
  if (!(developedSignal > 0)) return 1;
  return Math.min(1, 2 * normalUpperTail(developedSignal / offsetSigma));
}

/** Faults from the parametric sources of one region: failing sense amplifiers (columns) and weak cells. */
export function parametricFaults(
  senseAmps: number,
  senseAmpFailure: number,
  cells: number,
  weakCellFraction: number,
): FaultCounts {
  return { cells: cells * weakCellFraction, rows: 0, columns: senseAmps * senseAmpFailure };
}

export function addFaults(a: FaultCounts, b: FaultCounts): FaultCounts {
  return { cells: a.cells + b.cells, rows: a.rows + b.rows, columns: a.columns + b.columns };
}

export function scaleFaults(a: FaultCounts, factor: number): FaultCounts {
  return { cells: a.cells * factor, rows: a.rows * factor, columns: a.columns * factor };
}

/** Weak-cell tail of the retention distribution (two-population model). */
export interface RetentionTail {
  /** Share of the cells in the tail (ratio). */
  readonly fraction: number;
  /** Median leakage of a tail cell over the main population's (ratio ≥ 1). */
  readonly medianLeakageMultiplier: number;
  /** Spread σ of ln(leakage) within the tail. */
  readonly spread: number;
}

/**
 * Share of cells whose retention is shorter than the refresh window. Retention is inversely proportional
 * to leakage (constant-current droop t = C·ΔV/I), so a cell fails when its leakage exceeds the main
 * population's by more than r = t_typical / t_REFW. Main cells all fail when r < 1; tail cells, whose
 * leakage multiplier is log-normal with median M and spread σ, fail with probability Q((ln r − ln M)/σ).
 * Source: two-population retention model (T. Hamamoto, S. Sugiura, S. Sawada, "On the retention time
 * distribution of dynamic random access memory (DRAM)", IEEE Trans. Electron Devices 45(6), 1998) [from
 * memory]. Without a tail the answer is 0 or 1 (every cell is like the typical one).
 */
export function weakCellFraction(
  typicalRetention: number,
  refreshWindow: number,
  tail?: RetentionTail,
): number {
  if (!(refreshWindow > 0)) return 0;
  if (!(typicalRetention >= 0)) return 0;
  const ratio = typicalRetention / refreshWindow;
  // r < 1: every typical cell fails, and a tail cell (whose cause adds to the typical one) fails as well.
  // Deciding this before the tail also keeps ln 0 − ln 0 out of the tail's z when the typical retention
  // and the tail's leakage are both 0 (a mat with no margin to lose on a process of zero leakage).
  if (ratio < 1) return 1;
  if (!tail || !(tail.fraction > 0)) return 0;
  const tailFails =
    tail.spread > 0
      ? normalUpperTail((Math.log(ratio) - Math.log(tail.medianLeakageMultiplier)) / tail.spread)
      : tail.medianLeakageMultiplier > ratio
        ? 1
        : 0;
  return tail.fraction * tailFails;
}
