import { describe, expect, it } from 'vitest';
import { designFromQuery } from '../../src/app/startupDesign';
import { restoreDesign } from '../../src/io/restore';

describe('design chosen by the page address', () => {
  it('?generate=64x64 builds 4,096 mats with their strips, and the result is a valid design', () => {
    const design = designFromQuery('?generate=64x64');
    expect(design?.blocks.filter((b) => b.type === 'mat')).toHaveLength(4096);
    // 64 × 65 sense-amplifier strips + 65 × 64 driver strips + 2 decoders (arithmetic).
    expect(design?.blocks).toHaveLength(4096 + 2 * 64 * 65 + 2);
    expect(restoreDesign(JSON.stringify(design)).ok).toBe(true);
  });

  it.each(['', '?generate=0x4', '?generate=999x2', '?generate=abc', '?other=1'])('"%s" gives none', (q) => {
    expect(designFromQuery(q)).toBeNull();
  });

  it('?blank starts empty', () => {
    expect(designFromQuery('?blank')?.blocks).toEqual([]);
  });
});
