import { describe, expect, it } from 'vitest';
import { evaluate, findMatReport } from '../../src/engine';
import { figuresAt, matAt, matIdAt, matIndexOf, MatTableBuilder } from '../../src/engine/evaluation/matTable';
import { allMats, senseAmpStripIdsOf } from '../../src/engine/evaluation/matExports';
import { demoDesign } from '../../src/designs/demoDesign';
import { copyMat } from '../../src/engine/evaluation/matEvaluation';

// The report's mats are columns; these checks pin the lookups the panels and exports use. Expected values
// come from the demo design itself (16 mats in a 4 × 4 grid, ids "mat-r{row}c{column}").

describe('mat table', () => {
  const design = demoDesign();
  const report = evaluate(design);
  const mats = report.mats;

  it('holds every mat in design order', () => {
    const ids = design.blocks.filter((b) => b.type === 'mat').map((b) => b.id);
    expect(mats.count).toBe(16);
    expect(Array.from({ length: mats.count }, (_, k) => matIdAt(mats, k))).toEqual(ids);
    expect(allMats(mats).map((m) => m.matId)).toEqual(ids);
  });

  it('finds a mat by id, and nothing for an id that names no mat', () => {
    const k = matIndexOf(mats, 'mat-r2c1');
    expect(matIdAt(mats, k)).toBe('mat-r2c1');
    expect(findMatReport(report, 'mat-r2c1')).toEqual(matAt(mats, k));
    expect(matIndexOf(mats, 'sa-r0c0')).toBe(-1);
    expect(findMatReport(report, 'no-such-block')).toBeUndefined();
  });

  it('refuses a mat index outside the table', () => {
    expect(() => figuresAt(mats, 16)).toThrow('no mat 16 in a report of 16');
  });

  it('copies mats of an earlier table unchanged, keeping their figures', () => {
    const builder = new MatTableBuilder(design.blocks, mats.count, mats.figures);
    for (let k = 0; k < mats.count; k++) copyMat(builder, k, mats);
    const copy = builder.finish();
    expect(allMats(copy)).toEqual(allMats(mats));
    expect(Array.from({ length: 16 }, (_, k) => senseAmpStripIdsOf(copy, k))).toEqual(
      Array.from({ length: 16 }, (_, k) => senseAmpStripIdsOf(mats, k)),
    );
    expect(figuresAt(copy, 3)).toBe(figuresAt(mats, 3));
  });
});
