import { describe, expect, it } from 'vitest';
import {
  copyCell,
  renameCell,
  setCellPitchOverride,
  setCellValue,
  setGainReadValue,
  setMatCell,
} from '../../src/commands/cellCommands';
import { applyBuiltinProcess, setOffsetStacking, setProcessValue } from '../../src/commands/processCommands';
import { setOperatingValue } from '../../src/commands/setOperatingValue';
import { findMatReport } from '../../src/engine';
import { EDRAM_PROCESS, GAIN_3T_CELL, OPEN_6F2_CELL } from '../../src/model/builtins';
import type { Design } from '../../src/model/design';
import { expectRefused, runAndCheckChange } from '../support/commandSteps';

const cell = (d: Design, id: string) => d.cells.find((c) => c.id === id);
const mat = (d: Design, id: string) => d.blocks.find((b) => b.id === id);

describe('process commands', () => {
  it('use a built-in process: run, undo, redo', () => {
    runAndCheckChange(
      applyBuiltinProcess,
      { processId: EDRAM_PROCESS.id },
      (d) => d.process.id === EDRAM_PROCESS.id,
    );
    expectRefused(applyBuiltinProcess, { processId: 'nope' }, /no built-in process/);
  });

  it('set a process value, and the report follows', () => {
    const store = runAndCheckChange(
      setProcessValue,
      { field: 'arrayVoltage', value: 1.2 },
      (d) => d.process.arrayVoltage === 1.2,
    );
    expect(store.getState().report.storedHigh.level).toBe(1.2);
  });

  it.each([
    ['arrayVoltage', -1, /greater than zero/],
    ['featureSize', Number.NaN, /number/],
    ['prechargeVoltage', 5, /precharge voltage must not exceed/],
    ['cellLeakageCurrent', 1e9, /must/],
  ] as const)('refuses %s = %s with a clear message', (field, value, message) => {
    expectRefused(setProcessValue, { field, value }, message);
  });

  it('set offset stacking: run, undo, redo', () => {
    runAndCheckChange(setOffsetStacking, { stacking: 'rss' }, (d) => d.process.offsetStacking === 'rss');
  });
});

describe('operating-condition commands', () => {
  it('set the temperature: run, undo, redo; retention shortens when hotter', () => {
    const store = runAndCheckChange(
      setOperatingValue,
      { field: 'temperature', value: 368.15 },
      (d) => d.operating.temperature === 368.15,
    );
    const hot = findMatReport(store.getState().report, 'mat-r0c0')?.figures.retentionTime ?? NaN;
    store.getState().undo();
    const cool = findMatReport(store.getState().report, 'mat-r0c0')?.figures.retentionTime ?? NaN;
    expect(hot).toBeLessThan(cool);
  });

  it('refuses a refresh window of zero and a fractional command count', () => {
    expectRefused(setOperatingValue, { field: 'refreshWindow', value: 0 }, /greater than zero/);
    expectRefused(setOperatingValue, { field: 'refreshCommandsPerWindow', value: 8191.5 }, /whole number/);
  });
});

describe('cell commands', () => {
  it('copy a cell: run, undo, redo', () => {
    runAndCheckChange(
      copyCell,
      { cellId: OPEN_6F2_CELL.id },
      (d) => cell(d, `${OPEN_6F2_CELL.id}-copy`) !== undefined,
    );
    expectRefused(copyCell, { cellId: 'missing' }, /no cell/);
  });

  it('set a cell value: run, undo, redo; mats using it resize', () => {
    const store = runAndCheckChange(
      setCellValue,
      { cellId: 'dram-folded-8f2', field: 'storageCapacitance', value: 20e-15 },
      (d) => cell(d, 'dram-folded-8f2')?.storageCapacitance === 20e-15,
    );
    expect(findMatReport(store.getState().report, 'mat-r0c0')?.figures.storageCapacitance).toBe(20e-15);
    expectRefused(
      setCellValue,
      { cellId: 'dram-folded-8f2', field: 'bitlinePitchInF', value: -2 },
      /greater than zero/,
    );
  });

  it('set a gain-cell read value: run, undo, redo; refused on a 1T1C cell', () => {
    runAndCheckChange(
      setGainReadValue,
      { cellId: GAIN_3T_CELL.id, field: 'readThresholdVoltage', value: 0.25 },
      (d) => cell(d, GAIN_3T_CELL.id)?.gainRead?.readThresholdVoltage === 0.25,
    );
    expectRefused(
      setGainReadValue,
      { cellId: 'dram-folded-8f2', field: 'readThresholdVoltage', value: 0.25 },
      /not a gain cell/,
    );
  });

  it('rename a cell and set a drawn pitch: run, undo, redo', () => {
    runAndCheckChange(
      renameCell,
      { cellId: 'gain-2t', name: 'My 2T' },
      (d) => cell(d, 'gain-2t')?.name === 'My 2T',
    );
    runAndCheckChange(
      setCellPitchOverride,
      { cellId: 'dram-folded-8f2', override: { bitlinePitch: 40e-9, wordlinePitch: 40e-9 } },
      (d) => cell(d, 'dram-folded-8f2')?.pitchOverride?.bitlinePitch === 40e-9,
    );
    expectRefused(renameCell, { cellId: 'gain-2t', name: '   ' }, /at least 1|too small|>=1/i);
  });

  it('give mats another cell: run, undo, redo', () => {
    runAndCheckChange(setMatCell, { matIds: ['mat-r0c0'], cellId: OPEN_6F2_CELL.id }, (d) => {
      const m = mat(d, 'mat-r0c0');
      return m?.type === 'mat' && m.cellId === OPEN_6F2_CELL.id;
    });
    expectRefused(setMatCell, { matIds: ['mat-r0c0'], cellId: 'missing' }, /no cell/);
    expectRefused(setMatCell, { matIds: ['sa-r0c0'], cellId: OPEN_6F2_CELL.id }, /no mat selected/);
  });
});
