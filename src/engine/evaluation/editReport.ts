import { placedDesignAfterEdit } from '../../geometry/placedIndex';
import type { Design } from '../../model/design';
import { preparePreview, previewReport } from './preview';
import type { Report } from './report';

/**
 * The report of `next`, an edit of `previous` that replaced the blocks at the `changed` design positions
 * by new versions of themselves (same ids; see model/designEdit.ts): a commit takes the live preview's
 * path, so only the changed blocks and the mats beside their old and new places are evaluated again,
 * starting from the table and overlaps the previous report left behind. Equals evaluate(next) (tested).
 */
export function editReport(
  previous: Design,
  previousReport: Report,
  next: Design,
  changed: readonly number[],
): Report {
  const ids: string[] = [];
  const blocks = [];
  for (const i of changed) {
    const before = previous.blocks[i];
    const after = next.blocks[i];
    if (!before || !after || before.id !== after.id) throw new Error(`position ${i} is not an edit in place`);
    ids.push(before.id);
    blocks.push(after);
  }
  // The canvas and the next edit read the new design's placement: update it from the previous one now.
  placedDesignAfterEdit(previous, next, changed);
  return previewReport(preparePreview(previous, previousReport, ids), blocks, next.blocks);
}
