import { matAt } from '../../src/engine/evaluation/matTable';
import { describe, expect, it } from 'vitest';
import { addBlocks } from '../../src/commands/addBlocks';
import { moveBlocks } from '../../src/commands/moveBlocks';
import { reshapeBlocks } from '../../src/commands/reshapeBlocks';
import type { EditorContext, GestureResult } from '../../src/canvas/gestures/gesture';
import { DrawMatGesture } from '../../src/canvas/gestures/drawMatGesture';
import { PlaceStripGesture, placementAt } from '../../src/canvas/gestures/placeStripGesture';
import { pressWithSelectTool } from '../../src/canvas/gestures/selectPress';
import { evaluate } from '../../src/engine';
import { blockRect } from '../../src/geometry/placedBlocks';
import { placedDesign } from '../../src/geometry/placedIndex';
import { buildSnapTargets } from '../../src/geometry/snapping';
import type { Block, Mat } from '../../src/model/block';
import { demoDesign } from '../../src/designs/demoDesign';
import type { Design } from '../../src/model/design';
import { DEFAULT_TOOL_OPTIONS } from '../../src/store/editorStore';
import { FOLDED_8F2_CELL } from '../../src/model/builtins';
import { designWith, mat } from '../support/designs';

const NO_KEYS = { shift: false, alt: false };
/** 10 nm per pixel: a 36.864 µm mat is about 3,700 px across. */
const MPP = 1e-8;

function context(design: Design, selection: readonly string[] = []): EditorContext {
  return {
    design,
    placed: placedDesign(design),
    selection,
    options: { ...DEFAULT_TOOL_OPTIONS, cellId: design.cells[0]?.id ?? '' },
    metresPerPixel: MPP,
  };
}

function apply(design: Design, result: GestureResult): Design {
  if (!result.call) throw new Error('the gesture made no command');
  const out = result.call.command.run(design, result.call.args);
  if (!out.ok) throw new Error(out.error);
  return out.design;
}

function rectOf(design: Design, id: string) {
  const block = design.blocks.find((b) => b.id === id);
  if (!block) throw new Error(`no ${id}`);
  return blockRect(design, block);
}

