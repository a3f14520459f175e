import { abutmentOnSide, type Side } from '../geometry/abutment';
import { linesInGaps, uncoveredParts, type Interval } from '../geometry/interval';
import type { NeighbourTable } from '../geometry/neighbourGrid';
import type { PlacedBlock, PlacedMat } from '../geometry/placedBlocks';
import { ABUTMENT_TOLERANCE } from '../geometry/rect';
import type { StripType } from '../model/block';

/** Which strips serve a mat, found from geometry alone. */
export interface MatConnections {
  /** Ids of sense-amplifier strips abutting the mat's bit-line ends. */
  readonly senseAmpStripIds: readonly string[];
  /** Ids of driver strips or row decoders abutting the mat's word-line ends. */
  readonly wordlineDriverIds: readonly string[];
  /** Bit lines whose position no sense-amplifier strip covers at either end. */
  readonly unsensedBitlines: number;
  /** Word lines whose position no driver covers at either end. */
  readonly undrivenWordlines: number;
  /** Sense-amplifier strips abutting each bit-line end, with the stretch of the edge they cover. */
  readonly senseAmpContacts: readonly SenseAmpContact[];
  /** Bit-line ends (0, 1 or 2) that have a sense-amplifier strip. */
  readonly senseAmpEnds: number;
}

/** A sense-amplifier strip touching one bit-line end of a mat. */
export interface SenseAmpContact {
  readonly side: Side;
  readonly stripIndex: number;
  /** Covered stretch, measured along the mat edge from its start (m). */
  readonly stretch: Interval;
}

/** Strips that can sense bit lines. */
const SENSING: ReadonlySet<StripType> = new Set(['senseAmpStrip']);
/** Strips that can drive word lines: sub-word-line drivers, or a row decoder driving a small mat directly. */
const DRIVING: ReadonlySet<StripType> = new Set(['wordlineDriverStrip', 'rowDecoder']);

/** The two sides where a mat's bit lines end, and the two where its word lines end. */
export function lineEndSides(mat: PlacedMat): { bitlineEnds: [Side, Side]; wordlineEnds: [Side, Side] } {
  return mat.block.bitlineAxis === 'vertical'
    ? { bitlineEnds: ['top', 'bottom'], wordlineEnds: ['left', 'right'] }
    : { bitlineEnds: ['left', 'right'], wordlineEnds: ['top', 'bottom'] };
}

/**
 * Finds the strips abutting a mat's line ends and counts the lines they leave unserved. A line counts
 * as served when a suitable strip covers its position at either end: with strips at both ends the
 * sense amplifiers (or drivers) are taken as interleaved, half at each end; with one end covered,
 * all of them sit there. Common practice (no source).
 */
export function matConnections(
  mat: PlacedMat,
  /** The mat's position in `placed` and in the neighbour table. */
  at: number,
  placed: readonly PlacedBlock[],
  neighbours: NeighbourTable,
): MatConnections {
  const { bitlineEnds, wordlineEnds } = lineEndSides(mat);
  const senseAmpStripIds: string[] = [];
  const wordlineDriverIds: string[] = [];
  const senseAmpContacts: SenseAmpContact[] = [];
  const drivenStretches: Interval[] = [];
  const { list } = neighbours;
  const end = neighbours.end[at] as number;
  for (let k = neighbours.start[at] as number; k < end; k++) {
    const i = list[k] as number;
    const other = placed[i];
    if (!other || other.block.type === 'mat') continue;
    const type = other.block.type;
    if (SENSING.has(type)) {
      for (const side of bitlineEnds) {
        const stretch = abutmentOnSide(mat.rect, other.rect, side);
        if (stretch) {
          senseAmpContacts.push({ side, stripIndex: i, stretch });
          senseAmpStripIds.push(other.block.id);
        }
      }
    }
    if (DRIVING.has(type)) {
      for (const side of wordlineEnds) {
        const stretch = abutmentOnSide(mat.rect, other.rect, side);
        if (stretch) {
          drivenStretches.push(stretch);
          wordlineDriverIds.push(other.block.id);
        }
      }
    }
  }
  const g = mat.geometry;
  const unsensedGaps = uncoveredParts(
    senseAmpContacts.map((c) => c.stretch),
    g.wordlineLength,
    ABUTMENT_TOLERANCE,
  );
  const undrivenGaps = uncoveredParts(drivenStretches, g.bitlineLength, ABUTMENT_TOLERANCE);
  return {
    senseAmpStripIds,
    wordlineDriverIds,
    unsensedBitlines: linesInGaps(unsensedGaps, g.bitlinePitch, g.bitlineCount),
    undrivenWordlines: linesInGaps(undrivenGaps, g.wordlinePitch, g.wordlineCount),
    senseAmpContacts,
    senseAmpEnds: new Set(senseAmpContacts.map((c) => c.side)).size,
  };
}
