import { SENSE_AMP_STRIP_CODE, WORDLINE_DRIVER_STRIP_CODE, type BlockTable } from '../../geometry/blockTable';
import { facingPairs, PairList } from './facingStrips';
import { mayFaceInRuns, StripRange } from './stripRanges';
import type { BlockRuns } from '../../geometry/blockRuns';
import { ALONG_HORIZONTAL_EDGE, ServingForest, UNSERVING } from './servingForest';
import { BLOCK_TYPE_LABEL } from '../../model/blockBasics';
import type { MatTable } from './matTable';
import type { Finding } from './report';

/** Pairs named in a finding's message; its block ids name them all. */
const NAMED_PAIRS = 3;

/**
 * Strips of one kind laid along each other's long side: a sense-amplifier strip against another
 * sense-amplifier strip, or a driver strip against another driver strip. Between two mats that is what
 * copying a mat with its own strips gives, and one strip shared by both mats serves the same lines in
 * half the area (the partition builder shares them). Strips meeting end to end are fine (two strips may
 * cover one mat edge between them). Common practice (no source).
 *
 * Found by sorting: each strip's far long edge is looked up among the near long edges of the others, so a
 * die of tens of thousands of strips is one native sort of numbers, not a comparison of every pair.
 */
export function backToBackStrips(
  table: BlockTable,
  mats: MatTable,
  /** Each block's orientation, when the caller has the serving forest already. */
  facing: Uint8Array = ServingForest.of(mats, table).facing,
  /** The table's runs by block type (geometry/blockRuns.ts), when the caller has them. */
  runs: BlockRuns | null = null,
): BackToBackState {
  const pairs = pairsInRanges(table, facing, runs) ?? pairsOfServingStrips(table, facing);
  return { facing, pairs, findings: pairFindings(table, pairs) };
}

/** The pairs per strip type, from one pass over the table (the general path). */
export function pairsOfServingStrips(table: BlockTable, facing: Uint8Array): Int32Array[] {
  const strips = ServingStrips.of(table, facing);
  return [
    pairsOfType(table, strips.senseAmps, strips.senseAmpsLying),
    pairsOfType(table, strips.drivers, strips.driversLying),
  ];
}

/**
 * The pairs per strip type when the table lists each type's serving strips as one stretch facing one way
 * (see stripRanges.ts), or null when it does not. With the table's runs, a stretch whose strips cannot
 * face is not searched.
 */
export function pairsInRanges(
  table: BlockTable,
  facing: Uint8Array,
  runs: BlockRuns | null,
): Int32Array[] | null {
  const senseAmps = StripRange.of(table.type, facing, SENSE_AMP_STRIP_CODE);
  const drivers = senseAmps && StripRange.of(table.type, facing, WORDLINE_DRIVER_STRIP_CODE);
  if (!senseAmps || !drivers) return null;
  return [pairsInRange(table, senseAmps, runs), pairsInRange(table, drivers, runs)];
}

function pairsInRange(table: BlockTable, range: StripRange, runs: BlockRuns | null): Int32Array {
  const lying = range.facing === ALONG_HORIZONTAL_EDGE;
  if (
    range.to < range.from ||
    (runs !== null && !mayFaceInRuns(runs, table.x, table.width, range.from, range.to, lying))
  )
    return new Int32Array(0);
  const strips = new Int32Array(range.to + 1 - range.from);
  for (let s = 0; s < strips.length; s++) strips[s] = range.from + s;
  return pairsOfType(table, strips, lying ? strips.length : 0);
}

/** Strip types checked, in the order of their findings. */
export const STRIP_CODES = [SENSE_AMP_STRIP_CODE, WORDLINE_DRIVER_STRIP_CODE] as const;

/** What the check leaves for the next edit: each strip's orientation and the pairs per strip type. */
export interface BackToBackState {
  readonly facing: Uint8Array;
  /** Per entry of {@link STRIP_CODES}: pairs as [first, second, …] table positions, in finding order. */
  readonly pairs: readonly Int32Array[];
  readonly findings: readonly Finding[];
}