describe('select tool gestures', () => {
  const design = demoDesign();
  const matRect = rectOf(design, 'mat-r0c0');
  const centre = { x: matRect.x + matRect.width / 2, y: matRect.y + matRect.height / 2 };

  it('a press on a block selects it and a drag moves it in whole pitches', () => {
    const press = pressWithSelectTool(context(design), centre, false);
    expect(press.selectNow).toEqual(['mat-r0c0']);
    press.gesture.move({ x: centre.x + 1.01e-6, y: centre.y + 300e-6 }, NO_KEYS);
    const result = press.gesture.finish({ x: centre.x + 1.01e-6, y: centre.y + 300e-6 }, true, NO_KEYS);
    expect(result.call?.command).toBe(moveBlocks);
    const args = result.call?.args as { dx: number; dy: number };
    // Folded 8F² with vertical bit lines: 36 nm steps in x (common practice: 2F bit-line pitch).
    expect(args.dx / 36e-9).toBeCloseTo(Math.round(1.01e-6 / 36e-9), 6);
    expect(press.gesture.changedBlocks()?.[0]?.x).toBeCloseTo(matRect.x + args.dx, 15);
  });

  it('a long drag says its shift in µm at the pitch’s precision, not rounded to a few digits', () => {
    const press = pressWithSelectTool(context(design), centre, false);
    const far = { x: centre.x + 12345.67e-6, y: centre.y + 0.5e-6 };
    press.gesture.move(far, NO_KEYS);
    const args = press.gesture.finish(far, true, NO_KEYS).call?.args as { dx: number; dy: number };
    // 36 nm steps across, word-line pitch steps down: whole nm, so three decimals of a µm.
    expect(press.gesture.preview().label).toBe(
      `Δx ${(args.dx * 1e6).toFixed(3)} µm, Δy ${(args.dy * 1e6).toFixed(3)} µm`,
    );
    expect(press.gesture.preview().label).toMatch(/^Δx 12345\.6\d\d µm/);
  });

  it('a dragged mat snaps to abut a neighbour and shows a guide', () => {
    // Move mat-r0c0 so that its right edge nears mat-r0c1's left edge (they are one driver strip apart).
    const neighbour = rectOf(design, 'mat-r0c1');
    const press = pressWithSelectTool(context(design), centre, false);
    const want = neighbour.x - (matRect.x + matRect.width);
    const p = { x: centre.x + want + 3 * MPP, y: centre.y };
    press.gesture.move(p, NO_KEYS);
    const preview = press.gesture.preview();
    expect(preview.guideX).toBeCloseTo(neighbour.x, 15);
    const moved = apply(design, press.gesture.finish(p, true, NO_KEYS));
    expect(rectOf(moved, 'mat-r0c0').x + matRect.width).toBeCloseTo(neighbour.x, 15);
  });

  it('a click on one block of a multi-selection narrows it; shift toggles; empty canvas bands', () => {
    const ctx = context(design, ['mat-r0c0', 'mat-r0c1']);
    const click = pressWithSelectTool(ctx, centre, false);
    expect(click.selectNow).toBeUndefined();
    expect(click.selectOnClick).toEqual(['mat-r0c0']);
    expect(click.gesture.finish(centre, false, NO_KEYS).call).toBeNull();
    expect(pressWithSelectTool(ctx, centre, true).selectNow).toEqual(['mat-r0c1']);

    const band = pressWithSelectTool(context(design, ['x']), { x: -50e-6, y: -50e-6 }, false);
    const far = { x: matRect.x + matRect.width + 1e-9, y: matRect.y + matRect.height + 1e-9 };
    band.gesture.move(far, NO_KEYS);
    expect(band.gesture.finish(far, true, NO_KEYS).select).toEqual(['mat-r0c0', 'sa-r0c0', 'swd-r0c0']);
    expect(band.gesture.finish(far, false, NO_KEYS).select).toEqual([]);
  });

  it('a handle of the single selected mat resizes it in whole cells', () => {
    const ctx = context(design, ['mat-r0c0']);
    const east = { x: matRect.x + matRect.width, y: centre.y };
    const press = pressWithSelectTool(ctx, east, false);
    expect(press.handle).toBe('e');
    // 10 cells of 4F = 72 nm narrower (arithmetic: folded 8F² adds 2 bit lines per cell per word line).
    const p = { x: east.x - 10 * 72e-9, y: east.y };
    press.gesture.move(p, NO_KEYS);
    expect(press.gesture.preview().label).toContain('512 × 502 cells/BL × cells/WL');
    const result = press.gesture.finish(p, true, NO_KEYS);
    expect(result.call?.command).toBe(reshapeBlocks);
    const m = apply(design, result).blocks.find((b) => b.id === 'mat-r0c0') as Mat;
    expect(m.cellsPerWordline).toBe(502);
  });

  it('a strip’s handle snaps its side to a neighbour’s edge', () => {
    const ctx = context(design, ['sa-r0c0']);
    const strip = rectOf(design, 'sa-r0c0');
    const neighbour = rectOf(design, 'mat-r0c1');
    const east = { x: strip.x + strip.width, y: strip.y + strip.height / 2 };
    const press = pressWithSelectTool(ctx, east, false);
    expect(press.handle).toBe('e');
    const p = { x: neighbour.x - 4 * MPP, y: east.y };
    press.gesture.move(p, NO_KEYS);
    expect(press.gesture.preview().guideX).toBeCloseTo(neighbour.x, 15);
    const after = apply(design, press.gesture.finish(p, true, NO_KEYS));
    expect(rectOf(after, 'sa-r0c0').width).toBeCloseTo(neighbour.x - strip.x, 15);
  });

  it('a sense-amplifier strip dropped against a mat edge takes the edge’s length', () => {
    const lone = designWith([
      mat({ id: 'm', x: 0, y: 10e-6 }),
      { id: 'sa', name: 'SA', type: 'senseAmpStrip', x: 50e-6, y: 0, width: 5e-6, height: 4e-6 },
    ]);
    const m = rectOf(lone, 'm');
    const grab = { x: 52e-6, y: 2e-6 };
    const press = pressWithSelectTool(context(lone), grab, false);
    // Drop it so that its bottom meets the mat's top edge (the abutment snap finishes the job).
    const p = { x: grab.x - 45e-6, y: grab.y + 6e-6 + 2 * MPP };
    press.gesture.move(p, NO_KEYS);
    expect(press.gesture.preview().label).toContain('fits M1 top edge');
    const after = apply(lone, press.gesture.finish(p, true, NO_KEYS));
    const s = rectOf(after, 'sa');
    expect(s.width).toBeCloseTo(m.width, 15);
    expect(s.x).toBeCloseTo(m.x, 15);
    expect(s.y + s.height).toBeCloseTo(m.y, 15);
    expect(matAt(evaluate(after).mats, 0).unsensedBitlines).toBe(0);
  });
});

