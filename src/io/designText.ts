import type { Design, VariantDesign, VariantShelf } from '../model/design';

/** Largest design text we will read (bytes of UTF-16 text ≈ characters); a whole die fits easily. */
export const MAX_DESIGN_TEXT_LENGTH = 64 * 1024 * 1024;

/**
 * Largest design file read (bytes). A UTF-16 code unit takes at most 3 bytes of UTF-8, so every text of at
 * most MAX_DESIGN_TEXT_LENGTH characters fits; restore then holds the text to its character limit.
 */
export const MAX_DESIGN_FILE_BYTES = 3 * MAX_DESIGN_TEXT_LENGTH;

/** Blocks serialised per piece: about 1 ms of JSON.stringify on a 2-core laptop (about 200 bytes each). */
export const BLOCKS_PER_PIECE = 2000;

/**
 * The design file's text in pieces whose concatenation is exactly `JSON.stringify(design)`: the header
 * fields whole, every block list a few thousand blocks at a time — the active design's and each
 * inactive variant's on the shelf alike. The saver pulls pieces in idle time, so that writing a whole die
 * (30 MB of text, about 150 ms in one call) or a shelf of big variants never holds up an edit; the
 * pieces become one Blob without being joined into one string.
 */
export function* designTextPieces(
  design: Design | VariantDesign,
  blocksPerPiece = BLOCKS_PER_PIECE,
): Generator<string> {
  yield* spliced(design, {
    blocks: () => blockListPieces(design.blocks, blocksPerPiece),
    variants: () => shelfPieces((design as Design).variants as VariantShelf, blocksPerPiece),
  });
}

/** A block list as `[…]`, a few thousand blocks per piece. */
function* blockListPieces(blocks: Design['blocks'], blocksPerPiece: number): Generator<string> {
  yield '[';
  for (let start = 0; start < blocks.length; start += blocksPerPiece) {
    const list = JSON.stringify(blocks.slice(start, start + blocksPerPiece));
    yield (start === 0 ? '' : ',') + list.slice(1, -1);
  }
  yield ']';
}

/** The variant shelf, each stored design in pieces of its own. */
function* shelfPieces(shelf: VariantShelf, blocksPerPiece: number): Generator<string> {
  yield* spliced(shelf, {
    entries: function* () {
      yield '[';
      for (const [i, entry] of shelf.entries.entries()) {
        if (i > 0) yield ',';
        const stored = entry.design;
        yield* spliced(entry, {
          design: () => (stored === null ? ['null'] : designTextPieces(stored, blocksPerPiece)),
        });
      }
      yield ']';
    },
  });
}

/**
 * `JSON.stringify(value)` in pieces: the fields named in `parts` are written by their own piece makers,
 * in the place (and key order) JSON.stringify gives them; a field that is undefined is left out, as
 * JSON.stringify leaves it out. The other fields are written whole.
 */
function* spliced(value: object, parts: Record<string, () => Iterable<string>>): Generator<string> {
  // A marker no design can contain: a fresh random token in place of each field written in pieces.
  const marker = `piece-${Math.random().toString(36).slice(2)}-${Date.now().toString(36)}`;
  const replaced: Record<string, unknown> = { ...value };
  const fields = Object.entries(parts)
    .filter(([key]) => replaced[key] !== undefined)
    .map(([key, make]) => ({ key, make, token: `"${marker}-${key}"` }));
  for (const { key } of fields) replaced[key] = `${marker}-${key}`;
  const text = JSON.stringify(replaced);
  // Each field where JSON.stringify wrote it, in that order.
  const placed = fields.map((f) => ({ ...f, at: text.indexOf(f.token) })).sort((a, b) => a.at - b.at);
  let from = 0;
  for (const { at, token, make } of placed) {
    yield text.slice(from, at);
    yield* make();
    from = at + token.length;
  }
  yield text.slice(from);
}

/**
 * Blocks (on every variant together) up to which a design file is indented for people to read and diff;
 * above, it is written compact in pieces: indenting adds about half again (a 300,000-mat die is 57 MB
 * compact but 81 MB indented, past what restore reads), and one indented string of a whole die is the
 * kind of giant string the pieces avoid.
 */
export const INDENTED_FILE_BLOCKS = 50_000;

/** Every block of a design, its inactive variants' included. */
export function blockCountWithVariants(design: Design): number {
  let count = design.blocks.length;
  for (const entry of design.variants?.entries ?? []) count += entry.design?.blocks.length ?? 0;
  return count;
}

/** The text of a design file as Save writes it: indented when small, compact in pieces when large. */
export function designFilePieces(design: Design): Iterable<string> {
  if (blockCountWithVariants(design) <= INDENTED_FILE_BLOCKS) {
    const indented = `${JSON.stringify(design, null, 2)}\n`;
    // Very long names can make even a small design's indented text longer than restore reads.
    if (indented.length <= MAX_DESIGN_TEXT_LENGTH) return [indented];
  }
  return (function* () {
    yield* designTextPieces(design);
    yield '\n';
  })();
}

/**
 * About how many characters designTextPieces() writes, from the first pieceful of blocks scaled to all
 * blocks, the inactive variants' included (the headers not counted): a cheap look before a long export.
 */
export function designTextLengthEstimate(design: Design, sample = BLOCKS_PER_PIECE): number {
  const lists = [design.blocks, ...(design.variants?.entries ?? []).map((e) => e.design?.blocks ?? [])];
  let total = 0;
  for (const blocks of lists) {
    if (blocks.length === 0) continue;
    const n = Math.min(blocks.length, sample);
    total += Math.round((JSON.stringify(blocks.slice(0, n)).length / n) * blocks.length);
  }
  return total;
}
