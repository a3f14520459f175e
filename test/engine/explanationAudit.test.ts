import { describe, expect, it } from 'vitest';
import { buildPartition } from '../../src/designs/buildPartition';
import { demoDesign } from '../../src/designs/demoDesign';
import { DEMO_STRIPS } from '../../src/designs/demoSizes';
import {
  allMats,
  BANK_FIGURE_CATALOGUE,
  drivenLineTime,
  evaluate,
  explainFigure,
  explainMatFigure,
  explainTotal,
  figuresFromReport,
  MAT_FIGURES,
  TOTAL_FIGURES,
  upperTailQuantile,
  type Explanation,
} from '../../src/engine';
import { BUILTIN_CELLS, DEFAULT_OPERATING, DEMO_PROCESS } from '../../src/model/builtins';
import type { Design } from '../../src/model/design';

// Audit of every explanation a panel shows: its inputs are listed, every input is a number or the
// figure itself does not exist (then it carries its reason), and where the formula can be redone from
// the listed inputs alone, redoing it gives the value shown. These are arithmetic checks of the
// explanations against the engine: an explanation that shows an old formula, or leaves out an input
// its formula uses, fails here.

/** The values of an explanation's inputs by symbol; a missing symbol throws (the input is not listed). */
function inputsOf(e: Explanation): (symbol: string) => number {
  return (symbol) => {
    const found = e.inputs.find((i) => i.symbol === symbol);
    if (!found) throw new Error(`"${e.title}" does not list the input ${symbol} its formula uses`);
    return found.value;
  };
}

/**
 * Redoes a figure from the inputs its explanation lists: pairs of [redone, shown] (the value itself or
 * one of its listed intermediate inputs). A key without a rule is only checked for its inputs.
 */
type Redo = (v: (symbol: string) => number, e: Explanation) => [number, number][];

const lineTime = (v: (s: string) => number, share: number) =>
  drivenLineTime(v('R_drv'), v('R_wl'), v('C_wl'), share);
const developmentTau = (v: (s: string) => number) =>
  (v('R_acc') * v('Cs') * v('Cbl')) / (v('Cs') + v('Cbl')) + (v('R_bl') * v('Cbl')) / 2;

const MAT_RULES: Record<string, Redo> = {
  bitlineCapacitance: (v, e) => [[v('N·Cj') + v('N_wl·Cbw') + v('N_wl·Cbb') + v('c·L') + v('C_sa'), e.value]],
  chargeTransferRatio: (v, e) => [[v('Cs') / (v('Cs') + v('Cbl')), e.value]],
  signalHigh: (v, e) => [[(v('V1') - v('Vpre')) * v('CTR'), e.value]],
  signalLow: (v, e) => [[v('Vpre') * v('CTR'), e.value]],
  senseSignal: (v, e) =>
    e.symbol === 'ΔV_dev'
      ? [[Math.min(v('ΔV1'), v('ΔV0')) * v('share'), e.value]]
      : [[(v('ΔV1') - v('ΔV0')) / v('n_ref'), e.value]],
  readCurrent: (v, e) => [[(v('β') / (2 * v('n'))) * Math.max(0, v('V1') - v('Vt_read')) ** 2, e.value]],
  dropHigh: (v, e) => [[Math.min(v('VDD'), (v('I_read') * v('t_sense')) / v('C_RBL')), e.value]],
  dropLow: (v, e) => [
    [Math.min(v('VDD'), ((v('I_off') + (v('N') - 1) * v('I_unsel')) * v('t_sense')) / v('C_RBL')), e.value],
  ],
  fullSenseSignal: (v, e) =>
    e.symbol.startsWith('ΔV_full')
      ? [
          [developmentTau(v), v('τ')],
          [v('ΔV_full') * -Math.expm1(-v('t_fire') / developmentTau(v)), v('ΔV_dev')],
          [v('ΔV_full'), e.value],
        ]
      : [[v('ΔV'), e.value]],
  offsetBudget: (v, e) => [
    [v('A_VT') / Math.sqrt(v('W') * v('L')), v('σ')],
    [upperTailQuantile(v('f') / (2 * v('N'))), v('k')],
    [v('n_sa') * v('copies'), v('N')],
    [v('k') * v('σ'), e.value],
  ],
  noiseAllowance: (v, e) => [[(v('κ') * v('Cbb') * v('VDD')) / v('Cbl') / 2, e.value]],
  senseMargin: (v, e) => [[v('ΔV') - v('V_req'), e.value]],
  senseMarginAtRefresh: (v, e) => [[v('ΔV′') - v('V_req'), e.value]],
  retentionTime: (v, e) => [[(v('Cs') * v('ΔV_allowed')) / v('I(T)'), e.value]],
  weakestRetentionTime: (v, e) => [[(v('Cs') * v('ΔV_allowed')) / v('I_weak'), e.value]],
  wordlineDelay: (v, e) => [
    [lineTime(v, 0.5), e.value],
    [lineTime(v, 0.9), v('t_90')],
  ],
  wordlineTurnOn: (v, e) => [[lineTime(v, v('share')), e.value]],
  wordlineNinety: (v, e) => [[lineTime(v, 0.9), e.value]],
  bitlineDelay: (v, e) =>
    e.symbol === 't_bl' ? [[developmentTau(v) * Math.LN2, e.value]] : [[v('t_sense'), e.value]],
  latchTime: (v, e) => [[v('Cbl') * v('1/gm') * (Math.log(v('VDD')) - Math.log(v('ΔV_dev'))), e.value]],
  restoreTime: (v, e) => [[-v('R_path') * v('Cs') * Math.log1p(-v('f')), e.value]],
  equaliseTime: (v, e) => [
    [((v('R_eq') + v('R_bl')) * v('Cbl') * Math.log(v('VDD') / v('V_res'))) / 2, e.value],
  ],
  rowToColumnDelay: (v, e) => [[v('t_on') + v('t_fire') + v('t_latch'), e.value]],
  rowCycleTime: (v, e) => [
    [Math.max(v('tRCD'), v('t_90')) + v('t_restore'), v('tRAS')],
    [v('t_fall') + v('t_eq'), v('tRP')],
    [v('tRAS') + v('tRP'), e.value],
  ],
  activationEnergy: (v, e) => [[v('E_bl') + v('E_wl') + v('E_sa'), e.value]],
  energyPerBit: (v, e) => [[v('E_act') / v('M'), e.value]],
};