describe('a mat whose cell overrides its pitches', () => {
  // Folded cell drawn at 50 nm bit-line pitch and 40 nm word-line pitch instead of 2F = 36 nm: lines step
  // 50 nm across and 40 nm down, and one cell (two folded bit lines, two word lines) 100 nm × 80 nm
  // (arithmetic). Before the fix, moves, resizes and drawing snapped to the F-based 36 nm / 72 nm steps.
  const base = designWith([mat({ id: 'm', x: 0, y: 0 })]);
  const overridden: Design = {
    ...base,
    cells: base.cells.map((c) =>
      c.id === FOLDED_8F2_CELL.id
        ? { ...c, pitchOverride: { bitlinePitch: 50e-9, wordlinePitch: 40e-9 } }
        : c,
    ),
  };
  const rect = rectOf(overridden, 'm');
  const centre = { x: rect.x + rect.width / 2, y: rect.y + rect.height / 2 };
  const isWhole = (value: number, step: number) =>
    expect(Math.abs(value / step - Math.round(value / step))).toBeLessThan(1e-6);

  it('is sized from the override', () => {
    expect(rect.width).toBeCloseTo(512 * 100e-9, 15);
    expect(rect.height).toBeCloseTo(512 * 80e-9, 15);
  });

  it('moves in whole line pitches of the override', () => {
    const press = pressWithSelectTool(context(overridden), centre, false);
    const p = { x: centre.x + 1.013e-6, y: centre.y + 0.507e-6 };
    press.gesture.move(p, NO_KEYS);
    const args = press.gesture.finish(p, true, NO_KEYS).call?.args as { dx: number; dy: number };
    isWhole(args.dx, 50e-9);
    isWhole(args.dy, 40e-9);
    expect(args.dx).toBeCloseTo(20 * 50e-9, 15);
    expect(args.dy).toBeCloseTo(13 * 40e-9, 15);
  });

  it('resizes in whole cells of the override', () => {
    const east = { x: rect.x + rect.width, y: centre.y };
    const press = pressWithSelectTool(context(overridden, ['m']), east, false);
    expect(press.handle).toBe('e');
    const p = { x: east.x - 10 * 100e-9, y: east.y };
    press.gesture.move(p, NO_KEYS);
    const m = apply(overridden, press.gesture.finish(p, true, NO_KEYS)).blocks[0] as Mat;
    expect(m.cellsPerWordline).toBe(502);
  });

  it('draws in whole cells of the override (Alt: any count)', () => {
    const empty = { ...overridden, blocks: [] };
    const g = new DrawMatGesture(context(empty), { x: 0, y: 0 });
    const p = { x: 100 * 100e-9 + 10e-9, y: 50 * 80e-9 - 10e-9 };
    const alt = { shift: false, alt: true };
    g.move(p, alt);
    const drawn = apply(empty, g.finish(p, true, alt)).blocks[0] as Mat;
    expect(drawn).toMatchObject({ cellsPerWordline: 100, cellsPerBitline: 50 });
  });
});

