import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  lineRepairProbability,
  rowColumnRepairProbability,
  sparseRepairProbability,
} from '../../../src/engine/physics/redundancy';
import { negativeBinomialYield, poissonYield } from '../../../src/engine/physics/yield';

const rate = fc.double({ min: 1e-6, max: 20, noNaN: true });
const lines = fc.integer({ min: 1, max: 1 << 20 });
const spares = fc.integer({ min: 0, max: 16 });

describe('yield properties', () => {
  it('repair probability rises with spares and falls with the fault rate', { timeout: 60_000 }, () => {
    fc.assert(
      fc.property(lines, rate, rate, spares, (m, a, b, s) => {
        const low = Math.min(a, b);
        const high = Math.max(a, b);
        const p = lineRepairProbability(m, low, s);
        expect(p).toBeGreaterThanOrEqual(0);
        expect(p).toBeLessThanOrEqual(1);
        expect(lineRepairProbability(m, low, s + 1)).toBeGreaterThanOrEqual(p - 1e-12);
        expect(lineRepairProbability(m, high, s)).toBeLessThanOrEqual(p + 1e-12);
      }),
    );
  });

  it(
    'mixed-fault domains: more spare rows or columns never lower the sparse-limit repair probability',
    { timeout: 60_000 },
    () => {
      fc.assert(
        fc.property(
          rate,
          rate,
          rate,
          fc.integer({ min: 0, max: 6 }),
          fc.integer({ min: 0, max: 6 }),
          (cells, rows, columns, r, c) => {
            const domain = {
              rows: 2048,
              columns: 1024,
              spareRows: r,
              spareColumns: c,
              faults: { cells, rows, columns },
            };
            const p = sparseRepairProbability(domain);
            expect(sparseRepairProbability({ ...domain, spareRows: r + 1 })).toBeGreaterThanOrEqual(
              p - 1e-12,
            );
            expect(sparseRepairProbability({ ...domain, spareColumns: c + 1 })).toBeGreaterThanOrEqual(
              p - 1e-12,
            );
            expect(
              rowColumnRepairProbability({ ...domain, faults: { cells: 0, rows, columns } }),
            ).toBeGreaterThanOrEqual(p - 1e-12);
          },
        ),
      );
    },
  );

  it(
    'die yield falls with defect density; clustering (smaller α) raises it at equal density',
    { timeout: 60_000 },
    () => {
      const area = fc.double({ min: 1e-7, max: 1e-3, noNaN: true });
      const density = fc.double({ min: 1, max: 1e5, noNaN: true });
      const alpha = fc.double({ min: 0.1, max: 50, noNaN: true });
      fc.assert(
        fc.property(area, density, density, alpha, (a, d1, d2, al) => {
          const lo = Math.min(d1, d2);
          const hi = Math.max(d1, d2);
          expect(poissonYield(a, hi)).toBeLessThanOrEqual(poissonYield(a, lo));
          expect(negativeBinomialYield(a, hi, al)).toBeLessThanOrEqual(
            negativeBinomialYield(a, lo, al) + 1e-15,
          );
          expect(negativeBinomialYield(a, lo, al)).toBeGreaterThanOrEqual(poissonYield(a, lo) - 1e-15);
        }),
      );
    },
  );
});
