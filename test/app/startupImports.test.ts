import { describe, expect, it } from 'vitest';
import { chainTo } from '../support/importChain';

describe('the first load stays lean', () => {
  // The schema library is a quarter of the first load: restore and the edit check load it after the
  // first paint (io/checksOnDemand.ts). A chain printed here is the static import that pulled it back in.
  it('src/main.tsx reaches zod only through import()', () => {
    expect(chainTo('main.tsx', 'zod')).toBeNull();
  });
  it('src/main.tsx reaches d3 only through import() (the explorer)', () => {
    expect(chainTo('main.tsx', 'd3')).toBeNull();
  });
});
