import type { BlockTable } from '../../../src/geometry/blockTable';
import { backToBackStripFindings } from './backToBackStrips';
import { decoderReachFindings } from './decoderReach';
import type { MatTable } from '../../../src/engine/evaluation/matTable';
import type { Finding } from '../../../src/engine/evaluation/report';

/**
 * Checks of how the blocks are laid out around the mats, beyond each mat's own edges: whether the decoders
 * reach the mats through their strips, and whether two strips of a kind sit back to back.
 */
export function layoutFindings(table: BlockTable, mats: MatTable): Finding[] {
  if (mats.count === 0) return [];
  return [...decoderReachFindings(table, mats), ...backToBackStripFindings(table, mats)];
}
