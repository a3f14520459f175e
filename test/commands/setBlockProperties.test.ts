import { describe, expect, it } from 'vitest';
import { setBlockProperties } from '../../src/commands/setBlockProperties';
import { OPEN_6F2_CELL } from '../../src/model/builtins';
import { demoDesign } from '../../src/designs/demoDesign';
import { blockById, expectRefused, runUndoRedo } from '../support/commandSteps';

describe('command: set block properties', () => {
  it('runs, undoes and redoes an edit of many blocks at once; each value reaches the blocks it fits', () => {
    const ids = ['mat-r0c0', 'mat-r0c1', 'sa-r0c0'];
    runUndoRedo(
      demoDesign(),
      setBlockProperties,
      { ids, patch: { y: 1e-6, height: 4e-6, cellId: OPEN_6F2_CELL.id, mirrored: true } },
      (d) => {
        for (const id of ids) expect(blockById(d, id).y).toBe(1e-6);
        const m = blockById(d, 'mat-r0c1');
        expect(m.type === 'mat' && m.cellId).toBe(OPEN_6F2_CELL.id);
        expect(m.type === 'mat' && m.mirrored).toBe(true);
        const s = blockById(d, 'sa-r0c0');
        expect(s.type !== 'mat' && s.height).toBe(4e-6);
      },
    );
  });

  it('renames one block and turns a mat’s bit lines about its corner', () => {
    runUndoRedo(
      demoDesign(),
      setBlockProperties,
      { ids: ['mat-r1c1'], patch: { name: 'Left mat', bitlineAxis: 'horizontal' } },
      (d) => {
        const m = blockById(d, 'mat-r1c1');
        expect(m.name).toBe('Left mat');
        expect(m.type === 'mat' && m.bitlineAxis).toBe('horizontal');
      },
    );
  });

  it('refuses unknown cells, bad lengths and an empty selection; unchanged values record nothing', () => {
    const design = demoDesign();
    expectRefused(design, setBlockProperties, { ids: ['mat-r0c0'], patch: { cellId: 'nope' } }, 'no cell');
    expectRefused(design, setBlockProperties, { ids: ['sa-r0c0'], patch: { width: -2e-6 } }, 'width');
    expectRefused(design, setBlockProperties, { ids: ['sa-r0c0'], patch: { x: Number.NaN } }, 'finite');
    expectRefused(design, setBlockProperties, { ids: [], patch: { x: 0 } }, 'nothing selected');
    const m = blockById(design, 'mat-r0c0');
    const same = setBlockProperties.run(design, { ids: ['mat-r0c0'], patch: { x: m.x } });
    expect(same.ok && same.design).toBe(design);
  });
});
