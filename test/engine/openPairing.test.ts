import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluate, findMatReport } from '../../src/engine';
import { matGeometry } from '../../src/geometry/matGeometry';
import type { Block, Mat } from '../../src/model/block';
import { DEMO_PROCESS, OPEN_6F2_CELL, VERTICAL_4F2_CELL } from '../../src/model/builtins';
import { demoDesign } from '../../src/designs/demoDesign';
import { designWith, mat, strip } from '../support/designs';

// Open bit lines conserve counts: half of a mat's bit lines go to each of its edges, and a strip pairs
// min(offered by each side). Expected values are arithmetic on the layouts drawn here (no source needed
// beyond the pairing rule of src/engine/openBitline.ts).

const F = DEMO_PROCESS.featureSize;
const CELLS = 256;
const SA = 6e-6;
const open = (id: string, y: number): Mat =>
  mat({ id, name: id, cellId: OPEN_6F2_CELL.id, cellsPerBitline: CELLS, cellsPerWordline: CELLS, y });
const g = matGeometry(open('probe', 0), OPEN_6F2_CELL, F);

/** n open mats stacked with sense-amplifier strips between them, and at both ends when `ends`. */
function chain(n: number, ends: boolean, present: (k: number) => boolean = () => true): Block[] {
  const blocks: Block[] = [];
  let y = 0;
  for (let k = 0; k <= n; k++) {
    const isEnd = k === 0 || k === n;
    if ((isEnd ? ends : true) && present(k)) blocks.push(strip(`sa${k}`, 'senseAmpStrip', 0, y, g.width, SA));
    y += SA;
    if (k < n) {
      blocks.push(open(`m${k}`, y));
      blocks.push(strip(`d${k}`, 'wordlineDriverStrip', g.width, y, 3e-6, g.height));
      y += g.height;
    }
  }
  return blocks;
}

describe('open bit lines conserve counts', () => {
  it('three open mats with strips only between them read exactly 2/3 of their bits; the outer halves are unsensed', () => {
    const r = evaluate(designWith(chain(3, false)));
    expect(r.totals.usableBits / r.totals.bits).toBeCloseTo(2 / 3, 12);
    expect(findMatReport(r, 'm0')?.unsensedBitlines).toBe(g.bitlineCount / 2);
    expect(findMatReport(r, 'm2')?.unsensedBitlines).toBe(g.bitlineCount / 2);
    expect(findMatReport(r, 'm1')?.unsensedBitlines).toBe(0);
    expect(findMatReport(r, 'm1')?.figures.usableBits).toBe(g.bits);
    expect(r.findings.map((f) => f.kind)).toContain('unsensedBitlines');
  });

  it('a chain of 8 without end strips reads 7/8; the two outer halves are unsensed', () => {
    const r = evaluate(designWith(chain(8, false)));
    expect(r.totals.usableBits).toBe(7 * g.bits);
    expect(r.totals.lostBits).toBe(g.bits);
  });

  it('a chain of 8 with end strips also reads 7/8; the outer halves have no partner', () => {
    const r = evaluate(designWith(chain(8, true)));
    expect(r.totals.usableBits).toBe(7 * g.bits);
    expect(findMatReport(r, 'm0')?.figures.unpartneredBits).toBe(g.bits / 2);
    expect(findMatReport(r, 'm0')?.unsensedBitlines).toBe(0);
    expect(r.findings.map((f) => f.kind)).toContain('openBitlineEdge');
  });

  it('usable bits never exceed what the strips can pair, whichever strips are present (property)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 8 }),
        fc.array(fc.boolean(), { minLength: 9, maxLength: 9 }),
        (n, present) => {
          const r = evaluate(designWith(chain(n, true, (k) => present[k] ?? false)));
          // Each interior strip that is present pairs half of each neighbour's lines: one mat's worth.
          let pairs = 0;
          for (let k = 1; k < n; k++) if (present[k]) pairs++;
          expect(r.totals.usableBits).toBeLessThanOrEqual(pairs * g.bits);
          expect(r.totals.usableBits).toBe(pairs * g.bits);
          expect(r.totals.usableBits).toBeGreaterThanOrEqual(0);
        },
      ),
      { numRuns: 60 },
    );
  }, 60_000);
});

describe('bits that cannot be read are not usable', () => {
  it('the demo with every sense-amplifier strip removed has no usable bit and no margin', () => {
    const demo = demoDesign();
    const r = evaluate({ ...demo, blocks: demo.blocks.filter((b) => b.type !== 'senseAmpStrip') });
    expect(r.totals.bits).toBe(8_388_608);
    expect(r.totals.usableBits).toBe(0);
    expect(r.totals.worstSenseMargin).toBeNaN();
    expect(r.totals.areaPerBit).toBeNaN();
    expect(r.totals.worstRowCycleTime).toBeNaN();
  });

  it('the demo with every driver removed has no usable bit either', () => {
    const demo = demoDesign();
    const r = evaluate({
      ...demo,
      blocks: demo.blocks.filter((b) => b.type !== 'wordlineDriverStrip' && b.type !== 'rowDecoder'),
    });
    expect(r.totals.usableBits).toBe(0);
  });

  it('an open-bit-line strip moved under a 4F² mat never makes usable bits negative', () => {
    const m = mat({ cellId: VERTICAL_4F2_CELL.id, cellsPerBitline: 512, cellsPerWordline: 512 });
    const gm = matGeometry(m, VERTICAL_4F2_CELL, F);
    fc.assert(
      fc.property(
        fc.double({ min: -gm.width, max: gm.width, noNaN: true }),
        fc.double({ min: -gm.height, max: gm.height, noNaN: true }),
        (dx, dy) => {
          const blocks = [
            m,
            { ...m, id: 'm2', y: gm.height + SA },
            strip('sa', 'senseAmpStrip', dx, gm.height + dy, gm.width, SA),
          ];
          const r = evaluate(designWith(blocks));
          expect(r.totals.usableBits).toBeGreaterThanOrEqual(0);
          expect(r.totals.usableBits).toBeLessThanOrEqual(r.totals.bits);
          for (const k of ['m1', 'm2'])
            expect(findMatReport(r, k)?.figures.usableBits).toBeGreaterThanOrEqual(0);
        },
      ),
      { numRuns: 200 },
    );
  }, 60_000);

  it('overlapping mats count their shared cells once: efficiency never above 100 %, with the overlap error', () => {
    const m = mat({ cellsPerBitline: 512, cellsPerWordline: 512 });
    const gm = matGeometry(m, OPEN_6F2_CELL, F);
    const same = { ...m, cellId: OPEN_6F2_CELL.id };
    const blocks = [
      same,
      { ...same, id: 'm2' },
      strip('sa0', 'senseAmpStrip', 0, -SA, gm.width, SA),
      strip('sa1', 'senseAmpStrip', 0, gm.height, gm.width, SA),
    ];
    const r = evaluate(designWith(blocks));
    expect(r.totals.arrayEfficiency).toBeLessThanOrEqual(1);
    expect(r.totals.matOverlapArea).toBeCloseTo(gm.width * gm.height, 20);
    expect(r.findings.some((f) => f.kind === 'overlap')).toBe(true);
  });
});
