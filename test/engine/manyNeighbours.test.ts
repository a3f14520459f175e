import { describe, expect, it } from 'vitest';
import { evaluate, findMatReport, senseAmpStripIdsOf, wordlineDriverIdsOf } from '../../src/engine';
import { matGeometry } from '../../src/geometry/matGeometry';
import type { Block } from '../../src/model/block';
import { DEMO_PROCESS, FOLDED_8F2_CELL, OPEN_6F2_CELL } from '../../src/model/builtins';
import { designWith, mat, strip } from '../support/designs';

// Mat edges touched by more strips, and strips by more partner mats, than evaluate's scratch buffers
// first hold (16): the buffers must grow and the answers stay the same. Expected values are arithmetic
// on the layouts drawn here (no source needed).

const F = DEMO_PROCESS.featureSize;

describe('evaluate: a mat served by many small strips', () => {
  it('40 sense-amplifier strips along one edge and 20 drivers along another serve every line', () => {
    // Nothing at the other ends, so each line is served only if its own short strip is found.
    const m = mat({ x: 10e-6, y: 10e-6 });
    const g = matGeometry(m, FOLDED_8F2_CELL, F);
    const blocks: Block[] = [m];
    for (let k = 0; k < 40; k++) {
      blocks.push(strip(`sa-${k}`, 'senseAmpStrip', 10e-6 + (k * g.width) / 40, 4e-6, g.width / 40, 6e-6));
    }
    for (let k = 0; k < 20; k++) {
      blocks.push(
        strip(
          `swd-${k}`,
          'wordlineDriverStrip',
          10e-6 + g.width,
          10e-6 + (k * g.height) / 20,
          3e-6,
          g.height / 20,
        ),
      );
    }
    const r = evaluate(designWith(blocks));
    const report = findMatReport(r, 'm1');
    expect(report?.unsensedBitlines).toBe(0);
    expect(report?.undrivenWordlines).toBe(0);
    expect(senseAmpStripIdsOf(r.mats, 0)).toEqual(Array.from({ length: 40 }, (_, k) => `sa-${k}`));
    expect(wordlineDriverIdsOf(r.mats, 0)).toEqual(Array.from({ length: 20 }, (_, k) => `swd-${k}`));
    // Sense amplifiers at one end only cannot interleave: the pitch check is the one finding.
    expect(r.findings.map((f) => f.kind)).toEqual(['senseAmpPitch', 'noRowDecoder', 'noColumnDecoder']);
  });

  it('leaves exactly the lines under a missing strip unsensed', () => {
    const m = mat({ x: 10e-6, y: 10e-6 });
    const g = matGeometry(m, FOLDED_8F2_CELL, F);
    const blocks: Block[] = [m];
    // 32 strips of 32 bit lines each along the top, the 6th left out; nothing at the bottom.
    const perStrip = g.bitlineCount / 32;
    for (let k = 0; k < 32; k++) {
      if (k === 5) continue;
      blocks.push(
        strip(
          `sa-${k}`,
          'senseAmpStrip',
          10e-6 + k * perStrip * g.bitlinePitch,
          4e-6,
          perStrip * g.bitlinePitch,
          6e-6,
        ),
      );
    }
    const report = findMatReport(evaluate(designWith(blocks)), 'm1');
    expect(report?.unsensedBitlines).toBe(perStrip);
  });
});

describe('evaluate: an open-bit-line mat with many partner mats', () => {
  // One wide open 6F² mat below a sense-amplifier strip; twenty narrow open mats above the strip, side by
  // side, together exactly as wide. Each sense amplifier pairs a bit line below with one above.
  const wide = mat({
    id: 'wide',
    name: 'wide',
    cellId: OPEN_6F2_CELL.id,
    cellsPerBitline: 256,
    cellsPerWordline: 640,
  });
  const narrowCells = 32;
  const gWide = matGeometry(wide, OPEN_6F2_CELL, F);
  const narrow = matGeometry({ ...wide, cellsPerWordline: narrowCells }, OPEN_6F2_CELL, F);
  const stripY = 2e-6 + narrow.height;
  const layout = (missing: number | null): Block[] => {
    const blocks: Block[] = [
      { ...wide, y: stripY + 6e-6 },
      strip('sa', 'senseAmpStrip', 0, stripY, gWide.width, 6e-6),
    ];
    for (let k = 0; k < 20; k++) {
      if (k === missing) continue;
      blocks.push({
        ...wide,
        id: `n${k}`,
        name: `n${k}`,
        cellsPerWordline: narrowCells,
        x: k * narrow.width,
        y: 2e-6,
      });
    }
    return blocks;
  };

  it('the narrow mats exactly span the wide one', () => {
    expect(20 * narrow.width).toBeCloseTo(gWide.width, 15);
  });

  it('with every partner present no bit line of the wide mat that reaches the strip lacks a partner', () => {
    const report = findMatReport(evaluate(designWith(layout(null))), 'wide');
    expect(report?.figures.unpartneredBits).toBe(0);
    // Half of its bit lines go to its other edge, where there is no strip: those are unsensed.
    expect(report?.unsensedBitlines).toBe(gWide.bitlineCount / 2);
  });

  it('without one partner, the 16 of its 32 bit lines there that go to this edge lose their 256 cells each', () => {
    const report = findMatReport(evaluate(designWith(layout(4))), 'wide');
    expect(report?.figures.unpartneredBits).toBe((narrowCells / 2) * 256);
  });
});
