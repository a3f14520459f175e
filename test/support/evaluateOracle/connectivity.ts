import { abutmentSpan, type Side } from '../../../src/geometry/abutment';
import {
  kindAt,
  ROW_DECODER_CODE,
  SENSE_AMP_STRIP_CODE,
  WORDLINE_DRIVER_STRIP_CODE,
  type BlockTable,
} from '../../../src/geometry/blockTable';
import { uncoveredLineCount } from '../../../src/geometry/interval';
import type { NeighbourTable } from '../../../src/geometry/neighbourRows';
import { ABUTMENT_TOLERANCE } from '../../../src/geometry/rect';
import { bitlineEndSides, wordlineEndSides } from '../../../src/geometry/stripFit';
import {
  pairsAcrossStrips,
  unpartneredBitlines,
  unsensedOpenBitlines,
} from '../../../src/engine/evaluation/openBitline';
import type { OracleMatTableBuilder as MatTableBuilder } from './matTableBuilder';

/** Which strips serve a mat, found from geometry alone. */
export interface MatConnections {
  /** Bit lines whose position no sense-amplifier strip covers at either end. */
  unsensedBitlines: number;
  /** Word lines whose position no driver covers at either end. */
  undrivenWordlines: number;
  /** Bit-line ends (0, 1 or 2) that have a sense-amplifier strip. */
  senseAmpEnds: number;
  /** Open bit lines with no partner mat beyond their strip (see openBitline.ts); 0 for other cells. */
  unpartneredBitlines: number;
}

/** A connections record to fill; one per evaluation is enough, since each mat's is read at once. */
export function emptyConnections(): MatConnections {
  return { unsensedBitlines: 0, undrivenWordlines: 0, senseAmpEnds: 0, unpartneredBitlines: 0 };
}

/**
 * Sense-amplifier strips touching a mat's bit-line ends, kept flat so that evaluating a die allocates
 * nothing per contact: contact k is strip `strip[k]` on side `side[k]`, covering `span[2k]` … `span[2k + 1]`
 * of the edge (m, from the side's start).
 */
export interface SenseAmpContacts {
  count: number;
  readonly strip: Int32Array;
  readonly side: Side[];
  readonly span: Float64Array;
}

/** A mat edge rarely meets more strips than this; the scratch buffers grow when one does. */
const INITIAL_CONTACTS = 16;
let contacts: SenseAmpContacts = newContacts(INITIAL_CONTACTS);
let driven = new Float64Array(2 * INITIAL_CONTACTS);
let senseAmpStrips: Int32Array = new Int32Array(INITIAL_CONTACTS);
let driverStrips: Int32Array = new Int32Array(INITIAL_CONTACTS);

function newContacts(capacity: number): SenseAmpContacts {
  return {
    count: 0,
    strip: new Int32Array(capacity),
    side: new Array<Side>(capacity).fill('top'),
    span: new Float64Array(2 * capacity),
  };
}

function growContacts(): void {
  const bigger = newContacts(2 * contacts.strip.length);
  bigger.strip.set(contacts.strip);
  bigger.span.set(contacts.span);
  contacts.side.forEach((s, k) => (bigger.side[k] = s));
  bigger.count = contacts.count;
  contacts = bigger;
}

/**
 * Finds the strips abutting a mat's line ends and counts the lines they leave unserved. A line counts
 * as served when a suitable strip covers its position at either end: with strips at both ends the
 * sense amplifiers (or drivers) are taken as interleaved, half at each end; with one end covered,
 * all of them sit there. Sense-amplifier strips sense; sub-word-line driver strips and row decoders
 * (driving a small mat directly) drive. Common practice (no source).
 *
 * @param at the mat's position in the table and in the neighbour table.
 * @param serving where to record the ids of the serving strips, as mat `k` of a report.
 * @param into the record to fill and return (a die's evaluation reuses one rather than making one per mat).
 */
