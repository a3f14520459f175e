import { describe, expect, it } from 'vitest';
import { CHECK_LABELS, type FindingKind } from '../../src/engine';
import { infeasibleReasons } from '../../src/explore/chartData';
import {
  cellProcessTallies,
  type FamilyTally,
  familyInfeasibleSentence,
  familyTallies,
  infeasibleFamilySentences,
} from '../../src/explore/familyTally';
import { runSweepRange, sweepSize, type SweepPoint } from '../../src/explore/sweep';
import { defaultSweepSettings, sweepRequestFor } from '../../src/explore/sweepSettings';
import { demoDesign } from '../../src/designs/demoDesign';

const design = demoDesign();
const request = sweepRequestFor(
  {
    ...defaultSweepSettings(design),
    cellsPerBitline: { from: 64, to: 1024, step: 256 },
    cellsPerWordline: { from: 128, to: 2048, step: 512 },
  },
  design,
);
const real = runSweepRange(request, 0, sweepSize(request));
const limits = { minMargin: 0.02, maxDelay: 0.5e-9 };
const found = real.find((p) => p.figures)?.figures;
if (!found) throw new Error('expected a planned point');
const template = found;

/** A point of family `cellIndex` with the given failing checks and margin (V). */
function point(cellIndex: number, errorKinds: FindingKind[], senseMargin = 0.1): SweepPoint {
  return {
    index: 0,
    cellsPerBitline: 256,
    cellsPerWordline: 512,
    cellIndex,
    processIndex: 0,
    matRows: 1,
    matColumns: 1,
    spareRows: null,
    spareColumns: null,
    figures: { ...template, errorKinds, senseMargin, wordlineDelay: 1e-10 },
    problem: null,
  };
}
const unplanned = (cellIndex: number): SweepPoint => ({
  ...point(cellIndex, []),
  figures: null,
  problem: 'too many mats',
});

function only<T>(value: T | undefined): T {
  if (value === undefined) throw new Error('expected a tally');
  return value;
}

describe('why whole families are infeasible', () => {
  it('counts, per family, the points each failing check rule and chart limit rules out', () => {
    const tallies = familyTallies(
      [
        point(0, ['senseAmpPitch']),
        point(0, ['retention', 'senseAmpPitch']),
        point(1, []),
        point(1, [], 0.001),
        unplanned(1),
      ],
      limits,
    );
    expect(tallies.map((t) => t.cellIndex)).toEqual([0, 1]);
    const [a, b] = tallies;
    expect(a?.points).toBe(2);
    expect(a?.feasible).toBe(0);
    expect(a?.checks.get('senseAmpPitch')).toBe(2);
    expect(a?.checks.get('retention')).toBe(1);
    expect(b?.points).toBe(3);
    expect(b?.feasible).toBe(1);
    expect(b?.unplanned).toBe(1);
    expect(b?.limits.get('minMargin')).toBe(1);
  });

  it('names the family and the one rule every point fails, with the rule’s own label', () => {
    const [t] = familyTallies([point(0, ['senseAmpPitch']), point(0, ['senseAmpPitch'])], limits);
    expect(familyInfeasibleSentence('1T1C vertical 4F²', only(t))).toBe(
      `1T1C vertical 4F²: every point fails the ${CHECK_LABELS.senseAmpPitch} check.`,
    );
  });

  it('gives counts when the rules are mixed', () => {
    const [t] = familyTallies(
      [point(0, ['senseAmpPitch']), point(0, ['retention']), point(0, ['retention']), unplanned(0)],
      limits,
    );
    expect(familyInfeasibleSentence('Gain cell', only(t))).toBe(
      'Gain cell: no feasible point of 4 — 2 fail the retention check, 1 fails the sense-amplifier pitch check, 1 cannot be planned (too many mats).',
    );
  });

  it('says nothing about a family with a feasible point', () => {
    const [t] = familyTallies([point(0, ['senseAmpPitch']), point(0, [])], limits);
    expect(familyInfeasibleSentence('Any', only(t))).toBeNull();
  });

  it('tallies a real sweep consistently with the points', () => {
    const sentences = infeasibleFamilySentences(
      real,
      request.cells.map((c) => c.name),
      limits,
    );
    const tallies = familyTallies(real, limits);
    expect(tallies.reduce((s, t) => s + t.points, 0)).toBe(real.length);
    expect(sentences.length).toBe(tallies.filter((t) => t.feasible === 0).length);
    for (const s of sentences) expect(request.cells.some((c) => s.startsWith(`${c.name}:`))).toBe(true);
  });
});

