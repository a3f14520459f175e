import type { BlockTable } from '../../geometry/blockTable';
import { backToBackAfterEdit, backToBackStrips, type BackToBackState } from './backToBackStrips';
import {
  decoderReach,
  decoderReachAfterEdit,
  decoderReachFindings,
  matIndexByPosition,
  type DecoderReachState,
} from './decoderReach';
import type { MatTable } from './matTable';
import { ComponentsOnDemand, type LayoutEdit } from './reachComponents';
import type { Finding } from './report';
import { ServingForest } from './servingForest';

/**
 * What the layout checks leave with a report (see reportState.ts): the components the decoders reach
 * through and the back-to-back pairs, so that an edit of a few blocks checks again only around them.
 */
export interface LayoutState {
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
export function layoutState(table: BlockTable, mats: MatTable, matIndexAt?: Int32Array): LayoutState {
  const forest = ServingForest.of(mats, table);
  const reach = decoderReach(table, mats, matIndexAt ?? matIndexByPosition(mats, table.count), forest);
  const backToBack = backToBackStrips(table, mats, forest.facing);
  return { reach, backToBack, findings: findingsOf(mats, reach, backToBack) };
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

function findingsOf(mats: MatTable, reach: DecoderReachState, backToBack: BackToBackState): Finding[] {
  if (mats.count === 0) return [];
  return [...decoderReachFindings(reach), ...backToBack.findings];
}

/**
 * The layout checks after an edit in place (same blocks in the same order), from the state the report
 * before it left: `before` is that report's mat table, `table` and `mats` the edited design's, `near` the
 * table positions within the abutment tolerance of a block of the edited design. Equals
 * {@link layoutState} of the edited design (tested against it on random edit chains).
 */
export function layoutStateAfterEdit(
  previous: LayoutState,
  before: MatTable,
  table: BlockTable,
  mats: MatTable,
  edit: LayoutEdit,
  near: (i: number) => readonly number[],
): LayoutState {
  const reach = decoderReachAfterEdit(previous.reach, before, table, mats, edit);
  // Strips whose place or served mats changed: the changed blocks and what the redone mats listed or list.
  const dirty = new Set<number>(edit.changed);
  for (const k of edit.redone) {
    for (const m of [before, mats]) {
      const to = m.servingOffsets[3 * k + 2] as number;
      for (let p = m.servingOffsets[3 * k] as number; p < to; p++) dirty.add(m.servingPositions[p] as number);
    }
  }
  const servedIn = (part: number) => reach.results.find((r) => r.reach.part === part)?.reach.served;
  const served0 = servedIn(0);
  const served1 = servedIn(1);
  const backToBack =
    served0 && served1
      ? backToBackAfterEdit(previous.backToBack, table, mats, dirty, [served0, served1], near)
      : backToBackStrips(table, mats);
  const same =
    backToBack.findings === previous.backToBack.findings &&
    reach.results.every((r, n) => r.finding === previous.reach.results[n]?.finding);
  return { reach, backToBack, findings: same ? previous.findings : findingsOf(mats, reach, backToBack) };
}
