import type { BlockTable } from '../../../src/geometry/blockTable';
import { backToBackStrips, type BackToBackState } from './backToBackStrips';
import {
  decoderReach,
  decoderReachFindings,
  matIndexByPosition,
  type DecoderReachState,
} from './decoderReach';
import type { MatTable } from '../../../src/engine/evaluation/matTable';
import type { Finding } from '../../../src/engine/evaluation/report';

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
  const reach = decoderReach(table, mats, matIndexAt ?? matIndexByPosition(mats, table.count));
  const backToBack = backToBackStrips(table, mats);
  return { reach, backToBack, findings: findingsOf(mats, reach, backToBack) };
}

function findingsOf(mats: MatTable, reach: DecoderReachState, backToBack: BackToBackState): Finding[] {
  if (mats.count === 0) return [];
  return [...decoderReachFindings(reach), ...backToBack.findings];
}
