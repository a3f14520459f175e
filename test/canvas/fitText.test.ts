import { describe, expect, it } from 'vitest';
import { fitText } from '../../src/canvas/fitText';

describe('fitText', () => {
  // A fake context whose characters are each 7 px wide: arithmetic.
  const ctx = { measureText: (text: string) => ({ width: Array.from(text).length * 7 }) };
  it('keeps text that fits and cuts longer text with an ellipsis within the width', () => {
    expect(fitText(ctx, 'short', 100)).toBe('short');
    const cut = fitText(ctx, 'x'.repeat(200), 70);
    expect(cut).toBe(`${'x'.repeat(9)}…`);
    expect(ctx.measureText(cut).width).toBeLessThanOrEqual(70);
    expect(fitText(ctx, 'abc', 3)).toBe('');
  });
});
