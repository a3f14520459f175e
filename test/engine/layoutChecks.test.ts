import { describe, expect, it } from 'vitest';
import { evaluate } from '../../src/engine';
import { previewReport, preparePreview } from '../../src/engine';
import { gridFloorplan } from '../../src/designs/gridFloorplan';
import type { Block } from '../../src/model/block';
import { DEMO_PROCESS, FOLDED_8F2_CELL } from '../../src/model/builtins';
import { demoDesign } from '../../src/designs/demoDesign';
import { designWith, mat, strip } from '../support/designs';

const F = 18e-9;
/** A folded 512 × 512 mat is 1024 lines at 2F each way: 36.864 µm square (arithmetic). */
const SIDE = 1024 * 2 * F;
const SA = 6e-6;
const SWD = 3e-6;

/** Mat at (x, y) with a sense-amplifier strip above and below and a driver strip on its left. */
function servedMat(id: string, x: number, y: number): Block[] {
  return [
    mat({ id, name: id, x, y }),
    strip(`${id}-sa-top`, 'senseAmpStrip', x, y - SA, SIDE, SA),
    strip(`${id}-sa-bottom`, 'senseAmpStrip', x, y + SIDE, SIDE, SA),
    strip(`${id}-swd`, 'wordlineDriverStrip', x - SWD, y, SWD, SIDE),
  ];
}

const findingOf = (blocks: Block[], kind: string) =>
  evaluate(designWith(blocks)).findings.find((f) => f.kind === kind);

describe('decoder reach', () => {
  it('mats without decoders get one warning for word lines and one for bit lines, naming them', () => {
    const rows = findingOf(servedMat('A', 20e-6, 20e-6), 'noRowDecoder');
    expect(rows).toMatchObject({ severity: 'warning', blockIds: ['A'] });
    expect(rows?.message).toMatch(/^A: word lines reach no row decoder/);
    expect(findingOf(servedMat('A', 20e-6, 20e-6), 'noColumnDecoder')?.blockIds).toEqual(['A']);
  });

  it('a row decoder beside the driver strip reaches the mat; one elsewhere does not', () => {
    const blocks = servedMat('A', 20e-6, 20e-6);
    const beside = strip('rd', 'rowDecoder', 20e-6 - SWD - 18e-6, 20e-6, 18e-6, SIDE);
    expect(findingOf([...blocks, beside], 'noRowDecoder')).toBeUndefined();
    const away = strip('rd', 'rowDecoder', 200e-6, 20e-6, 18e-6, SIDE);
    expect(findingOf([...blocks, away], 'noRowDecoder')?.blockIds).toEqual(['A']);
  });

  it('word lines reach through a row of mats and shared driver strips', () => {
    // A | swd | B, row decoder left of A's driver: B is reached through A.
    const a = servedMat('A', 20e-6, 20e-6);
    const bx = 20e-6 + SIDE + SWD;
    const b = [
      mat({ id: 'B', name: 'B', x: bx, y: 20e-6 }),
      strip('B-swd', 'wordlineDriverStrip', 20e-6 + SIDE, 20e-6, SWD, SIDE),
    ];
    const decoder = strip('rd', 'rowDecoder', 20e-6 - SWD - 18e-6, 20e-6, 18e-6, SIDE);
    expect(findingOf([...a, ...b, decoder], 'noRowDecoder')).toBeUndefined();
    // Without the strip between them, B's word lines reach nothing.
    const cut = [
      ...a,
      b[0] as Block,
      strip('B-swd', 'wordlineDriverStrip', bx + SIDE, 20e-6, SWD, SIDE),
      decoder,
    ];
    expect(findingOf(cut, 'noRowDecoder')?.blockIds).toEqual(['B']);
  });

  it('a column decoder under the bottom sense-amplifier strip reaches the column', () => {
    const blocks = servedMat('A', 20e-6, 20e-6);
    const below = strip('cd', 'columnDecoder', 20e-6, 20e-6 + SIDE + SA, SIDE, 14e-6);
    expect(findingOf([...blocks, below], 'noColumnDecoder')).toBeUndefined();
    // Beside the mat's word-line end it serves no column path.
    const beside = strip('cd', 'columnDecoder', 20e-6 + SIDE, 20e-6, 14e-6, SIDE);
    expect(findingOf([...blocks, beside], 'noColumnDecoder')?.blockIds).toEqual(['A']);
  });

  it('a mat with no driver at all has the undriven error, not the decoder warning too', () => {
    const kinds = evaluate(designWith([mat({ id: 'lone' })])).findings.map((f) => f.kind);
    expect(kinds).toContain('undrivenWordlines');
    expect(kinds).not.toContain('noRowDecoder');
  });

  it('the demo bank and built grids reach their decoders; a grid without them warns for every mat', () => {
    expect(evaluate(demoDesign()).findings).toEqual([]);
    const bare = gridFloorplan({
      cell: FOLDED_8F2_CELL,
      featureSize: DEMO_PROCESS.featureSize,
      matRows: 3,
      matColumns: 2,
      cellsPerBitline: 512,
      cellsPerWordline: 512,
      senseAmpStripHeight: SA,
      wordlineDriverStripWidth: SWD,
      rowDecoderWidth: 0,
      columnDecoderHeight: 0,
    });
    const findings = evaluate(designWith(bare)).findings;
    expect(findings.map((f) => [f.kind, f.blockIds.length])).toEqual([
      ['noRowDecoder', 6],
      ['noColumnDecoder', 6],
    ]);
  });

  it('the live preview reports the same decoder findings as evaluate()', () => {
    const blocks = [...servedMat('A', 20e-6, 20e-6), strip('rd', 'rowDecoder', 200e-6, 20e-6, 18e-6, SIDE)];
    const design = designWith(blocks);
    const base = preparePreview(design, evaluate(design), ['rd']);
    const moved = { ...(blocks[4] as Block), x: 20e-6 - SWD - 18e-6 };
    const live = previewReport(base, [moved]);
    const full = evaluate(designWith([...blocks.slice(0, 4), moved]));
    expect(live.findings).toEqual(full.findings);
    expect(live.findings.some((f) => f.kind === 'noRowDecoder')).toBe(false);
  });
});

