import { matAt } from '../../src/engine/evaluation/matTable';
import { describe, expect, it } from 'vitest';
import { createVariant } from '../../src/commands/createVariant';
import { deleteVariant } from '../../src/commands/deleteVariant';
import { duplicateVariant } from '../../src/commands/duplicateVariant';
import { renameVariant } from '../../src/commands/renameVariant';
import { switchVariant } from '../../src/commands/switchVariant';
import { setMatCellCounts } from '../../src/commands/setMatCellCounts';
import { restoreDesign } from '../../src/io/restore';
import { DEMO_PROCESS, DEFAULT_OPERATING, OPEN_6F2_CELL } from '../../src/model/builtins';
import { buildPartition } from '../../src/designs/buildPartition';
import type { Design, VariantDesign } from '../../src/model/design';
import { demoDesign } from '../../src/designs/demoDesign';
import { activeVariantId, variantContent, variantEntries } from '../../src/model/variants';
import { createAppStore } from '../../src/store/appStore';
import { expectRefused, runAndCheckChange } from '../support/commandSteps';
import { DEMO_STRIPS } from '../../src/designs/demoSizes';

function builtVariant(): VariantDesign {
  const built = buildPartition({
    targetBits: 2 ** 22,
    cell: OPEN_6F2_CELL,
    process: DEMO_PROCESS,
    operating: DEFAULT_OPERATING,
    cellsPerBitline: 256,
    cellsPerWordline: 512,
    strips: DEMO_STRIPS,
    name: 'Open trial',
  });
  if (!built.ok) throw new Error(built.error);
  return built.design;
}

/** The demo with a second variant built and active. */
function twoVariants(): Design {
  const r = createVariant.run(demoDesign(), { design: builtVariant() });
  if (!r.ok) throw new Error(r.error);
  return r.design;
}

const names = (d: Design) => variantEntries(d).map((v) => `${v.active ? '*' : ''}${v.name}`);