const TOTAL_RULES: Record<string, Redo> = {
  usableBits: (v, e) => [[v('bits') - v('lost'), e.value]],
  arrayEfficiency: (v, e) => [[Math.min(1, v('A_cells') / v('A_total')), e.value]],
  areaPerBit: (v, e) => [[v('A_total') / v('bits'), e.value]],
  areaPerBitInF2: (v, e) => [[v('A_bit') / v('F') ** 2, e.value]],
  senseAmpsOnDie: (v, e) => [[v('n_sa') * v('copies'), e.value]],
  offsetSigmaMultiplier: (v, e) => [[upperTailQuantile(v('f') / (2 * v('N'))), e.value]],
  storedHigh: (v, e) => [[Math.min(v('VDD'), v('VPP') - v('Vt(V1)')), e.value]],
  worstSenseSignal: (v, e) => [[v('ΔV'), e.value]],
  worstSenseMargin: (v, e) => [[v('ΔV′') - v('V_req'), e.value]],
  shortestRetention: (v, e) => [[(v('Cs') * v('ΔV_allowed')) / v('I(T)'), e.value]],
  shortestWeakestRetention: (v, e) => [[(v('Cs') * v('ΔV_allowed')) / v('I_weak'), e.value]],
  worstWordlineDelay: (v, e) => [[lineTime(v, 0.5), e.value]],
  worstRowToColumnDelay: (v, e) => [[v('t_on') + v('t_fire') + v('t_latch'), e.value]],
  worstRowCycleTime: (v, e) => [[v('tRAS') + v('tRP'), e.value]],
  refreshInterval: (v, e) => [[v('tREFW') / v('n_cmd'), e.value]],
  rowsPerCommand: (v, e) => [[Math.ceil(v('rows') / v('n_cmd')), e.value]],
  refreshCycleTime: (v, e) => [[Math.ceil(v('rows/cmd') / v('n_par')) * v('tRC'), e.value]],
  refreshBusyFraction: (v, e) => [[v('tRFC') / v('tREFI'), e.value]],
};

const BANK_RULES: Record<string, Redo> = {
  areaPerBit: (v, e) => [[v('A_total') / v('bits'), e.value]],
  areaPerBitInF2: (v, e) => [[v('A_bit') / v('F') ** 2, e.value]],
  arrayEfficiency: (v, e) => [[v('A_cells') / v('A_total'), e.value]],
  senseMargin: (v, e) => [[v('ΔV') - v('V_req'), e.value]],
  wordlineDelay: (v, e) => [[lineTime(v, 0.5), e.value]],
  activationEnergyPerBit: (v, e) => [[v('E_act') / v('M'), e.value]],
  rowToColumnDelay: (v, e) => [[v('t_on') + v('t_fire') + v('t_latch'), e.value]],
  rowCycleTime: (v, e) => [[v('tRAS') + v('tRP'), e.value]],
  refreshBusyFraction: (v, e) => [[v('tRFC') / v('tREFI'), e.value]],
};

