/**
 * Stamps small RGBA sprites into an RGBA pixel buffer with source-over blending. Drawing 100,000 markers
 * this way costs a few tens of milliseconds, where a canvas path per marker costs about half a second
 * on a machine without a GPU. Pure: tested in Node.
 */
export interface Sprite {
  readonly width: number;
  readonly height: number;
  /** RGBA, not premultiplied, rows top to bottom (as getImageData gives them). */
  readonly data: Uint8ClampedArray;
}

/** A pixel rectangle [x0, x1) × [y0, y1). */
export interface PixelBox {
  readonly x0: number;
  readonly y0: number;
  readonly x1: number;
  readonly y1: number;
}

/**
 * Blends `sprite` over `target` (width `targetWidth`) with its top-left corner at (left, top), writing
 * only inside `clip`. Source-over for straight (not premultiplied) alpha:
 *   a = as + ad·(1 − as),  c = (cs·as + cd·ad·(1 − as)) / a  (Porter and Duff, "Compositing Digital
 *   Images", SIGGRAPH 1984, the "over" operator; from memory).
 */
export function stampSprite(
  target: Uint8ClampedArray,
  targetWidth: number,
  clip: PixelBox,
  sprite: Sprite,
  left: number,
  top: number,
): void {
  const y0 = Math.max(clip.y0, top);
  const y1 = Math.min(clip.y1, top + sprite.height);
  const s = sprite.data;
  const { spans, alpha, words } = prepared(sprite);
  const targetWords = wordsOf(target);
  for (let y = y0; y < y1; y++) {
    // Only the row's stretch holding any colour: a marker fills about a third of its square.
    const row = y - top;
    const x0 = Math.max(clip.x0, left + (spans[2 * row] ?? 0));
    const x1 = Math.min(clip.x1, left + (spans[2 * row + 1] ?? 0));
    let sp = row * sprite.width + (x0 - left);
    let tp = y * targetWidth + x0;
    for (let x = x0; x < x1; x++, sp++, tp++) {
      const as = alpha[sp] ?? 0;
      if (as === 0) continue;
      const si = sp * 4;
      const ti = tp * 4;
      const ad = (target[ti + 3] ?? 0) / 255;
      if (ad === 0 || as === 1) {
        // The sprite's pixel as it is: one 32-bit copy where both buffers allow it.
        if (words && targetWords) targetWords[tp] = words[sp] ?? 0;
        else {
          target[ti] = s[si] ?? 0;
          target[ti + 1] = s[si + 1] ?? 0;
          target[ti + 2] = s[si + 2] ?? 0;
          target[ti + 3] = s[si + 3] ?? 0;
        }
        continue;
      }
      const keep = ad * (1 - as);
      const a = as + keep;
      target[ti] = ((s[si] ?? 0) * as + (target[ti] ?? 0) * keep) / a;
      target[ti + 1] = ((s[si + 1] ?? 0) * as + (target[ti + 1] ?? 0) * keep) / a;
      target[ti + 2] = ((s[si + 2] ?? 0) * as + (target[ti + 2] ?? 0) * keep) / a;
      target[ti + 3] = a * 255;
    }
  }
}

/** A buffer's bytes as 32-bit words (one word per RGBA pixel), where its offset allows. */
function wordView(data: Uint8ClampedArray): Uint32Array | null {
  return data.byteOffset % 4 === 0 && data.length % 4 === 0
    ? new Uint32Array(data.buffer, data.byteOffset, data.length / 4)
    : null;
}

/** Target buffers' word views, made once per buffer. */
const targetWordViews = new WeakMap<Uint8ClampedArray, Uint32Array | null>();

function wordsOf(target: Uint8ClampedArray): Uint32Array | null {
  let words = targetWordViews.get(target);
  if (words === undefined) {
    words = wordView(target);
    targetWordViews.set(target, words);
  }
  return words;
}

/** What stamping reads of a sprite, worked out once per sprite. */
interface PreparedSprite {
  /** Each row's first and one-past-last pixel with any alpha (an empty row: 0, 0). */
  readonly spans: Int32Array;
  /** Each pixel's alpha as a fraction (alpha / 255, the value the blend uses). */
  readonly alpha: Float64Array;
  /** The pixels as 32-bit words, for copies. */
  readonly words: Uint32Array | null;
}

const preparedSprites = new WeakMap<Sprite, PreparedSprite>();

function prepared(sprite: Sprite): PreparedSprite {
  const known = preparedSprites.get(sprite);
  if (known) return known;
  const alpha = new Float64Array(sprite.width * sprite.height);
  for (let p = 0; p < alpha.length; p++) alpha[p] = (sprite.data[p * 4 + 3] ?? 0) / 255;
  const made = { spans: spansOf(sprite), alpha, words: wordView(sprite.data) };
  preparedSprites.set(sprite, made);
  return made;
}

/** Each row's first and one-past-last pixel with any alpha (an empty row: 0, 0). */
function spansOf(sprite: Sprite): Int32Array {
  const spans = new Int32Array(2 * sprite.height);
  for (let y = 0; y < sprite.height; y++) {
    let first = -1;
    let end = 0;
    for (let x = 0; x < sprite.width; x++) {
      if ((sprite.data[(y * sprite.width + x) * 4 + 3] ?? 0) === 0) continue;
      if (first < 0) first = x;
      end = x + 1;
    }
    spans[2 * y] = Math.max(0, first);
    spans[2 * y + 1] = end;
  }
  return spans;
}
