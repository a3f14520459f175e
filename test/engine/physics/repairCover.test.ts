import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { CoverScratch, coverDomain, NOT_REPAIRED, REPAIRED } from '../../../src/engine/physics/repairCover';

const scratch = new CoverScratch();
const cover = (
  cells: [number, number][],
  spareRows: number,
  spareColumns: number,
  rows: number[] = [],
  columns: number[] = [],
) =>
  coverDomain(
    rows,
    columns,
    cells.map(([r]) => r),
    cells.map(([, c]) => c),
    spareRows,
    spareColumns,
    scratch,
  );

/** Brute force: try every set of ≤ R rows among the faulty rows; the rest must fit in C columns. */
function bruteForce(cells: [number, number][], spareRows: number, spareColumns: number): boolean {
  const rows = [...new Set(cells.map(([r]) => r))];
  const subsets = 1 << rows.length;
  for (let mask = 0; mask < subsets; mask++) {
    const chosen = rows.filter((_, i) => mask & (1 << i));
    if (chosen.length > spareRows) continue;
    const left = new Set(cells.filter(([r]) => !chosen.includes(r)).map(([, c]) => c));
    if (left.size <= spareColumns) return true;
  }
  return false;
}

describe('spare allocation for one domain (arithmetic cases)', () => {
  it('a row with more faulty cells than spare columns must take a spare row', () => {
    expect(
      cover(
        [
          [3, 1],
          [3, 5],
          [3, 9],
        ],
        1,
        2,
      ),
    ).toBe(REPAIRED);
    expect(
      cover(
        [
          [3, 1],
          [3, 5],
          [3, 9],
        ],
        0,
        2,
      ),
    ).toBe(NOT_REPAIRED);
  });

  it('a 3 × 3 diagonal needs three lines', () => {
    const diagonal: [number, number][] = [
      [0, 0],
      [1, 1],
      [2, 2],
    ];
    expect(cover(diagonal, 1, 1)).toBe(NOT_REPAIRED);
    expect(cover(diagonal, 2, 1)).toBe(REPAIRED);
  });

  it('finds the cover a greedy choice misses', () => {
    // Rows 0 and 1 each hold two cells; columns 0 and 1 each hold two as well. Two columns cover all four
    // cells; so do two rows. With one row and one column the cells (0,0) (0,1) (1,0) (1,1) cannot be covered.
    const square: [number, number][] = [
      [0, 0],
      [0, 1],
      [1, 0],
      [1, 1],
    ];
    expect(cover(square, 0, 2)).toBe(REPAIRED);
    expect(cover(square, 1, 1)).toBe(NOT_REPAIRED);
  });

  it('cells on a faulty line cost nothing; duplicate cells count once', () => {
    expect(
      cover(
        [
          [4, 1],
          [4, 2],
          [4, 3],
        ],
        1,
        0,
        [4],
      ),
    ).toBe(REPAIRED);
    expect(
      cover(
        [
          [2, 2],
          [2, 2],
          [2, 2],
        ],
        0,
        1,
      ),
    ).toBe(REPAIRED);
    expect(cover([], 0, 0, [1, 1], [])).toBe(NOT_REPAIRED);
    expect(cover([], 1, 0, [1, 1], [])).toBe(REPAIRED);
  });

  it('agrees with brute force on random small domains', { timeout: 60_000 }, () => {
    const cell = fc.tuple(fc.integer({ min: 0, max: 5 }), fc.integer({ min: 0, max: 5 }));
    fc.assert(
      fc.property(
        fc.array(cell, { maxLength: 12 }),
        fc.integer({ min: 0, max: 3 }),
        fc.integer({ min: 0, max: 3 }),
        (cells, r, c) => {
          const expected = bruteForce(cells, r, c) ? REPAIRED : NOT_REPAIRED;
          expect(cover(cells as [number, number][], r, c)).toBe(expected);
        },
      ),
      { numRuns: 400 },
    );
  });
});
