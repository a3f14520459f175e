import { describe, expect, it } from 'vitest';
import { evaluate } from '../../src/engine';
import type { Block } from '../../src/model/block';
import { FOLDED_8F2_CELL } from '../../src/model/builtins';
import { designWith, mat, strip } from '../support/designs';

/**
 * A floorplan of `mats` folded mats stacked along the bit lines, each with `perBitline` cells per bit line
 * and `perWordline` per word line (2·perWordline bit lines, 2·perBitline·perWordline bits) of the given
 * drawn cell area, with sense-amplifier strips between and around them and a driver strip
 * beside them (so every bit is usable), and a filler block that makes the bounding box `dieArea`.
 */
function dieOf(cellArea: number, mats: number, perBitline: number, perWordline: number, dieArea: number) {
  // A folded cell occupies every other crossing: footprint = bit-line pitch × word-line pitch / ½.
  const pitch = Math.sqrt(cellArea / 2);
  const cell = {
    ...FOLDED_8F2_CELL,
    id: 'drawn',
    pitchOverride: { bitlinePitch: pitch, wordlinePitch: pitch },
  };
  const side = 2 * perWordline * pitch;
  const height = 2 * perBitline * pitch;
  const sa = 10e-6;
  const driver = 10e-6;
  const blocks: Block[] = [strip('sa0', 'senseAmpStrip', driver, 0, side, sa)];
  for (let i = 0; i < mats; i++) {
    const y = sa + i * (height + sa);
    blocks.push(
      mat({
        id: `m${i}`,
        cellId: cell.id,
        cellsPerBitline: perBitline,
        cellsPerWordline: perWordline,
        x: driver,
        y,
      }),
      strip(`sa${i + 1}`, 'senseAmpStrip', driver, y + height, side, sa),
      strip(`d${i}`, 'wordlineDriverStrip', 0, y, driver, height),
    );
  }
  const used = sa + mats * (height + sa);
  blocks.push(strip('filler', 'columnDecoder', 0, used, side + driver, dieArea / (side + driver) - used));
  return { ...designWith(blocks), cells: [cell] };
}

describe('array efficiency of published dies', () => {
  it('a 1-Gbit DRAM of 0.38 µm × 0.76 µm cells on a 19 mm × 38 mm chip is 40 % cells', () => {
    // Source: A. S. Sedra, K. C. Smith, Microelectronic Circuits, Oxford University Press, problem 16.15
    // (memory chapter; the edition is from memory): a 1-Gbit DRAM with a 0.38 µm × 0.76 µm cell on a
    // 19 mm × 38 mm chip; the worked solution published with the problem finds the cells take 0.289 of
    // 0.722 (in cm² × 10), i.e. 40 % of the chip, the periphery 60 % (published answer; it counts 1 Gbit
    // as 10⁹ bits). Two folded mats of 15,625 cells per bit line and 16,000 per word line (32,000 bit lines)
    // hold exactly 10⁹ bits.
    const design = dieOf(0.38e-6 * 0.76e-6, 2, 15625, 16000, 19e-3 * 38e-3);
    const t = evaluate(design).totals;
    expect(t.bits).toBe(1e9);
    expect(t.usableBits).toBe(1e9);
    expect(t.totalArea).toBeCloseTo(722e-6, 12);
    expect(t.arrayEfficiency).toBeCloseTo(0.4, 3);
  });
});
