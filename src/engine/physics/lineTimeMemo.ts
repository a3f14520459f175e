import { farEndTimeShare, lineModes, type LineModes } from './rcLine';
import type { WordlineTiming } from './wordline';

/** Ratios kept before the memo starts over (a sweep has a few hundred: cells × processes × word-line lengths). */
const MAX_RATIOS = 4096;
/** Whole word-line timings kept, the most recent ones (a sweep's neighbouring points cycle through a few). */
const RECENT_TIMINGS = 8;
/** Inputs of wordlineTiming(): Rd, Rw, Cw, high, turn-on and off levels. */
const TIMING_INPUTS = 6;

interface KnownLine {
  readonly modes: LineModes;
  /** fraction → s = t/(R·C) */
  readonly shares: Map<number, number>;
}

/**
 * Far-end times of driven distributed RC lines, kept by the source-to-line resistance ratio Rd/R and the
 * fraction of the step. The dimensionless time s = t/(R·C) depends on nothing else (rcLine.ts), so every
 * line with the same ratio — every mat of one cell, process and word-line length in a sweep, whatever its
 * bit-line length — shares one root find; the result is the very same number farEndTimeShare() gives.
 * Keys are exact numbers: a ratio that differs in the last bit is another line.
 *
 * It also keeps the last few whole word-line timings with their inputs: neighbouring points of a sweep
 * (cells per word line vary fastest) ask for the same line again and again.
 */
export class LineTimeMemo {
  private readonly lines = new Map<number, KnownLine>();
  private readonly recentInputs = new Float64Array(RECENT_TIMINGS * TIMING_INPUTS);
  private readonly recentTimings: (WordlineTiming | undefined)[] = new Array(RECENT_TIMINGS);
  private nextSlot = 0;

  /** The timing kept for exactly these inputs (Object.is for each), if any. */
  recentTiming(inputs: readonly number[]): WordlineTiming | undefined {
    for (let slot = 0; slot < RECENT_TIMINGS; slot++) {
      const timing = this.recentTimings[slot];
      if (!timing) continue;
      let same = true;
      for (let i = 0; i < TIMING_INPUTS && same; i++)
        same = Object.is(this.recentInputs[slot * TIMING_INPUTS + i], inputs[i]);
      if (same) return timing;
    }
    return undefined;
  }

  /** Keeps a timing with its inputs, in place of the oldest one kept. */
  keepTiming(inputs: readonly number[], timing: WordlineTiming): void {
    const slot = this.nextSlot;
    for (let i = 0; i < TIMING_INPUTS; i++) this.recentInputs[slot * TIMING_INPUTS + i] = inputs[i] as number;
    this.recentTimings[slot] = timing;
    this.nextSlot = (slot + 1) % RECENT_TIMINGS;
  }

  /** s at which the far end of a line with ratio Rd/R reaches `fraction` (0 < fraction < 1). */
  timeShare(ratio: number, fraction: number): number {
    let line = this.lines.get(ratio);
    if (!line) {
      if (this.lines.size >= MAX_RATIOS) this.lines.clear();
      line = { modes: lineModes(ratio), shares: new Map() };
      this.lines.set(ratio, line);
    }
    let share = line.shares.get(fraction);
    if (share === undefined) {
      share = farEndTimeShare(line.modes, fraction);
      line.shares.set(fraction, share);
    }
    return share;
  }
}
