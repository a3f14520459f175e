import { describe, expect, it } from 'vitest';
import { MAX_ADDRESS_SELECTION, readAddressState, writeAddressState } from '../../src/app/addressState';

describe('address state', () => {
  it('reads the view and the selected ids, defaulting to the floorplan', () => {
    expect(readAddressState('')).toEqual({ view: 'floorplan', select: [] });
    expect(readAddressState('?view=explorer&select=mat-1&select=sa%2C2')).toEqual({
      view: 'explorer',
      select: ['mat-1', 'sa,2'],
    });
    expect(readAddressState('?view=nowhere').view).toBe('floorplan');
  });

  it('writes them back, keeping the other parameters and leaving the defaults out', () => {
    expect(writeAddressState('?generate=8x8', { view: 'variants', select: ['a b'] })).toBe(
      '?generate=8x8&view=variants&select=a+b',
    );
    expect(writeAddressState('?blank&view=explorer&select=x', { view: 'floorplan', select: [] })).toBe(
      '?blank',
    );
    expect(writeAddressState('?view=explorer', { view: 'floorplan', select: [] })).toBe('');
  });

  it('round-trips any ids', () => {
    const state = { view: 'explorer' as const, select: ['mat-r0c0', 'x&y=z', 'ü ∑'] };
    expect(readAddressState(writeAddressState('?perf', state))).toEqual(state);
  });

  it('leaves a very large selection out of the address', () => {
    const select = Array.from({ length: MAX_ADDRESS_SELECTION + 1 }, (_, i) => `b${i}`);
    expect(writeAddressState('', { view: 'floorplan', select })).toBe('');
  });
});