describe('drawing tools', () => {
  it('a drag with the mat tool adds a mat of round cell counts (64s; powers of two with Shift; free with Alt)', () => {
    const empty = designWith([]);
    const ctx = context(empty);
    const ALT = { shift: false, alt: true };
    const SHIFT = { shift: true, alt: false };
    // 200 × 50 cells of 72 nm (folded 8F², F = 18 nm): 200 per word line across, 50 per bit line down.
    const p = { x: 200 * 72e-9 + 10e-9, y: 50 * 72e-9 - 10e-9 };
    const drawWith = (keys: typeof NO_KEYS) => {
      const g = new DrawMatGesture(ctx, { x: 0, y: 0 });
      g.move(p, keys);
      return { label: g.preview().label, result: g.finish(p, true, keys) };
    };
    const round = drawWith(NO_KEYS);
    // Nearest multiples of 64: 192 and 64; 64 × 384 bit lines = 24 Kib (arithmetic).
    expect(round.label).toBe('64 × 192 cells/BL × cells/WL · 24 Kib');
    expect(round.result.call?.command).toBe(addBlocks);
    expect(round.result.select).toBe('added');
    expect(apply(empty, round.result).blocks[0]).toMatchObject({
      id: 'mat-1',
      name: 'Mat 1',
      cellsPerWordline: 192,
      cellsPerBitline: 64,
    });
    expect(apply(empty, drawWith(SHIFT).result).blocks[0]).toMatchObject({
      cellsPerWordline: 256,
      cellsPerBitline: 64,
    });
    const drawn = apply(empty, drawWith(ALT).result).blocks[0] as Mat;
    expect(drawn).toMatchObject({ cellsPerWordline: 200, cellsPerBitline: 50 });

    const click = new DrawMatGesture(ctx, { x: 1e-6, y: 1e-6 }).finish({ x: 1e-6, y: 1e-6 }, false, NO_KEYS);
    expect(apply(empty, click).blocks[0]).toMatchObject({ cellsPerBitline: 512, cellsPerWordline: 512 });
  });

  it('placing strips near a lone mat’s edges, then decoders beside the stack, clears its checks', () => {
    let design = designWith([mat({ id: 'm', x: 20e-6, y: 20e-6 })]);
    const r = rectOf(design, 'm');
    expect(evaluate(design).findings.map((f) => f.kind)).toEqual(['unsensedBitlines', 'undrivenWordlines']);
    const clicks: [Block['type'], { x: number; y: number }][] = [
      ['senseAmpStrip', { x: r.x + r.width / 2, y: r.y - 1e-6 }],
      // A second strip at the other bit-line end lets the sense amplifiers alternate; with one, a folded
      // 8F² mat's amplifiers overflow their two-pitch budget.
      ['senseAmpStrip', { x: r.x + r.width / 2, y: r.y + r.height + 1e-6 }],
      ['wordlineDriverStrip', { x: r.x + 0.5e-6, y: r.y + r.height / 2 }],
    ];
    for (const [tool, point] of clicks) {
      if (tool === 'mat') continue;
      const ctx = context(design);
      const hover = placementAt(ctx, tool, point, buildSnapTargets([]));
      expect(hover.fit?.matId).toBe('m');
      design = apply(design, new PlaceStripGesture(ctx, tool, point).finish(point, false, NO_KEYS));
    }
    expect(evaluate(design).findings.map((f) => f.kind)).toEqual(['noRowDecoder', 'noColumnDecoder']);
    // The stack is the mat with its three strips; the decoders fit along its left side and its bottom.
    const stack = { x: r.x - 3e-6, y: r.y - 6e-6, width: r.width + 3e-6, height: r.height + 12e-6 };
    const decoders: [Block['type'], { x: number; y: number }][] = [
      ['rowDecoder', { x: stack.x - 2e-6, y: r.y + r.height / 2 }],
      ['columnDecoder', { x: r.x + r.width / 2, y: stack.y + stack.height + 3e-6 }],
    ];
    for (const [tool, point] of decoders) {
      if (tool === 'mat') continue;
      const ctx = context(design);
      expect(placementAt(ctx, tool, point, buildSnapTargets([])).stack?.stack.matCount).toBe(1);
      design = apply(design, new PlaceStripGesture(ctx, tool, point).finish(point, false, NO_KEYS));
    }
    const rowDecoder = rectOf(design, 'rowdec-1');
    expect(rowDecoder.x + rowDecoder.width).toBeCloseTo(stack.x, 12);
    expect(rowDecoder.y).toBeCloseTo(stack.y, 12);
    expect(rowDecoder.height).toBeCloseTo(stack.height, 12);
    const columnDecoder = rectOf(design, 'coldec-1');
    expect(columnDecoder).toMatchObject({ y: expect.closeTo(stack.y + stack.height, 12) });
    expect(columnDecoder.width).toBeCloseTo(stack.width, 12);
    expect(evaluate(design).findings).toEqual([]);
    expect(design.blocks.map((b) => b.id)).toEqual(['m', 'sa-1', 'sa-2', 'swd-1', 'rowdec-1', 'coldec-1']);
  });

  it('away from mats a strip gets its default size, and a drag draws its rectangle', () => {
    const design = designWith([]);
    const ctx = context(design);
    const click = new PlaceStripGesture(ctx, 'rowDecoder', { x: 0, y: 0 }).finish(
      { x: 0, y: 0 },
      false,
      NO_KEYS,
    );
    expect(apply(design, click).blocks[0]).toMatchObject({ type: 'rowDecoder', width: 18e-6, height: 80e-6 });
    const g = new PlaceStripGesture(ctx, 'spacer', { x: 0, y: 0 });
    const end = { x: 7.2e-6, y: 3.6e-6 };
    g.move(end, NO_KEYS);
    const drawn = apply(design, g.finish(end, true, NO_KEYS)).blocks[0];
    expect(drawn?.type).toBe('spacer');
    expect(drawn && drawn.type !== 'mat' && drawn.width).toBeCloseTo(7.2e-6, 12);
  });
});
