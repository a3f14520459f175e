import { matAt } from '../../src/engine/evaluation/matTable';
import { describe, expect, it } from 'vitest';
import { evaluate, findMatReport } from '../../src/engine';
import { gainReadCurrent } from '../../src/engine/physics/gainRead';
import { gridFloorplan } from '../../src/designs/gridFloorplan';
import type { Block, Strip } from '../../src/model/block';
import {
  DEMO_PROCESS,
  EDRAM_CELL,
  FOLDED_8F2_CELL,
  GAIN_3T_CELL,
  LOGIC_PROCESS,
  OPEN_6F2_CELL,
  VERTICAL_4F2_CELL,
} from '../../src/model/builtins';
import { cellFootprint, footprintInF2 } from '../../src/model/cell';
import { designWith, mat, processWith, servedMatFigures } from '../support/designs';
import { DEMO_STRIPS } from '../../src/designs/demoSizes';

const F = 18e-9;
const strip = (id: string, x: number, y: number, width: number, height: number): Strip => ({
  id,
  name: id,
  type: 'senseAmpStrip',
  x,
  y,
  width,
  height,
});
const driver = (id: string, x: number, y: number, height: number): Strip => ({
  id,
  name: id,
  type: 'wordlineDriverStrip',
  x,
  y,
  width: 3e-6,
  height,
});

describe('cell footprints', () => {
  it('6F² at F = 78 nm is 0.0365 µm², three quarters of 8F²', () => {
    // Source: common practice (8F² folded, 6F² open); shared/REFERENCES.md entry 16 (arithmetic).
    expect(cellFootprint(OPEN_6F2_CELL, 78e-9) * 1e12).toBeCloseTo(0.0365, 4);
    expect(footprintInF2(OPEN_6F2_CELL, 78e-9) / footprintInF2(FOLDED_8F2_CELL, 78e-9)).toBeCloseTo(0.75, 12);
    expect(footprintInF2(VERTICAL_4F2_CELL, F)).toBeCloseTo(4, 12);
  });

  it('an eDRAM cell of 0.026 µm² at 22 nm, entered as a pitch override, is 53.7 F²', () => {
    // Source: IBM eDRAM, IEDM 2014, 0.026 µm² at 22 nm (published; shared/REFERENCES.md entry 18); arithmetic.
    const drawn = { ...EDRAM_CELL, pitchOverride: { bitlinePitch: 0.1e-6, wordlinePitch: 0.13e-6 } };
    expect(cellFootprint(drawn, 22e-9) * 1e12).toBeCloseTo(0.026, 6);
    expect(footprintInF2(drawn, 22e-9)).toBeCloseTo(53.7, 1);
  });

  it('vertical 4F² mats alone have 4 F² per bit', () => {
    // Source: common practice, 4F² vertical-transistor cell (shared/REFERENCES.md entry 16).
    const f = servedMatFigures(VERTICAL_4F2_CELL, DEMO_PROCESS, 512);
    expect(f.cellFootprint / (F * F)).toBeCloseTo(4, 9);
  });
});

describe('open bit lines at the array edge', () => {
  // Two open 6F² mats of 256 × 256 stacked, strips above, between and below.
  const cell = OPEN_6F2_CELL;
  const width = 256 * 3 * F;
  const height = 256 * 2 * F;
  const sa = 5e-6;
  const upper = mat({
    id: 'upper',
    cellId: cell.id,
    cellsPerBitline: 256,
    cellsPerWordline: 256,
    x: 0,
    y: sa,
  });
  const lower = mat({
    id: 'lower',
    cellId: cell.id,
    cellsPerBitline: 256,
    cellsPerWordline: 256,
    x: 0,
    y: 2 * sa + height,
  });
  const strips = [
    strip('s0', 0, 0, width, sa),
    strip('s1', 0, sa + height, width, sa),
    strip('s2', 0, 2 * (sa + height), width, sa),
  ];
  const drivers = [driver('d0', -3e-6, sa, height), driver('d1', -3e-6, 2 * sa + height, height)];

  it('the outermost mats lose the half of their bit lines that end at the edge strips', () => {
    // Source: Takahashi et al., IEEE JSSC 36(11), 2001; Sekiguchi, Itoh et al., IEEE JSSC 2002: the edge mats
    // have no partner for half their bit lines (published).
    const r = evaluate(designWith([upper, lower, ...strips, ...drivers]));
    expect(findMatReport(r, 'upper')?.figures.lostBits).toBe(128 * 256);
    expect(findMatReport(r, 'lower')?.figures.lostBits).toBe(128 * 256);
    expect(r.totals.usableBits).toBe(r.totals.bits / 2);
    // Both edge mats lose the same number of bits, so the checks group them into one finding.
    const edge = r.findings.filter((f) => f.kind === 'openBitlineEdge');
    expect(edge).toHaveLength(1);
    expect(edge[0]?.blockIds).toEqual(['upper', 'lower']);
    expect(edge[0]?.message).toMatch(/^2 mats \(M1, M1\): 32,768 bits/);
  });

  it('a lone open mat cannot be read at all; folded mats lose nothing', () => {
    const r = evaluate(designWith([upper, strips[0] as Block, strips[1] as Block, drivers[0] as Block]));
    expect(findMatReport(r, 'upper')?.figures.usableBits).toBe(0);
    const folded = mat({ id: 'f', cellsPerBitline: 256, cellsPerWordline: 256, x: 0, y: sa });
    const fw = 512 * 2 * F;
    const rf = evaluate(
      designWith([folded, strip('a', 0, 0, fw, sa), strip('b', 0, sa + 512 * 2 * F, fw, sa)]),
    );
    // Folded pairs need no partner mat (its word lines reach no driver here, which is a different loss).
    expect(findMatReport(rf, 'f')?.figures.unpartneredBits).toBe(0);
  });

  it('area per bit counts only usable bits', () => {
    const r = evaluate(designWith([upper, lower, ...strips, ...drivers]));
    expect(r.totals.areaPerBit).toBeCloseTo(r.totals.totalArea / r.totals.usableBits, 25);
  });
});

