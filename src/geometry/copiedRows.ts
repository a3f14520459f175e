import { ScratchBuffer } from './scratchBuffer';

/*
 * How runRows.ts writes a run's neighbour rows from its model run's (the first run of its kind) without
 * reading a neighbour per neighbour. Every neighbour of a run lies in one of its partner runs (the runs
 * across the walks that took it), and a run's k-th partner run lies a fixed number of blocks from its
 * model's k-th: the run's rows are the model's with that shift added to every neighbour in partner k.
 * The model's rows come in stretches of one length whose entries lie in the same partner runs place by
 * place and step by the same amount from row to row (the rows of a tiled array: the mat above, the one
 * below, the strip left, the one right, each one block further along than the row before's). So each
 * place of a stretch is one strided loop that writes a value and steps it, and each stretch's row ends
 * one loop likewise: in the interpreter, one typed-array store per neighbour and per row, where adding
 * the shift to a copy would read each one as well.
 */

/** Reused between calls (see ScratchBuffer); none of these leave this module. */
const SCRATCH = { slots: new ScratchBuffer() };

/**
 * The model's rows (blocks `first` … `last − 1`, whose rows end at `end[i]`, the first beginning where the
 * row before `first` ends, or at 0) as stretches: the number of neighbours of all its rows, then for each
 * stretch its first and end block (less `first`), where it begins in `list` (less where the model's rows
 * begin), its row length L, and for each of its L places the partner (0 … partners − 1; partner k spans
 * blocks `partnerFrom[k]` … `partnerTo[k] − 1`) and the step from row to row.
 */
export function rowPattern(
  list: Int32Array,
  end: Int32Array,
  first: number,
  last: number,
  partnerFrom: Int32Array,
  partnerTo: Int32Array,
  partners: number,
): Int32Array {
  const base = first > 0 ? (end[first - 1] as number) : 0;
  const length = (end[last - 1] as number) - base;
  const slots = SCRATCH.slots.take(length);
  partnerSlots(list, base, length, partnerFrom, partnerTo, partners, slots);
  const pattern: number[] = [length];
  let b = first;
  while (b < last) {
    const from = (b > 0 ? (end[b - 1] as number) : 0) - base;
    const width = (end[b] as number) - base - from;
    // The next rows join while they have the first row's length and partners, each place stepping
    // from row to row as it does from the first row to the second.
    let c = b + 1;
    while (c < last && (end[c] as number) - (end[c - 1] as number) === width) {
      const at = (end[c - 1] as number) - base;
      let same = true;
      for (let t = 0; t < width && same; t++)
        same =
          slots[at + t] === slots[from + t] &&
          (list[base + at + t] as number) - (list[base + at - width + t] as number) ===
            (list[base + from + width + t] as number) - (list[base + from + t] as number);
      if (!same) break;
      c++;
    }
    pattern.push(b - first, c - first, from, width);
    for (let t = 0; t < width; t++) {
      const step =
        c > b + 1 ? (list[base + from + width + t] as number) - (list[base + from + t] as number) : 0;
      pattern.push(slots[from + t] as number, step);
    }
    b = c;
  }
  return Int32Array.from(pattern);
}

/** The partner (0 … partners − 1) of each neighbour `list[base + e]`, e < length, into `slots[e]`. */
function partnerSlots(
  list: Int32Array,
  base: number,
  length: number,
  partnerFrom: Int32Array,
  partnerTo: Int32Array,
  partners: number,
  slots: Int32Array,
): void {
  for (let e = 0; e < length; e++) {
    const j = list[base + e] as number;
    let k = 0;
    while (k < partners && !((partnerFrom[k] as number) <= j && j < (partnerTo[k] as number))) k++;
    slots[e] = k;
  }
}

/**
 * The rows of a run laid out as its model's (`pattern`, from rowPattern; the model's rows begin at
 * `from`) for blocks from `first` on, its rows beginning at `at`: their ends into `end`, their
 * neighbours into `list`, each the model's shifted by `shifts[k]` for partner k. Returns where its rows
 * end.
 */
export function copyRows(
  list: Int32Array,
  end: Int32Array,
  pattern: Int32Array,
  shifts: Int32Array,
  from: number,
  at: number,
  first: number,
): number {
  let s = 1;
  while (s < pattern.length) {
    const blocksFrom = first + (pattern[s] as number);
    const blocksTo = first + (pattern[s + 1] as number);
    const offset = pattern[s + 2] as number;
    const width = pattern[s + 3] as number;
    stepped(end, blocksFrom, blocksTo, 1, at + offset + width, width);
    const stop = at + offset + (blocksTo - blocksFrom) * width;
    for (let t = 0; t < width; t++) {
      const value =
        (list[from + offset + t] as number) + (shifts[pattern[s + 4 + 2 * t] as number] as number);
      stepped(list, at + offset + t, stop, width, value, pattern[s + 5 + 2 * t] as number);
    }
    s += 4 + 2 * width;
  }
  return at + (pattern[0] as number);
}

/**
 * `value`, `value + step`, … into `into[from]`, `into[from + stride]`, … below `to`, two per step (fewer
 * of the loop's own bytecodes in the interpreter; the last step may have one only, tested in the loop so
 * that no store lies outside it).
 */
function stepped(
  into: Int32Array,
  from: number,
  to: number,
  stride: number,
  value: number,
  step: number,
): void {
  let v = value;
  for (let p = from; p < to; p += 2 * stride) {
    into[p] = v;
    if (p + stride < to) into[p + stride] = v + step;
    v += 2 * step;
  }
}