describe('variant commands', () => {
  it('create: the new variant is added after the active one and becomes the document; run, undo, redo', () => {
    const store = runAndCheckChange(
      createVariant,
      { design: builtVariant() },
      (d) => variantEntries(d).length === 2,
    );
    const d = store.getState().history.present;
    expect(names(d)).toEqual(['Wren bank section (invented demo)', '*Open trial']);
    expect(d.name).toBe('Open trial');
    expect(activeVariantId(d)).toBe('v2');
    // The report follows the active variant.
    expect(store.getState().report.totals.matCount).toBe(d.blocks.filter((b) => b.type === 'mat').length);
    expect(matAt(store.getState().report.mats, 0).figures.cellId).toBe(OPEN_6F2_CELL.id);
  });

  it('create refuses an invalid design and leaves the document alone', () => {
    const bad = { ...builtVariant(), name: '' };
    expectRefused(createVariant, { design: bad }, /invalid/);
  });

  it('switch: the other variant becomes the document, the edited one is kept; run, undo, redo', () => {
    const start = twoVariants();
    // Edit the active variant first, so switching must carry the edit onto the shelf.
    const edited = setMatCellCounts.run(start, { matIds: ['mat-r0c0'], cellsPerBitline: 128 });
    if (!edited.ok) throw new Error(edited.error);
    const store = runAndCheckChange(
      switchVariant,
      { variantId: 'v1' },
      (d) => activeVariantId(d) === 'v1',
      edited.design,
    );
    const d = store.getState().history.present;
    expect(d.name).toBe('Wren bank section (invented demo)');
    expect(d.blocks).toEqual(demoDesign().blocks);
    const back = switchVariant.run(d, { variantId: 'v2' });
    if (!back.ok) throw new Error(back.error);
    const mat = back.design.blocks.find((b) => b.id === 'mat-r0c0');
    expect(mat?.type === 'mat' && mat.cellsPerBitline).toBe(128);
    expectRefused(switchVariant, { variantId: 'v9' }, /no variant/, start);
    const same = switchVariant.run(start, { variantId: 'v2' });
    expect(same.ok && same.design).toBe(start);
  });

  it('rename: the active one (its design name) and a shelved one; run, undo, redo', () => {
    const start = twoVariants();
    runAndCheckChange(
      renameVariant,
      { variantId: 'v2', name: '  Open, 256 ' },
      (d) => d.name === 'Open, 256',
      start,
    );
    runAndCheckChange(
      renameVariant,
      { variantId: 'v1', name: 'Baseline' },
      (d) => variantEntries(d)[0]?.name === 'Baseline',
      start,
    );
    expectRefused(renameVariant, { variantId: 'v1', name: '   ' }, /needs a name/, start);
    expectRefused(renameVariant, { variantId: 'v1', name: 'x'.repeat(201) }, /at most 200/, start);
    expectRefused(renameVariant, { variantId: 'v7', name: 'x' }, /no variant/, start);
    // The only variant of a document without a shelf can be renamed too.
    runAndCheckChange(renameVariant, { variantId: 'v1', name: 'Wren A' }, (d) => d.name === 'Wren A');
  });

  it('delete: a shelved one, then the active one (its neighbour takes over); run, undo, redo', () => {
    const start = twoVariants();
    runAndCheckChange(deleteVariant, { variantId: 'v1' }, (d) => variantEntries(d).length === 1, start);
    const store = runAndCheckChange(
      deleteVariant,
      { variantId: 'v2' },
      (d) => variantEntries(d).length === 1,
      start,
    );
    const d = store.getState().history.present;
    expect(names(d)).toEqual(['*Wren bank section (invented demo)']);
    expect(d.blocks.length).toBe(demoDesign().blocks.length);
    expectRefused(deleteVariant, { variantId: 'v1' }, /only variant/);
    expectRefused(deleteVariant, { variantId: 'v5' }, /no variant/, start);
  });

  it('duplicate: a copy under a new name becomes active; run, undo, redo', () => {
    runAndCheckChange(
      duplicateVariant,
      { variantId: 'v1' },
      (d) =>
        names(d).join('|') === 'Wren bank section (invented demo)|*Wren bank section (invented demo) (copy)',
    );
    expectRefused(duplicateVariant, { variantId: 'nope' }, /no variant/);
  });

  it('refuses a 33rd variant', () => {
    let d = demoDesign();
    for (let i = 1; i < 32; i++) {
      const r = duplicateVariant.run(d, { variantId: activeVariantId(d) });
      if (!r.ok) throw new Error(r.error);
      d = r.design;
    }
    expect(variantEntries(d)).toHaveLength(32);
    expectRefused(duplicateVariant, { variantId: 'v1' }, /at most 32/, d);
  });

  it('a document with variants saves and loads through the one restore path', () => {
    const d = twoVariants();
    const restored = restoreDesign(JSON.stringify(d));
    if (!restored.ok) throw new Error(restored.errors.join('\n'));
    expect(names(restored.design)).toEqual(names(d));
    expect(variantContent(restored.design)).toEqual(variantContent(d));
  });

  it('restore names what is wrong with a broken shelf', () => {
    const d = twoVariants();
    const shelf = d.variants;
    if (!shelf) throw new Error('expected a shelf');
    const broken = {
      ...d,
      variants: { activeId: 'v3', entries: [...shelf.entries, { id: 'v1', design: null }] },
    };
    const restored = restoreDesign(JSON.parse(JSON.stringify(broken)));
    expect(restored.ok).toBe(false);
    if (restored.ok) return;
    expect(restored.errors.join('\n')).toMatch(/variants\.entries\[2\]\.id: duplicate variant id "v1"/);
    expect(restored.errors.join('\n')).toMatch(/variants\.activeId: no variant "v3"/);
  });

  it('undo in the store steps back over variant commands like any edit', () => {
    const store = createAppStore(demoDesign());
    store.getState().execute(createVariant, { design: builtVariant() });
    store.getState().execute(switchVariant, { variantId: 'v1' });
    expect(store.getState().history.present.name).toBe('Wren bank section (invented demo)');
    store.getState().undo();
    expect(store.getState().history.present.name).toBe('Open trial');
    store.getState().undo();
    expect(store.getState().history.present.variants).toBeUndefined();
  });
});
