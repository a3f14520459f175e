import { describe, expect, it } from 'vitest';
import { newBlockIdentity } from '../../src/commands/blockIds';
import { blankDesign } from '../../src/designs/demoDesign';
import type { Design } from '../../src/model/design';

describe('new block identity', () => {
  it('numbers id and name alike, from the first free number of the type', () => {
    const blank: Design = blankDesign();
    expect(newBlockIdentity(blank, 'mat')).toEqual({ id: 'mat-1', name: 'Mat 1' });
    expect(newBlockIdentity(blank, 'senseAmpStrip')).toEqual({ id: 'sa-1', name: 'SA 1' });
    const withTwo: Design = {
      ...blank,
      blocks: [
        { id: 'sa-1', name: 'SA 1', type: 'senseAmpStrip', x: 0, y: 0, width: 1e-6, height: 1e-6 },
        { id: 'sa-3', name: 'SA 3', type: 'senseAmpStrip', x: 0, y: 2e-6, width: 1e-6, height: 1e-6 },
      ],
    };
    expect(newBlockIdentity(withTwo, 'senseAmpStrip')).toEqual({ id: 'sa-2', name: 'SA 2' });
    expect(newBlockIdentity(withTwo, 'rowDecoder')).toEqual({ id: 'rowdec-1', name: 'Row decoder 1' });
  });
});
