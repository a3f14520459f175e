import type { BlockRuns } from '../../geometry/blockRuns';
import type { BlockTable } from '../../geometry/blockTable';
import { backToBackStrips, type BackToBackState } from './backToBackStrips';
import { decoderReach, decoderReachFindings, type DecoderReachState } from './decoderReach';
import type { MatTable } from './matTable';
import { ComponentsOnDemand } from './reachComponents';
import type { Finding } from './report';
import { ServingForest } from './servingForest';

/**
 * What the layout checks leave with a report (see reportState.ts): the components the decoders reach
 * through and the back-to-back pairs, so that an edit of a few blocks checks again only around them.
 */
export interface LayoutState {
  /** For each table position, the index of its mat in the report, or −1 (see matIndexByPosition). */
  readonly matIndexAt: Int32Array;
  readonly reach: DecoderReachState;
  readonly backToBack: BackToBackState;
  readonly findings: readonly Finding[];
}

/**
 * Checks of how the blocks are laid out around the mats, beyond each mat's own edges: whether the decoders
 * reach the mats through their strips, and whether two strips of a kind sit back to back.
 */
export function layoutFindings(table: BlockTable, mats: MatTable): Finding[] {
  return [...layoutState(table, mats).findings];
}

/** The layout checks of the whole design, with what they leave for the next edit. */
export function layoutState(
  table: BlockTable,
  mats: MatTable,
  matIndexAt?: Int32Array,
  /** The table's runs by block type with the margin ABUTMENT_TOLERANCE (evaluate's neighbours cut them). */
  runs: BlockRuns | null = null,
): LayoutState {
  // The serving forest's pass over the mats writes each position's mat index when the caller has none.
  const index = matIndexAt ?? new Int32Array(table.count).fill(-1);
  const forest = ServingForest.of(mats, table, matIndexAt ? undefined : index, runs);
  const reach = decoderReach(table, mats, index, forest, runs);
  const backToBack = backToBackStrips(table, mats, forest.facing, runs);
  return { matIndexAt: index, reach, backToBack, findings: findingsOf(mats, reach, backToBack) };
}

/**
 * Labels the components an edit starts from where the checks left them to be labelled on first use
 * (see ComponentsOnDemand), so that the first edit after a whole evaluation does not pay for it: the app
 * calls this in idle time. Returns true when anything was left to label.
 */
export function labelForEdits(layout: LayoutState): boolean {
  let labelled = false;
  for (const r of layout.reach.results) {
    if (!(r.reach instanceof ComponentsOnDemand) || r.reach.isLabelled) continue;
    r.reach.labelNow();
    labelled = true;
  }
  return labelled;
}

export function findingsOf(mats: MatTable, reach: DecoderReachState, backToBack: BackToBackState): Finding[] {
  if (mats.count === 0) return [];
  return [...decoderReachFindings(reach), ...backToBack.findings];
}
