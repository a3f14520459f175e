import { matAt } from '../../src/engine/evaluation/matTable';
import { allMats } from '../../src/engine/evaluation/matExports';
import { describe, expect, it } from 'vitest';
import {
  evaluate,
  explainMatFigure,
  explainTotal,
  findMatReport,
  MAT_FIGURES,
  matFigureApplies,
  TOTAL_FIGURES,
} from '../../src/engine';
import { senseAmpStripIdsOf, wordlineDriverIdsOf } from '../../src/engine/evaluation/matExports';
import type { Block } from '../../src/model/block';
import { demoDesign } from '../../src/designs/demoDesign';
import { DEMO_PROCESS, FOLDED_8F2_CELL, OPEN_6F2_CELL } from '../../src/model/builtins';
import { designWith, mat, processWith, servedMatFigures, strip } from '../support/designs';

const F = 18e-9;

/** A folded 512×512 mat at (10 µm, 10 µm): 1024 bit lines at 2F, 1024 word lines at 2F → 36.864 µm square. */
const SIDE = 1024 * 2 * F;
const M = mat({ x: 10e-6, y: 10e-6 });
const saTop = strip('sa-top', 'senseAmpStrip', 10e-6, 4e-6, SIDE, 6e-6);
const saBottom = strip('sa-bottom', 'senseAmpStrip', 10e-6, 10e-6 + SIDE, SIDE, 6e-6);
const swdLeft = strip('swd-left', 'wordlineDriverStrip', 7e-6, 10e-6, 3e-6, SIDE);

describe('evaluate: one mat', () => {
  it('derives geometry and bits from the cell, F and the cell counts', () => {
    // Source: common practice (no source): folded 8F² = 2F × 2F pitches at half occupancy.
    const r = evaluate(designWith([M, saTop, swdLeft]));
    const m = findMatReport(r, 'm1');
    expect(m?.figures.bitlineCount).toBe(1024);
    expect(m?.figures.wordlineCount).toBe(1024);
    expect(m?.figures.bits).toBe(512 * 1024);
    expect(m?.figures.bitlineLength).toBeCloseTo(SIDE, 15);
    expect(m?.figures.area).toBeCloseTo(SIDE * SIDE, 20);
    expect(m?.figures.cellArea).toBeCloseTo(512 * 1024 * 8 * F * F, 20);
  });

  it('sums the bit-line capacitance from its parts and shares charge with the cell', () => {
    const p = processWith({});
    const r = evaluate(designWith([M, saTop, swdLeft], p));
    const m = findMatReport(r, 'm1');
    // Arithmetic: a folded bit line of 512 cells crosses 1024 word lines; couplings count crossings.
    const expected =
      512 * p.bitlineJunctionCapacitancePerCell +
      1024 * (p.bitlineToWordlineCapacitancePerCrossing + p.bitlineToBitlineCapacitancePerCrossing) +
      p.bitlineWireCapacitancePerLength * SIDE +
      p.senseAmpInputCapacitance;
    expect(m?.figures.bitlineCapacitance.total).toBeCloseTo(expected, 25);
    const ctr = 11e-15 / (11e-15 + expected);
    if (m?.figures.read.kind !== 'chargeSharing') throw new Error('1T1C mats read by charge sharing');
    expect(m.figures.read.chargeTransferRatio).toBeCloseTo(ctr, 12);
    expect(m.figures.read.signalLow).toBeCloseTo(0.55 * ctr, 12);
    expect(m.figures.read.signalHigh).toBeCloseTo((1.1 - 0.55) * ctr, 12);
  });

  it('a folded 8F² mat has 8 F² per bit and fills its outline; open 6F² has 6 F²', () => {
    // Source: cell footprints 8F² folded, 6F² open (common practice; shared/REFERENCES.md entry 16).
    const folded = servedMatFigures(FOLDED_8F2_CELL, DEMO_PROCESS, 512);
    expect(folded.cellFootprint / (F * F)).toBeCloseTo(8, 9);
    expect(folded.cellArea / folded.area).toBeCloseTo(1, 9);
    expect(servedMatFigures(OPEN_6F2_CELL, DEMO_PROCESS, 512).cellFootprint / (F * F)).toBeCloseTo(6, 9);
  });

  it('array efficiency of a 1 Gb, 0.109 µm² cell on 180 mm² is 65.0 %', () => {
    // Source: Takahashi et al., "A Multigigabit DRAM Technology With 6F² Open-Bitline Cell…",
    // IEEE JSSC 36(11), 2001: 1 Gb, cell 0.109 µm², die 180 mm² (published inputs; arithmetic → 65.0 %).
    // Four folded mats of 2^28 cells with a drawn cell of 0.109 µm², sense-amplifier strips between and
    // around them and a driver strip beside them (so every bit is usable); a filler block makes the
    // bounding box 180 mm².
    const f = 18e-9;
    const cell = {
      ...FOLDED_8F2_CELL,
      id: 'takahashi',
      // 0.109 µm² = bit-line pitch × word-line pitch / ½.
      pitchOverride: { bitlinePitch: Math.sqrt(0.109e-12 / 2), wordlinePitch: Math.sqrt(0.109e-12 / 2) },
    };
    const pitch = cell.pitchOverride.bitlinePitch;
    const side = 16384 * pitch; // 16384 bit lines across (8192 cells per word line)
    const height = 2 * 16384 * pitch; // 32768 word lines along (16384 cells per bit line)
    const sa = 10e-6;
    const driver = 10e-6;
    const blocks: Block[] = [strip('sa0', 'senseAmpStrip', driver, 0, side, sa)];
    for (let i = 0; i < 4; i++) {
      const y = sa + i * (height + sa);
      blocks.push(
        mat({ id: `m${i}`, cellId: cell.id, cellsPerBitline: 16384, cellsPerWordline: 8192, x: driver, y }),
        strip(`sa${i + 1}`, 'senseAmpStrip', driver, y + height, side, sa),
        strip(`d${i}`, 'wordlineDriverStrip', 0, y, driver, height),
      );
    }
    const used = sa + 4 * (height + sa);
    const fillerHeight = 180e-6 / (side + driver) - used;
    blocks.push(strip('filler', 'columnDecoder', 0, used, side + driver, fillerHeight));
    const design = { ...designWith(blocks, processWith({ featureSize: f })), cells: [cell] };
    const t = evaluate(design).totals;
    expect(t.bits).toBe(2 ** 30);
    expect(t.totalArea).toBeCloseTo(180e-6, 12);
    expect(t.arrayEfficiency).toBeCloseTo(0.65, 3);
  });
});

