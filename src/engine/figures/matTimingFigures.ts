import { input, SOURCES } from './explanation';
import { matFigure } from './matFigure';

const LATCH =
  'latch regeneration: B. Razavi, "The StrongARM Latch", IEEE SSC Magazine 7(2), 2015 (from memory)';
const CHAIN = `JEDEC JESD79-4 (tRCD, tRAS, tRP, tRC); the first-order chain: ${SOURCES.common}`;

/**
 * The row timing chain of a mat and the figures beside it (physics/rowTiming.ts, physics/wordline.ts):
 * word line to turn-on and to 90 %, the full and developed signal, latch, restore, equalise, tRCD, tRAS,
 * tRP, tRC, and the weakest cell's retention. A figure that does not exist for the mat is NaN.
 */
export const MAT_TIMING_FIGURES = [
  matFigure({
    key: 'fullSenseSignal',
    label: 'Sense signal, fully developed',
    quantity: 'voltage',
    group: 'Sensing',
    exportKey: 'fullSenseSignal_V',
    value: (f) => f.fullSenseSignal,
    explain: (mat, design) => {
      const f = mat.figures;
      const r = f.read;
      return r.kind === 'chargeSharing'
        ? {
            symbol: 'ΔV_full, ΔV_dev',
            formula: 'ΔV_dev = ΔV_full · (1 − e^(−t_fire/τ)),  τ = R_acc·Cs·Cbl/(Cs+Cbl) + R_bl·Cbl/2',
            inputs: [
              input('ΔV_full', 'min(ΔV1, ΔV0) once charge sharing settles', f.fullSenseSignal, 'voltage'),
              input('t_fire', 'sense fires after word-line turn-on', design.operating.senseFireTime, 'time'),
              input('R_acc', 'access transistor', design.process.accessTransistorResistance, 'resistance'),
              input('R_bl', 'bit-line resistance', f.bitlineResistance, 'resistance'),
              input('Cs', 'storage capacitance', f.storageCapacitance, 'capacitance'),
              input('Cbl', 'bit-line capacitance', f.bitlineCapacitance.total, 'capacitance'),
              input('τ', 'development time constant', r.developmentTimeConstant, 'time'),
              input('ΔV_dev', 'developed signal (the margin uses it)', f.senseSignal, 'voltage'),
            ],
            method: 'Single-pole development of the charge-sharing signal, Elmore time constant.',
            source: `${SOURCES.keethBaker}; ${SOURCES.elmore}`,
          }
        : {
            symbol: 'ΔV',
            formula:
              'ΔV = I·t_sense / C (a current read develops for as long as it is sensed: full = developed)',
            inputs: [input('ΔV', 'signal', f.senseSignal, 'voltage')],
            method: 'Current read into a precharged line.',
            source: SOURCES.gainCells,
          };
    },
  }),
  matFigure({
    key: 'wordlineTurnOn',
    label: 'Word line to cell turn-on',
    quantity: 'time',
    group: 'Retention and speed',
    exportKey: 'wordlineTurnOn_s',
    value: (f) => f.wordlineTiming.toTurnOn,
    explain: (mat, design) => {
      const f = mat.figures;
      return {
        symbol: 't_on',
        formula: 'v_far(t)/V_high = Vpre + Vt(Vsb = Vpre) over V_high, driven distributed RC line',
        inputs: [
          input('R_drv', 'driver resistance', design.process.wordlineDriverResistance, 'resistance'),
          input('R_wl', 'line resistance', f.wordlineResistance, 'resistance'),
          input('C_wl', 'line capacitance', f.wordlineCapacitance, 'capacitance'),
          input('V_high', 'word-line high level', f.wordlineHighLevel, 'voltage'),
          input('share', 'turn-on share of the swing', f.wordlineTiming.turnOnShare, 'ratio'),
        ],
        method:
          'Exact eigen-series step response of the far end; NaN when the high level never reaches turn-on.',
        source: SOURCES.rabaey,
      };
    },
  }),
  matFigure({
    key: 'wordlineNinety',
    label: 'Word line to 90 %',
    quantity: 'time',
    group: 'Retention and speed',
    exportKey: 'wordlineNinety_s',
    value: (f) => f.wordlineTiming.toNinetyPercent,
    explain: (mat, design) => ({
      symbol: 't_90',
      formula: 'v_far(t_90) = 0.9·V_high (ready to restore a full 1)',
      inputs: [
        input('R_drv', 'driver resistance', design.process.wordlineDriverResistance, 'resistance'),
        input('R_wl', 'line resistance', mat.figures.wordlineResistance, 'resistance'),
        input('C_wl', 'line capacitance', mat.figures.wordlineCapacitance, 'capacitance'),
      ],
      method:
        'Exact step response of a driven distributed RC line (1.0·RC distributed, 2.3·RC lumped limits).',
      source: SOURCES.rabaey,
    }),
  }),
  matFigure({
    key: 'latchTime',
    label: 'Sense-amplifier latch time',
    quantity: 'time',
    group: 'Retention and speed',
    exportKey: 'latchTime_s',
    value: (f) => f.timing.latch,
    explain: (mat, design) => ({
      symbol: 't_latch',
      formula: 't_latch = Cbl·(1/gm)·ln(VDD / ΔV_dev)',
      inputs: [
        input(
          'Cbl',
          'bit-line capacitance on each latch node',
          mat.figures.bitlineCapacitance.total,
          'capacitance',
        ),
        input('1/gm', 'latch resistance', design.process.senseAmpLatchResistance, 'resistance'),
        input('VDD', 'full pair swing', design.process.arrayVoltage, 'voltage'),
        input('ΔV_dev', 'developed signal', mat.figures.senseSignal, 'voltage'),
      ],
      method:
        'Exponential regeneration of the pair difference; NaN with no positive signal (does not resolve).',
      source: LATCH,
    }),
  }),
  matFigure({
    key: 'restoreTime',
    label: 'Restore (write-back) time',
    quantity: 'time',
    group: 'Retention and speed',
    exportKey: 'restoreTime_s',
    value: (f) => f.timing.restore,
    explain: (mat, design) => ({
      symbol: 't_restore',
      formula:
        't_restore = R_path·Cs·ln(1/(1 − f)),  R_path = R_acc + R_bl (1T1C); 0 for a read that keeps the data',
      inputs: [
        input('R_acc', 'access transistor', design.process.accessTransistorResistance, 'resistance'),
        input('R_bl', 'bit-line resistance', mat.figures.bitlineResistance, 'resistance'),
        input(
          'R_path',
          mat.figures.read.kind === 'chargeSharing' ? 'write-back path' : 'none: the read keeps the data',
          mat.figures.read.kind === 'chargeSharing'
            ? design.process.accessTransistorResistance + mat.figures.bitlineResistance
            : 0,
          'resistance',
        ),
        input('Cs', 'storage capacitance', mat.figures.storageCapacitance, 'capacitance'),
        input('f', 'share of the stored 1 to reach', design.operating.restoreFraction, 'ratio'),
      ],
      method: 'RC charging of the cell from the latched bit line.',
      source: `RC charging (arithmetic); ${SOURCES.keethBaker}`,
    }),
  }),
  matFigure({
    key: 'equaliseTime',
    label: 'Equalise time',
    quantity: 'time',
    group: 'Retention and speed',
    exportKey: 'equaliseTime_s',
    value: (f) => f.timing.equalise,
    explain: (mat, design) => ({
      symbol: 't_eq',
      formula: 't_eq = (R_eq + R_bl)·Cbl/2 · ln(VDD / V_residual)',
      inputs: [
        input('R_eq', 'equaliser', design.process.equaliserResistance, 'resistance'),
        input('R_bl', 'bit-line resistance', mat.figures.bitlineResistance, 'resistance'),
        input('Cbl', 'bit-line capacitance', mat.figures.bitlineCapacitance.total, 'capacitance'),
        input('VDD', 'pair difference the latch left', design.process.arrayVoltage, 'voltage'),
        input('V_res', 'residual tolerated', design.operating.equaliseResidual, 'voltage'),
      ],
      method: 'Differential-mode RC decay of the pair, Elmore first moment for the line.',
      source: SOURCES.elmore,
    }),
  }),
  matFigure({
    key: 'rowToColumnDelay',
    label: 'Row to column delay tRCD',
    quantity: 'time',
    group: 'Retention and speed',
    exportKey: 'rowToColumnDelay_s',
    value: (f) => f.timing.rcd,
    explain: (mat) => {
      const t = mat.figures.timing;
      return {
        symbol: 'tRCD',
        formula: 'tRCD = t_on + t_fire + t_latch',
        inputs: [
          input('t_on', 'word line to turn-on', t.wordlineOn, 'time'),
          input('t_fire', 'development until the sense amplifier fires', t.development, 'time'),
          input('t_latch', 'latch', t.latch, 'time'),
        ],
        method: 'First-order array core only (no decoding, no margins): NaN when nothing is sensed.',
        source: CHAIN,
      };
    },
  }),
  matFigure({
    key: 'rowCycleTime',
    label: 'Row cycle tRC',
    quantity: 'time',
    group: 'Retention and speed',
    exportKey: 'rowCycleTime_s',
    value: (f) => f.timing.rc,
    explain: (mat) => {
      const t = mat.figures.timing;
      return {
        symbol: 'tRC',
        formula: 'tRAS = max(tRCD, t_90) + t_restore;  tRP = t_fall + t_eq;  tRC = tRAS + tRP',
        inputs: [
          input('tRCD', 'row to column delay', t.rcd, 'time'),
          input('t_90', 'word line to 90 %', t.wordlineNinety, 'time'),
          input('t_restore', 'restore', t.restore, 'time'),
          input('tRAS', 'row active time', t.ras, 'time'),
          input('t_fall', 'word line falls to Vt0', t.wordlineFall, 'time'),
          input('t_eq', 'equalise', t.equalise, 'time'),
          input('tRP', 'row precharge time', t.rp, 'time'),
        ],
        method:
          'First-order array core only; the refresh figures use the slowest mat’s tRC unless the process overrides it.',
        source: CHAIN,
      };
    },
  }),
  matFigure({
    key: 'weakestRetentionTime',
    label: 'Retention, weakest cell in the die',
    quantity: 'time',
    group: 'Retention and speed',
    exportKey: 'weakestRetentionTime_s',
    value: (f) => f.weakestRetentionTime,
    explain: (mat, design, report) => ({
      symbol: 't_ret,weak',
      formula:
        't = Cs·ΔV_allowed / I_weak,  I_weak = M·I(T, Ea_tail)·e^(σ·z),  z at Blom’s position of n = fraction·cells',
      inputs: [
        input('Cs', 'storage capacitance', mat.figures.storageCapacitance, 'capacitance'),
        input('ΔV_allowed', 'droop until margin is zero', mat.figures.allowedDroop, 'voltage'),
        input('I_typ', 'typical leakage at temperature', mat.figures.leakage, 'current'),
        input('I_weak', 'weakest cell leakage', mat.figures.weakestLeakage, 'current'),
        input('fraction', 'tail share of cells', design.process.tailCellFraction, 'ratio'),
        input(
          'cells',
          'cells on the die',
          report.totals.bits * design.operating.floorplanCopiesPerDie,
          'count',
        ),
      ],
      method: 'Two-population retention: the refresh window is checked against the weakest cell.',
      source:
        'T. Hamamoto, S. Sugiura, S. Sawada, IEEE Trans. Electron Devices 45(6), 1998 (from memory); G. Blom, 1958 (from memory)',
    }),
  }),
  matFigure({
    key: 'standbyPower',
    label: 'Standby power of the cells',
    quantity: 'power',
    group: null,
    exportKey: 'standbyPower_W',
    value: (f) => f.standbyPower,
  }),
] as const;