export function pairFindings(table: BlockTable, pairsByType: readonly Int32Array[]): Finding[] {
  const findings: Finding[] = [];
  for (const pairs of pairsByType) {
    const count = pairs.length / 2;
    if (count === 0) continue;
    const blocks = table.blocks;
    const label = (i: number) => blocks[i]?.name || blocks[i]?.id || '';
    const named: string[] = [];
    for (let n = 0; n < Math.min(NAMED_PAIRS, count); n++)
      named.push(`${label(pairs[2 * n] as number)} and ${label(pairs[2 * n + 1] as number)}`);
    const ids = new Set<string>();
    for (let n = 0; n < pairs.length; n++) ids.add(blocks[pairs[n] as number]?.id ?? '');
    const kind = blocks[pairs[0] as number]?.type ?? 'senseAmpStrip';
    const counted = count === 1 ? '' : `${count} pairs: `;
    findings.push({
      kind: 'backToBackStrips',
      severity: 'warning',
      blockIds: [...ids],
      message:
        `${counted}${named.join('; ')}${count > NAMED_PAIRS ? '; …' : ''} are ${BLOCK_TYPE_LABEL[kind]}s back to back; ` +
        'one strip shared by the mats on both sides serves the same lines in less area',
    });
  }
  return findings;
}

/**
 * The serving strips of the two checked types, ascending, each split into those lying across and those
 * standing, found in one pass over the table. Per type, one array as long as the table holds the lying
 * strips from its start and the standing ones from its end (then reversed in place, natively).
 */
class ServingStrips {
  private constructor(
    readonly senseAmps: Int32Array,
    readonly senseAmpsLying: number,
    readonly drivers: Int32Array,
    readonly driversLying: number,
  ) {}

  static of(table: BlockTable, facing: Uint8Array): ServingStrips {
    const senseAmps = new Int32Array(table.count);
    const drivers = new Int32Array(table.count);
    const ends = Int32Array.of(0, table.count, 0, table.count);
    sortServingStrips(table.count, table.type, facing, senseAmps, drivers, ends);
    const senseAmpsLying = ends[0] as number;
    const senseAmpsStanding = ends[1] as number;
    const driversLying = ends[2] as number;
    const driversStanding = ends[3] as number;
    senseAmps.subarray(senseAmpsStanding).reverse();
    drivers.subarray(driversStanding).reverse();
    return new ServingStrips(
      packed(senseAmps, senseAmpsLying, senseAmpsStanding),
      senseAmpsLying,
      packed(drivers, driversLying, driversStanding),
      driversLying,
    );
  }
}

/**
 * The pass of {@link ServingStrips.of}: lying strips from the start of their type's array, standing ones
 * from its end, `ends` = [sense-amplifier strips lying, standing from, drivers lying, standing from]. V8
 * compiles the loop while it runs, and what is read before or after it has no type feedback then, so the
 * loop ends the function and everything it reads comes in as an argument.
 */
function sortServingStrips(
  count: number,
  type: Uint8Array,
  facing: Uint8Array,
  senseAmps: Int32Array,
  drivers: Int32Array,
  ends: Int32Array,
): void {
  let senseAmpsLying = 0;
  let senseAmpsStanding = count;
  let driversLying = 0;
  let driversStanding = count;
  for (let i = 0; i < count; i++) {
    const f = facing[i] as number;
    if (f === UNSERVING) continue;
    const t = type[i] as number;
    // Both types and the orientation are tested for every strip before branching: a test first met
    // after V8 compiled the loop (driver strips come after the sense amplifiers in a tiled table) would
    // have no type feedback and throw the compiled loop away.
    const senseAmp = t === SENSE_AMP_STRIP_CODE;
    const driver = t === WORDLINE_DRIVER_STRIP_CODE;
    const lying = f === ALONG_HORIZONTAL_EDGE;
    if (senseAmp) {
      if (lying) {
        senseAmps[senseAmpsLying++] = i;
        ends[0] = senseAmpsLying;
      } else {
        senseAmps[--senseAmpsStanding] = i;
        ends[1] = senseAmpsStanding;
      }
    } else if (driver) {
      if (lying) {
        drivers[driversLying++] = i;
        ends[2] = driversLying;
      } else {
        drivers[--driversStanding] = i;
        ends[3] = driversStanding;
      }
    }
  }
}

/** The lying strips `list[0 … lying)` followed by the standing ones `list[standing …)`, in one array. */
function packed(list: Int32Array, lying: number, standing: number): Int32Array {
  list.copyWithin(lying, standing);
  return list.subarray(0, lying + list.length - standing);
}

/**
 * Every back-to-back pair among one type's serving strips (`strips`: the first `lying` lie across, the
 * rest stand), the upper or left strip first, as [a, b, …]: lying pairs, then standing ones.
 */
function pairsOfType(table: BlockTable, strips: Int32Array, lying: number): Int32Array {
  const pairs = new PairList();
  facingPairs(strips.subarray(0, lying), table.y, table.height, table.x, table.width, pairs);
  facingPairs(strips.subarray(lying), table.x, table.width, table.y, table.height, pairs);
  return pairs.toArray();
}