describe('the tally against infeasibleReasons()', () => {
  it('counts per family and per cell × process exactly what each point’s reasons say', () => {
    const seen = new Set<string>();
    // Oracle: the counts rebuilt point by point from infeasibleReasons(), at limits that leave some
    // points feasible, some missing one limit and some missing both.
    for (const limits of [
      { minMargin: 0.02, maxDelay: 0.5e-9 },
      { minMargin: 0.05, maxDelay: 2e-9 },
      { minMargin: -1, maxDelay: 1 },
    ]) {
      const expected = new Map<string, number>();
      const bump = (key: string) => expected.set(key, (expected.get(key) ?? 0) + 1);
      for (const p of real) {
        for (const family of [`${p.cellIndex}`, `${p.cellIndex}/${p.processIndex}`]) {
          bump(`${family} points`);
          if (!p.figures) {
            bump(`${family} unplanned`);
            continue;
          }
          const reasons = infeasibleReasons(p.figures, limits);
          if (reasons.length === 0) bump(`${family} feasible`);
          for (const r of reasons) bump(`${family} ${'check' in r ? r.check : r.limit}`);
        }
      }
      const actual = new Map<string, number>();
      const put = (family: string, t: FamilyTally) => {
        for (const [what, n] of [
          ['points', t.points],
          ['unplanned', t.unplanned],
          ['feasible', t.feasible],
          ...t.checks,
          ...t.limits,
        ] as const)
          if (n > 0) actual.set(`${family} ${what}`, n);
      };
      for (const t of familyTallies(real, limits)) put(`${t.cellIndex}`, t);
      for (const t of cellProcessTallies(real, limits)) put(`${t.cellIndex}/${t.processIndex}`, t);
      expect(actual).toEqual(expected);
      for (const k of expected.keys()) seen.add(k.split(' ')[1] ?? '');
    }
    // The limits above reach every branch: feasible points, missed limits, failed checks.
    for (const what of ['feasible', 'minMargin', 'maxDelay']) expect(seen).toContain(what);
    expect(seen.size).toBeGreaterThan(5);
  });
});

describe('a cell feasible on one process and not on another', () => {
  const onProcess = (p: SweepPoint, processIndex: number): SweepPoint => ({ ...p, processIndex });

  it('is called out per process, saying where it is feasible', () => {
    const points = [
      onProcess(point(0, []), 0),
      onProcess(point(0, ['retention']), 1),
      onProcess(point(0, ['retention']), 1),
      onProcess(point(1, ['senseAmpPitch']), 0),
      onProcess(point(1, ['senseAmpPitch']), 1),
    ];
    const tallies = cellProcessTallies(points, limits);
    expect(tallies.map((t) => [t.cellIndex, t.processIndex, t.points, t.feasible])).toEqual([
      [0, 0, 1, 1],
      [0, 1, 2, 0],
      [1, 0, 1, 0],
      [1, 1, 1, 0],
    ]);
    expect(
      infeasibleFamilySentences(points, ['Gain cell', 'Vertical 4F²'], limits, ['A 20 nm', 'B 16 nm']),
    ).toEqual([
      `Gain cell on B 16 nm: every point fails the ${CHECK_LABELS.retention} check; feasible on A 20 nm.`,
      // Infeasible on every process: one sentence for the cell, as before.
      `Vertical 4F²: every point fails the ${CHECK_LABELS.senseAmpPitch} check.`,
    ]);
    // Processes on which a cell fails alike share one sentence.
    const three = [...points, onProcess(point(0, ['retention']), 2)];
    expect(
      infeasibleFamilySentences(three, ['Gain cell', 'Vertical 4F²'], limits, [
        'A 20 nm',
        'B 16 nm',
        'C 12 nm',
      ]),
    ).toContain(
      `Gain cell on B 16 nm and C 12 nm: every point fails the ${CHECK_LABELS.retention} check; feasible on A 20 nm.`,
    );
    // With one process there is nothing to split.
    expect(
      infeasibleFamilySentences(points, ['Gain cell', 'Vertical 4F²'], limits, ['A 20 nm']),
    ).toHaveLength(1);
  });
});