describe('strips back to back', () => {
  it('two sense-amplifier strips stacked between two mats warn once, naming both', () => {
    // Mat A with its own bottom strip, mat B below with its own top strip: the strips touch along their length.
    const a = servedMat('A', 20e-6, 20e-6);
    const b = servedMat('B', 20e-6, 20e-6 + SIDE + 2 * SA);
    const f = findingOf([...a, ...b], 'backToBackStrips');
    expect(f?.severity).toBe('warning');
    expect(f?.blockIds).toEqual(['A-sa-bottom', 'B-sa-top']);
    expect(f?.message).toMatch(/A-sa-bottom and B-sa-top are sense-amplifier strips back to back/);
  });

  it('one shared strip between the mats, or strips meeting end to end, give no warning', () => {
    const a = servedMat('A', 20e-6, 20e-6);
    const b = servedMat('B', 20e-6, 20e-6 + SIDE + SA).filter((x) => x.id !== 'B-sa-top');
    expect(findingOf([...a, ...b], 'backToBackStrips')).toBeUndefined();
    // Two half-length strips covering one edge between them meet end to end.
    const halves = [
      mat({ id: 'M', x: 20e-6, y: 20e-6 }),
      strip('h1', 'senseAmpStrip', 20e-6, 20e-6 - SA, SIDE / 2, SA),
      strip('h2', 'senseAmpStrip', 20e-6 + SIDE / 2, 20e-6 - SA, SIDE / 2, SA),
    ];
    expect(findingOf(halves, 'backToBackStrips')).toBeUndefined();
  });

  it('driver strips back to back between two mat columns warn too', () => {
    const a = servedMat('A', 20e-6, 20e-6);
    const rightDriver = strip('A-swd-right', 'wordlineDriverStrip', 20e-6 + SIDE, 20e-6, SWD, SIDE);
    const b = servedMat('B', 20e-6 + SIDE + 2 * SWD, 20e-6);
    const f = findingOf([...a, rightDriver, ...b], 'backToBackStrips');
    expect(f?.blockIds).toEqual(['A-swd-right', 'B-swd']);
  });
});
