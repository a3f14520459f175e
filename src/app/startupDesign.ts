import { blankDesign, generatedDemoGrid } from '../designs/demoDesign';
import type { Design } from '../model/design';

export { blankDesign };

/** Largest generated grid along one side: 256 × 256 mats is about 200,000 blocks with their strips. */
const MAX_GENERATED_SIDE = 256;

/**
 * A design chosen by the page address, for trying the editor at scale and for tests:
 * `?blank` starts empty; `?generate=64x64` tiles 64 rows × 64 columns of the demo's mats with their
 * strips (4,096 mats). Returns null for any other address (the app then opens the demo).
 */
export function designFromQuery(search: string): Design | null {
  const params = new URLSearchParams(search);
  if (params.has('blank')) return blankDesign();
  const generate = params.get('generate');
  if (!generate) return null;
  const match = /^(\d{1,3})x(\d{1,3})$/.exec(generate);
  if (!match) return null;
  const rows = Number(match[1]);
  const columns = Number(match[2]);
  if (rows < 1 || columns < 1 || rows > MAX_GENERATED_SIDE || columns > MAX_GENERATED_SIDE) return null;
  return generatedDemoGrid(rows, columns);
}
