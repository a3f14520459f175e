import type { Design } from '../model/design';

/** Largest design text we will read (bytes of UTF-16 text ≈ characters); a whole die fits easily. */
export const MAX_DESIGN_TEXT_LENGTH = 64 * 1024 * 1024;

/** Blocks serialised per piece: about 1 ms of JSON.stringify on a 2-core laptop (about 200 bytes each). */
export const BLOCKS_PER_PIECE = 2000;

/**
 * The design file's text in pieces whose concatenation is exactly `JSON.stringify(design)`: the header
 * and shelf first and last, the block list a few thousand blocks at a time. The saver pulls pieces in
 * idle time, so that writing a whole die (30 MB of text, about 150 ms in one call) never holds up an
 * edit; the pieces become one Blob without being joined into one string.
 */
export function* designTextPieces(design: Design, blocksPerPiece = BLOCKS_PER_PIECE): Generator<string> {
  // A marker no design can contain: a fresh random token in place of the block list.
  const marker = `blocks-${Math.random().toString(36).slice(2)}-${Date.now().toString(36)}`;
  const head = JSON.stringify({ ...design, blocks: marker });
  const at = head.indexOf(`"${marker}"`);
  yield head.slice(0, at);
  yield '[';
  const { blocks } = design;
  for (let start = 0; start < blocks.length; start += blocksPerPiece) {
    const list = JSON.stringify(blocks.slice(start, start + blocksPerPiece));
    yield (start === 0 ? '' : ',') + list.slice(1, -1);
  }
  yield ']';
  yield head.slice(at + marker.length + 2);
}

/**
 * About how many characters designTextPieces() writes, from the first pieceful of blocks scaled to all
 * blocks (the header and variant shelf not counted): a cheap look before a long export.
 */
export function designTextLengthEstimate(design: Design, sample = BLOCKS_PER_PIECE): number {
  const { blocks } = design;
  if (blocks.length === 0) return 0;
  const n = Math.min(blocks.length, sample);
  return Math.round((JSON.stringify(blocks.slice(0, n)).length / n) * blocks.length);
}
