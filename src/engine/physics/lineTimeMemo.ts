import { farEndTimeShare, lineModes, type LineModes } from './rcLine';

/** Ratios kept before the memo starts over (a sweep has a few hundred: cells × processes × word-line lengths). */
const MAX_RATIOS = 4096;

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
 */
export class LineTimeMemo {
  private readonly lines = new Map<number, KnownLine>();

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
