import { describe, expect, it } from 'vitest';
import { formatQuantity, formatWholeNumber } from '../../src/model/units';

describe('whole numbers with grouped thousands', () => {
  it.each([
    [0, '0'],
    [999, '999'],
    [1000, '1,000'],
    [1048576, '1,048,576'],
    [67108864, '67,108,864'],
    [-2500, '-2,500'],
    [1234.5, '1,235'],
  ])('%d → %s', (value, text) => {
    expect(formatWholeNumber(value)).toBe(text);
  });

  it('is what a count figure shows', () => {
    expect(formatQuantity(2097152, 'count')).toBe('2,097,152');
    expect(formatQuantity(Number.NaN, 'count')).toBe('—');
  });
});
