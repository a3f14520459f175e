import { describe, expect, it } from 'vitest';
import { placedDesign } from '../../src/geometry/placedIndex';
import { fitDecoderAtPoint, fitDroppedDecoder, stackOutlines } from '../../src/geometry/stackFit';
import { demoDesign } from '../../src/designs/demoDesign';
import { designWith, mat, strip } from '../support/designs';

/** The demo: a 4 × 4 grid with an 18 µm row decoder on the left and a 14 µm column decoder below. */
const demo = demoDesign();
const rowDecoder = demo.blocks.find((b) => b.id === 'row-decoder');
const columnDecoder = demo.blocks.find((b) => b.id === 'column-decoder');

describe('stacks of mats and strips', () => {
  it('the demo bank without its decoders is one stack, the box the builder put its decoders beside', () => {
    const stacks = stackOutlines(placedDesign(demo));
    expect(stacks).toHaveLength(1);
    const s = stacks[0];
    expect(s?.matCount).toBe(16);
    if (!rowDecoder || rowDecoder.type === 'mat' || !columnDecoder || columnDecoder.type === 'mat')
      throw new Error('demo decoders');
    expect(s?.rect.x).toBeCloseTo(rowDecoder.x + rowDecoder.width, 12);
    expect(s?.rect.height).toBeCloseTo(rowDecoder.height, 12);
    expect(s?.rect.width).toBeCloseTo(columnDecoder.width, 12);
    expect((s?.rect.y ?? 0) + (s?.rect.height ?? 0)).toBeCloseTo(columnDecoder.y, 12);
  });

  it('mats apart are separate stacks; strips alone are none', () => {
    const design = designWith([
      mat({ id: 'a', x: 0, y: 0 }),
      mat({ id: 'b', x: 100e-6, y: 0 }),
      strip('lone', 'senseAmpStrip', 300e-6, 0, 20e-6, 6e-6),
    ]);
    expect(stackOutlines(placedDesign(design)).map((s) => s.matCount)).toEqual([1, 1]);
  });

  it('a click beside a stack side fits a decoder of that side’s length; the wrong side or too far fits nothing', () => {
    const stacks = stackOutlines(placedDesign(demo));
    const s = stacks[0]?.rect;
    if (!s) throw new Error('no stack');
    const left = fitDecoderAtPoint('rowDecoder', { x: s.x - 5e-6, y: s.y + 10e-6 }, stacks, 18e-6, 20e-6);
    expect(left?.side).toBe('left');
    expect(left?.rect).toEqual({ x: s.x - 18e-6, y: s.y, width: 18e-6, height: s.height });
    const top = fitDecoderAtPoint('columnDecoder', { x: s.x + 50e-6, y: s.y - 1e-6 }, stacks, 14e-6, 20e-6);
    expect(top?.rect).toEqual({ x: s.x, y: s.y - 14e-6, width: s.width, height: 14e-6 });
    expect(
      fitDecoderAtPoint('rowDecoder', { x: s.x + 50e-6, y: s.y - 1e-6 }, stacks, 18e-6, 20e-6),
    ).toBeNull();
    expect(
      fitDecoderAtPoint('rowDecoder', { x: s.x - 50e-6, y: s.y + 10e-6 }, stacks, 18e-6, 20e-6),
    ).toBeNull();
    expect(
      fitDecoderAtPoint('senseAmpStrip', { x: s.x - 5e-6, y: s.y + 10e-6 }, stacks, 6e-6, 20e-6),
    ).toBeNull();
  });

  it('a decoder dropped against a stack side keeps its thickness and takes the side’s length', () => {
    const stacks = stackOutlines(placedDesign(demo));
    const s = stacks[0]?.rect;
    if (!s) throw new Error('no stack');
    const dropped = { x: s.x + s.width, y: s.y + 20e-6, width: 12e-6, height: 40e-6 };
    expect(fitDroppedDecoder('rowDecoder', dropped, stacks)?.rect).toEqual({
      x: s.x + s.width,
      y: s.y,
      width: 12e-6,
      height: s.height,
    });
    expect(fitDroppedDecoder('rowDecoder', { ...dropped, x: dropped.x + 1e-6 }, stacks)).toBeNull();
  });
});
