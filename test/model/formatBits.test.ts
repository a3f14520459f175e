import { describe, expect, it } from 'vitest';
import { formatBits } from '../../src/model/units';

describe('capacity with binary prefixes', () => {
  it.each([
    [0, '0 b'],
    [1000, '1,000 b'],
    [1024, '1 Kib'],
    [524288, '512 Kib'],
    [1572864, '1.5 Mib'],
    [2 ** 31, '2 Gib'],
    [Number.NaN, '—'],
  ])('%d bits read "%s"', (bits, text) => {
    expect(formatBits(bits)).toBe(text);
  });
});