/** Problems of one explanation, as readable lines (empty when it holds). */
function audit(where: string, e: Explanation, rule: Redo | undefined): string[] {
  const problems: string[] = [];
  if (e.inputs.length === 0) problems.push(`${where}: lists no input`);
  const exists = !Number.isNaN(e.value);
  if (!exists && !e.missingReason) problems.push(`${where}: "—" without a reason`);
  for (const i of e.inputs)
    if (!Number.isFinite(i.value) && exists)
      problems.push(`${where}: input ${i.symbol} = ${i.value} although the figure exists`);
  if (rule && exists) {
    let pairs: [number, number][] = [];
    try {
      pairs = rule(inputsOf(e), e);
    } catch (err) {
      problems.push(`${where}: ${(err as Error).message}`);
    }
    for (const [redone, shown] of pairs) {
      const scale = Math.max(Math.abs(redone), Math.abs(shown), 1e-300);
      if (!(Math.abs(redone - shown) <= 1e-9 * scale))
        problems.push(`${where}: redone from its inputs ${redone} ≠ shown ${shown} (${e.formula})`);
    }
  }
  return problems;
}

/**
 * The demo, the demo without sense-amplifier strips (nothing sensed) and with 1 aF cells (no margin to
 * lose), and a small bank of every built-in cell on the demo process (the explorer's builder).
 */
function auditDesigns(): { name: string; design: Design }[] {
  const demo: Design = demoDesign();
  const designs = [
    { name: 'demo', design: demo },
    {
      name: 'demo without sense amplifiers',
      design: { ...demo, blocks: demo.blocks.filter((b) => b.type !== 'senseAmpStrip') },
    },
    {
      name: 'demo with 1 aF cells',
      design: { ...demo, cells: demo.cells.map((c) => ({ ...c, storageCapacitance: 1e-18 })) },
    },
  ];
  for (const cell of BUILTIN_CELLS) {
    const built = buildPartition({
      targetBits: 2 ** 20,
      cell,
      process: DEMO_PROCESS,
      operating: DEFAULT_OPERATING,
      cellsPerBitline: 256,
      cellsPerWordline: 256,
      strips: DEMO_STRIPS,
    });
    if (!built.ok) throw new Error(`${cell.id}: ${built.error}`);
    designs.push({ name: cell.id, design: built.design });
  }
  return designs;
}

describe('every explanation shown matches its value', () => {
  const designs = auditDesigns();

  it('covers a rule for the timing chain and the signal figures of every read style', () => {
    for (const key of [
      'fullSenseSignal',
      'senseSignal',
      'bitlineDelay',
      'wordlineDelay',
      'wordlineTurnOn',
      'wordlineNinety',
      'latchTime',
      'restoreTime',
      'equaliseTime',
      'rowToColumnDelay',
      'rowCycleTime',
      'retentionTime',
      'weakestRetentionTime',
    ])
      expect(MAT_RULES[key], key).toBeDefined();
  });

  it('for each figure of each kind of mat (1T1C, gain cells, 4T, 6T)', () => {
    const problems: string[] = [];
    for (const { name, design } of designs) {
      const report = evaluate(design);
      const seen = new Set<unknown>();
      for (const mat of allMats(report.mats)) {
        if (seen.has(mat.figures)) continue;
        seen.add(mat.figures);
        for (const key of MAT_FIGURES) {
          const e = explainMatFigure(key, mat, design, report);
          if (e) problems.push(...audit(`${name} ${mat.name || mat.matId} ${key}`, e, MAT_RULES[key]));
        }
      }
    }
    expect(problems).toEqual([]);
  });

  it('for each whole-design figure', () => {
    const problems: string[] = [];
    for (const { name, design } of designs) {
      const report = evaluate(design);
      for (const key of TOTAL_FIGURES) {
        const e = explainTotal(key, report, design);
        if (e) problems.push(...audit(`${name} totals ${key}`, e, TOTAL_RULES[key]));
      }
    }
    expect(problems).toEqual([]);
  });

  it('for each bank comparison figure (explorer point card, variants table)', () => {
    const problems: string[] = [];
    for (const { name, design } of designs) {
      const f = figuresFromReport(evaluate(design), design);
      const ctx = {
        featureSize: design.process.featureSize,
        wordlineDriverResistance: design.process.wordlineDriverResistance,
        refreshWindow: design.operating.refreshWindow,
      };
      for (const entry of BANK_FIGURE_CATALOGUE) {
        const e = explainFigure(entry.key, f, ctx);
        problems.push(...audit(`${name} bank ${entry.key}`, e, BANK_RULES[entry.key]));
      }
    }
    expect(problems).toEqual([]);
  });
});