describe('evaluate: adjacency checks', () => {
  // These designs have no decoders; what the decoders reach is tested in decoderReach.test.ts.
  const kinds = (blocks: Block[]) =>
    evaluate(designWith(blocks))
      .findings.map((f) => f.kind)
      .filter((k) => k !== 'noRowDecoder' && k !== 'noColumnDecoder');

  it('a mat with sense-amp strips on both bit-line ends and a driver on one word-line end is clean', () => {
    expect(kinds([M, saTop, saBottom, swdLeft])).toEqual([]);
    // The strips serving it are listed by kind, in design order, and a strip elsewhere is not.
    const far = strip('sa-far', 'senseAmpStrip', 100e-6, 100e-6, SIDE, 6e-6);
    const r = evaluate(designWith([M, saBottom, swdLeft, far, saTop]));
    expect(senseAmpStripIdsOf(r.mats, 0)).toEqual(['sa-bottom', 'sa-top']);
    expect(wordlineDriverIdsOf(r.mats, 0)).toEqual(['swd-left']);
  });

  it('with one strip the sense amplifiers cannot interleave and overflow a folded 2-pitch budget', () => {
    // 0.1 µm amplifier against 2 × 36 nm; both ends give 4 × 36 nm = 144 nm (Keeth & Baker, from memory).
    expect(kinds([M, saTop, swdLeft])).toEqual(['senseAmpPitch']);
    expect(kinds([M, saBottom, swdLeft])).toEqual(['senseAmpPitch']);
    expect(findMatReport(evaluate(designWith([M, saTop, swdLeft])), 'm1')?.unsensedBitlines).toBe(0);
  });

  it('with no sense-amp strip every bit line is unsensed', () => {
    const m = findMatReport(evaluate(designWith([M, swdLeft])), 'm1');
    expect(m?.unsensedBitlines).toBe(1024);
    expect(kinds([M, swdLeft])).toEqual(['unsensedBitlines']);
  });

  it('a strip covering half the edge leaves half the bit lines unsensed', () => {
    const half = strip('sa-half', 'senseAmpStrip', 10e-6, 4e-6, SIDE / 2, 6e-6);
    expect(findMatReport(evaluate(designWith([M, half, swdLeft])), 'm1')?.unsensedBitlines).toBe(512);
  });

  it('half strips on opposite ends cover the whole mat between them', () => {
    const leftHalfTop = strip('a', 'senseAmpStrip', 10e-6, 4e-6, SIDE / 2, 6e-6);
    const rightHalfBottom = strip('b', 'senseAmpStrip', 10e-6 + SIDE / 2, 10e-6 + SIDE, SIDE / 2, 6e-6);
    expect(
      findMatReport(evaluate(designWith([M, leftHalfTop, rightHalfBottom, swdLeft])), 'm1')?.unsensedBitlines,
    ).toBe(0);
  });

  it('a strip on a word-line end does not sense, and a gap of 1 nm is not abutment', () => {
    const saOnSide = strip('sa-side', 'senseAmpStrip', 4e-6, 10e-6, 6e-6, SIDE);
    expect(kinds([M, saOnSide, swdLeft])).toContain('unsensedBitlines');
    const saGap = strip('sa-gap', 'senseAmpStrip', 10e-6, 4e-6 - 2e-9, SIDE, 6e-6);
    expect(kinds([M, saGap, swdLeft])).toContain('unsensedBitlines');
  });

  it('horizontal bit lines are sensed on the left and right edges', () => {
    const h = mat({ x: 10e-6, y: 10e-6, bitlineAxis: 'horizontal' });
    const saLeft = strip('sa-left', 'senseAmpStrip', 4e-6, 10e-6, 6e-6, SIDE);
    const saRight = strip('sa-right', 'senseAmpStrip', 10e-6 + SIDE, 10e-6, 6e-6, SIDE);
    const swdTop = strip('swd-top', 'wordlineDriverStrip', 10e-6, 7e-6, SIDE, 3e-6);
    expect(kinds([h, saLeft, saRight, swdTop])).toEqual([]);
    expect(kinds([h, saTop, swdLeft])).toEqual(['unsensedBitlines', 'undrivenWordlines']);
  });

  it('overlapping blocks are reported once per pair, abutting ones not at all', () => {
    const overlapping = mat({ id: 'm2', x: 10e-6 + SIDE / 2, y: 10e-6 });
    const f = evaluate(designWith([M, overlapping, saTop, swdLeft])).findings.filter(
      (x) => x.kind === 'overlap',
    );
    expect(f).toHaveLength(1);
    expect(f[0]?.blockIds).toEqual(['m1', 'm2']);
    const abutting = mat({ id: 'm2', x: 10e-6 + SIDE, y: 10e-6 });
    expect(evaluate(designWith([M, abutting])).findings.some((x) => x.kind === 'overlap')).toBe(false);
  });

  it('a low word-line boost gives a warning naming the VPP needed', () => {
    const r = evaluate(designWith([M, saTop, saBottom, swdLeft], processWith({ wordlineHighVoltage: 1.5 })));
    const w = r.findings.find((x) => x.kind === 'storedHighLimited');
    expect(w?.severity).toBe('warning');
    expect(w?.message).toMatch(/VPP ≥ 2\.064 V/);
  });
});