describe('checks from physics', () => {
  const clean = gridFloorplan({
    cell: FOLDED_8F2_CELL,
    featureSize: F,
    matRows: 2,
    matColumns: 2,
    cellsPerBitline: 512,
    cellsPerWordline: 512,
    ...DEMO_STRIPS,
    rowDecoderWidth: 10e-6,
    columnDecoderHeight: 10e-6,
  });
  const kinds = (blocks: Block[], overrides = {}) =>
    new Set(
      evaluate(designWith(blocks, processWith(overrides))).findings.map((f) => `${f.kind}:${f.severity}`),
    );

  it('the clean grid passes', () => {
    expect(kinds(clean)).toEqual(new Set());
  });

  it('long bit lines push the margin below zero', () => {
    const long = clean.map((b) => (b.type === 'mat' ? { ...b, cellsPerBitline: 4096 } : b));
    expect(kinds(long).has('senseMargin:error')).toBe(true);
  });

  it('a margin above zero but under the target is a warning', () => {
    const r = evaluate(designWith(clean));
    const margin = r.totals.worstSenseMargin;
    const design = designWith(clean);
    const strict = { ...design, operating: { ...design.operating, minimumSenseMargin: margin + 0.001 } };
    const found = evaluate(strict).findings.map((f) => `${f.kind}:${f.severity}`);
    expect(found).toContain('senseMargin:warning');
    expect(found).not.toContain('senseMargin:error');
  });

  it('leakage that drains the cell within the refresh window fails retention', () => {
    expect(kinds(clean, { cellLeakageCurrent: 1e-11 }).has('retention:error')).toBe(true);
  });

  it('an amplifier wider than its pitch budget is flagged', () => {
    expect(kinds(clean, { senseAmpWidth: 0.2e-6 }).has('senseAmpPitch:error')).toBe(true);
  });
});

describe('gain cells', () => {
  const blocks = (cellsPerBitline: number): Block[] =>
    gridFloorplan({
      cell: GAIN_3T_CELL,
      featureSize: LOGIC_PROCESS.featureSize,
      matRows: 1,
      matColumns: 1,
      cellsPerBitline,
      cellsPerWordline: 128,
      senseAmpStripHeight: 4e-6,
      wordlineDriverStripWidth: 2e-6,
      rowDecoderWidth: 0,
      columnDecoderHeight: 0,
    });
  const gainDesign = (n: number) => {
    const d = designWith(blocks(n), LOGIC_PROCESS);
    return { ...d, operating: { ...d.operating, refreshWindow: 20e-6 } };
  };

  it('read current follows the square law: β 20 µA/V², V 0.8 V, Vt 0.3 V → 2.5 µA', () => {
    // Source: Shichman–Hodges square law I = (β/2)(V − Vt)² (from memory); arithmetic.
    const read = GAIN_3T_CELL.gainRead;
    if (!read) throw new Error('3T cell has read values');
    expect(gainReadCurrent(read, 0.8)).toBeCloseTo(2.5e-6, 12);
    expect(gainReadCurrent(read, 0.2)).toBe(0);
  });

  it('reads by current into a read bit line at VDD, inverting and non-destructive', () => {
    const m = matAt(evaluate(gainDesign(64)).mats, 0);
    if (m?.figures.read.kind !== 'gainRead') throw new Error('gain cells read by current');
    const t = LOGIC_PROCESS.gainCellSenseTime;
    expect(m.figures.read.dropHigh).toBeCloseTo(
      (m.figures.read.readCurrent * t) / m.figures.bitlineCapacitance.total,
      12,
    );
    expect(m.figures.senseSignal).toBeCloseTo((m.figures.read.dropHigh - m.figures.read.dropLow) / 2, 12);
    expect(m.figures.senseSignal).toBeGreaterThan(0);
    // Single-ended against a reference: no partner mat is needed, so no bits are lost at the edge.
    expect(m.figures.lostBits).toBe(0);
  });

  it('more cells on a read bit line means less signal, and retention is microseconds in a logic process', () => {
    const short = matAt(evaluate(gainDesign(32)).mats, 0);
    const long = matAt(evaluate(gainDesign(256)).mats, 0);
    expect(long?.figures.senseSignal).toBeLessThan(short?.figures.senseSignal ?? 0);
    expect(short?.figures.retentionTime).toBeGreaterThan(1e-6);
    expect(short?.figures.retentionTime).toBeLessThan(1e-3);
  });
});
