import type { BlockTable } from '../../geometry/blockTable';
import { labelForEdits, type LayoutState } from './layoutFindings';
import type { PositionedOverlap } from './overlaps';
import type { Report } from './report';

/**
 * What evaluating a design left behind besides its report: the laid-out block table and the overlapping
 * pairs with their positions. An edit of a few blocks starts from these (see editReport.ts) instead of
 * laying out, pairing and checking the whole design again. Kept beside the report, for as long as it lives.
 */
export interface ReportState {
  readonly table: BlockTable;
  readonly overlaps: readonly PositionedOverlap[];
  /** For each table position, the index of its mat in the report, or −1. */
  readonly matIndexAt: Int32Array;
  /** What the layout checks found, to check again only around the next edit. */
  readonly layout: LayoutState;
}

const states = new WeakMap<Report, ReportState>();

export function rememberReportState(report: Report, state: ReportState): void {
  states.set(report, state);
}

export function reportState(report: Report): ReportState | undefined {
  return states.get(report);
}

/**
 * Builds now what an edit of `report`'s design starts from and a whole evaluation leaves to first use
 * (the components the decoders reach through): idle-time work, so the first edit stays quick. Returns
 * true when anything was left to build.
 */
export function prepareForEdits(report: Report): boolean {
  const state = states.get(report);
  return state ? labelForEdits(state.layout) : false;
}