describe('evaluate: the demo design', () => {
  it('has 16 mats, 8 Mib, no findings and a sense signal between 50 and 150 mV', () => {
    const r = evaluate(demoDesign());
    expect(r.totals.matCount).toBe(16);
    expect(r.totals.bits).toBe(16 * 512 * 1024);
    expect(r.findings).toEqual([]);
    expect(r.totals.worstSenseSignal).toBeGreaterThan(0.05);
    expect(r.totals.worstSenseSignal).toBeLessThan(0.15);
    expect(r.totals.arrayEfficiency).toBeGreaterThan(0.5);
    expect(r.totals.arrayEfficiency).toBeLessThan(1);
  });

  it('mats of one kind share one figures object but keep their own identity and connections', () => {
    const r = evaluate(demoDesign());
    const kinds = new Set(allMats(r.mats).map((m) => m.figures));
    // Every demo mat has the same cell and counts; edge rows differ only in which strips serve them.
    expect(kinds.size).toBeLessThan(r.mats.count);
    expect(new Set(allMats(r.mats).map((m) => m.matId)).size).toBe(r.mats.count);
    const [a, b] = allMats(r.mats);
    if (!a || !b) throw new Error('demo has fewer than two mats');
    expect(a.figures).toBe(b.figures);
    expect(senseAmpStripIdsOf(r.mats, 0)).not.toEqual(senseAmpStripIdsOf(r.mats, 1));
    // Sharing changes no figure: every demo mat reads the same signal.
    expect(allMats(r.mats).every((m) => m.figures.senseSignal === a.figures.senseSignal)).toBe(true);
  });
});

describe('evaluate: area by block type', () => {
  it('splits the placed area into mats, strips and decoders, summing to the placed area', () => {
    // Source: arithmetic on the demo's own blocks (16 mats of 36.864 µm square, 20 SA strips 36.864 × 6 µm).
    const t = evaluate(demoDesign()).totals;
    const side = 1024 * 2 * 18e-9;
    expect(t.areaByType.mat).toBeCloseTo(16 * side * side, 18);
    expect(t.areaByType.senseAmpStrip).toBeCloseTo(20 * side * 6e-6, 18);
    const sum = Object.values(t.areaByType).reduce((a, b) => a + b, 0);
    expect(sum).toBeCloseTo(t.placedArea, 18);
  });
});

describe('explained figures', () => {
  it('every total and every mat figure is explained, and shown in exactly one panel group', () => {
    // Source: common practice (no source): each figure in the UI must explain itself.
    const design = demoDesign();
    const report = evaluate(design);
    const mat = matAt(report.mats, 0);
    if (!mat) throw new Error('demo has mats');
    for (const key of TOTAL_FIGURES) expect(explainTotal(key, report, design)?.title).not.toBe('');
    for (const key of MAT_FIGURES) {
      if (matFigureApplies(key, mat)) expect(explainMatFigure(key, mat, design, report)?.title).toBeTruthy();
    }
    expect(new Set(TOTAL_FIGURES).size).toBe(TOTAL_FIGURES.length);
    expect(new Set(MAT_FIGURES).size).toBe(MAT_FIGURES.length);
    expect(TOTAL_FIGURES).toContain('blockAreas');
  });
});