export function matConnections(
  table: BlockTable,
  at: number,
  neighbours: NeighbourTable,
  serving: MatTableBuilder,
  k: number,
  into: MatConnections = emptyConnections(),
  /**
   * pairsAcrossStrips of the mat's cell, when the caller reads it once per kind: cells of different
   * designs may differ in shape, and reading them per mat throws a compiled loop away.
   */
  openCell?: boolean,
): MatConnections {
  const kind = kindAt(table, at);
  const axis = kind.block.bitlineAxis;
  const bitlineEnds = bitlineEndSides(axis);
  const wordlineEnds = wordlineEndSides(axis);
  // Serving strips gather in scratch lists (sense amplifiers first in the report, whatever order they
  // are found in); counts say what is in use.
  let senseAmpCount = 0;
  let driverCount = 0;
  contacts.count = 0;
  let drivenCount = 0;
  let top = false;
  let bottom = false;
  const { list } = neighbours;
  const end = neighbours.end[at] as number;
  for (let k = neighbours.start[at] as number; k < end; k++) {
    const i = list[k] as number;
    const type = table.type[i] as number;
    if (type === SENSE_AMP_STRIP_CODE) {
      for (let e = 0; e < 2; e++) {
        const side = bitlineEnds[e] as Side;
        if (contacts.count === contacts.strip.length) growContacts();
        if (!abutmentSpan(table, at, i, side, contacts.span, 2 * contacts.count)) continue;
        contacts.strip[contacts.count] = i;
        contacts.side[contacts.count] = side;
        contacts.count++;
        if (e === 0) top = true;
        else bottom = true;
        if (senseAmpCount === senseAmpStrips.length) senseAmpStrips = grown(senseAmpStrips);
        senseAmpStrips[senseAmpCount++] = i;
      }
    } else if (type === WORDLINE_DRIVER_STRIP_CODE || type === ROW_DECODER_CODE) {
      for (let e = 0; e < 2; e++) {
        const side = wordlineEnds[e] as Side;
        if (2 * drivenCount === driven.length) {
          const bigger = new Float64Array(2 * driven.length);
          bigger.set(driven);
          driven = bigger;
        }
        if (!abutmentSpan(table, at, i, side, driven, 2 * drivenCount)) continue;
        drivenCount++;
        if (driverCount === driverStrips.length) driverStrips = grown(driverStrips);
        driverStrips[driverCount++] = i;
      }
    }
  }
  const g = kind.geometry;
  const senseAmpEnds = (top ? 1 : 0) + (bottom ? 1 : 0);
  // Open bit lines are counted from the contacts before the coverage count below reorders their spans.
  const open = openCell ?? pairsAcrossStrips(kind.cell);
  const unpartnered = unpartneredBitlines(table, at, contacts, neighbours, open);
  serving.setServing(k, senseAmpStrips, senseAmpCount, driverStrips, driverCount);
  // Open bit lines go half to each edge; other lines are served by a strip at either end.
  into.unsensedBitlines = open
    ? unsensedOpenBitlines(contacts, bitlineEnds, g.wordlineLength, g.bitlinePitch, g.bitlineCount)
    : uncoveredLineCount(
        contacts.span,
        contacts.count,
        g.wordlineLength,
        ABUTMENT_TOLERANCE,
        g.bitlinePitch,
        g.bitlineCount,
      );
  into.undrivenWordlines = uncoveredLineCount(
    driven,
    drivenCount,
    g.bitlineLength,
    ABUTMENT_TOLERANCE,
    g.wordlinePitch,
    g.wordlineCount,
  );
  into.senseAmpEnds = senseAmpEnds;
  into.unpartneredBitlines = unpartnered;
  return into;
}

/** A copy of a scratch list with twice the room. */
function grown(list: Int32Array): Int32Array {
  const bigger = new Int32Array(2 * list.length);
  bigger.set(list);
  return bigger;
}
