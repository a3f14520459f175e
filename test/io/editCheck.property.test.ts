import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  setCellPitchOverride,
  setCellValue,
  copyCell,
  renameCell,
  setMatCell,
} from '../../src/commands/cellCommands';
import type { Command } from '../../src/commands/command';
import { createVariant } from '../../src/commands/createVariant';
import { deleteBlocks } from '../../src/commands/deleteBlocks';
import { deleteVariant } from '../../src/commands/deleteVariant';
import { duplicateBlocks } from '../../src/commands/duplicateBlocks';
import { duplicateVariant } from '../../src/commands/duplicateVariant';
import { mirrorBlocks } from '../../src/commands/mirrorBlocks';
import { moveBlocks } from '../../src/commands/moveBlocks';
import { applyBuiltinProcess, setProcessValue } from '../../src/commands/processCommands';
import { renameVariant } from '../../src/commands/renameVariant';
import { reshapeBlocks } from '../../src/commands/reshapeBlocks';
import { rotateBlocks } from '../../src/commands/rotateBlocks';
import { setBlockProperties } from '../../src/commands/setBlockProperties';
import { setMatCellCounts } from '../../src/commands/setMatCellCounts';
import { setOperatingValue } from '../../src/commands/setOperatingValue';
import { stepAndRepeat } from '../../src/commands/stepAndRepeat';
import { switchVariant } from '../../src/commands/switchVariant';
import { editProblems } from '../../src/io/editCheck';
import { restoreDesign } from '../../src/io/restore';
import { figureProblems } from '../support/figureInvariants';
import { BUILTIN_PROCESSES } from '../../src/model/builtins';
import { demoDesign } from '../../src/designs/demoDesign';
import type { Design } from '../../src/model/design';
import { OPERATING_FIELDS, PROCESS_FIELDS } from '../../src/model/fieldCatalog';
import { variantEntries } from '../../src/model/variants';
import { createAppStore } from '../../src/store/appStore';

// Source: common practice (no source): whatever an editor accepts, it must be able to load again.

/** One random step: which command, and numbers from which its arguments are drawn on the current design. */
interface Step {
  readonly command: number;
  readonly picks: readonly number[];
  readonly value: number;
  readonly text: string;
}

/** Numbers from tiny to huge, both signs, so that limits are crossed as often as kept. */
const value = fc.oneof(
  fc.double({ min: -1e3, max: 1e3, noNaN: true }),
  fc.double({ min: 1e-12, max: 1e-3, noNaN: true }),
  fc.constantFrom(0, 1, 2, 100e-6, 1e-6, 16384, 1e9, -1e-3, 5e-2, Number.NaN, Infinity),
  fc.integer({ min: 1, max: 20000 }),
);

const step: fc.Arbitrary<Step> = fc.record({
  command: fc.nat(),
  picks: fc.array(fc.nat(), { minLength: 1, maxLength: 4 }),
  value,
  text: fc.oneof(fc.string({ maxLength: 30 }), fc.string({ minLength: 190, maxLength: 260 })),
});

function pick<T>(list: readonly T[], n: number): T | undefined {
  return list.length === 0 ? undefined : list[n % list.length];
}

/** The command a step asks for on `design`, with its arguments. */
function commandFor(design: Design, s: Step): { command: Command<never>; args: unknown } | null {
  const ids = s.picks.map((p) => pick(design.blocks, p)?.id).filter((id): id is string => !!id);
  const cell = pick(design.cells, s.picks[0] ?? 0);
  const variants = variantEntries(design);
  const variant = pick(variants, s.picks[0] ?? 0);
  const n = s.picks[1] ?? 0;
  const options: (() => { command: Command<never>; args: unknown } | null | undefined)[] = [
    () =>
      cell && {
        command: setCellValue,
        args: {
          cellId: cell.id,
          field: pick(['bitlinePitchInF', 'wordlinePitchInF', 'storageCapacitance'], n),
          value: s.value,
        },
      },
    () =>
      cell && {
        command: setCellPitchOverride,
        args: {
          cellId: cell.id,
          override:
            n % 3 === 0
              ? null
              : { bitlinePitch: Math.abs(s.value) * 1e-6, wordlinePitch: Math.abs(s.value) * 1e-7 },
        },
      },
    () => cell && { command: copyCell, args: { cellId: cell.id } },
    () => cell && { command: renameCell, args: { cellId: cell.id, name: s.text } },
    () => cell && { command: setMatCell, args: { matIds: ids, cellId: cell.id } },
    () => ({
      command: setMatCellCounts,
      args: {
        matIds: ids,
        cellsPerBitline: Math.round(Math.abs(s.value)),
        cellsPerWordline: n % 2 ? Math.round(Math.abs(s.value) / 2) : undefined,
      },
    }),
    () => ({ command: setProcessValue, args: { field: pick(PROCESS_FIELDS, n)?.key, value: s.value } }),
    () => ({ command: setOperatingValue, args: { field: pick(OPERATING_FIELDS, n)?.key, value: s.value } }),
    () => ({ command: applyBuiltinProcess, args: { processId: pick(BUILTIN_PROCESSES, n)?.id } }),
    () => ({ command: moveBlocks, args: { ids, dx: s.value * 1e-5, dy: -s.value * 1e-6 } }),
    () => ({ command: duplicateBlocks, args: { ids, dx: s.value * 1e-6, dy: 0 } }),
    () => ({
      command: stepAndRepeat,
      args: {
        ids: ids.slice(0, 1),
        columns: (n % 4) + 1,
        rows: (n % 3) + 1,
        pitchX: Math.abs(s.value) * 1e-5,
        pitchY: 3e-4,
      },
    }),
    () => ({ command: deleteBlocks, args: { ids } }),
    () => ({ command: rotateBlocks, args: { ids } }),
    () => ({ command: mirrorBlocks, args: { ids, axis: n % 2 ? 'leftRight' : 'topBottom' } }),
    () => ({
      command: reshapeBlocks,
      args: {
        changes: ids.map((id) => ({
          id,
          width: Math.abs(s.value) * 1e-6,
          height: 1e-5,
          cellsPerBitline: Math.round(Math.abs(s.value)),
        })),
      },
    }),
    () => ({
      command: setBlockProperties,
      args: {
        ids,
        patch:
          n % 2 ? { name: s.text } : { x: s.value * 1e-4, cellsPerBitline: Math.round(Math.abs(s.value)) },
      },
    }),
    () => ({
      command: createVariant,
      args: { design: { ...(variants[0] as (typeof variants)[number]).design, name: s.text || 'v' } },
    }),
    () => variant && { command: duplicateVariant, args: { variantId: variant.id } },
    () => variant && { command: switchVariant, args: { variantId: variant.id } },
    () => variant && { command: deleteVariant, args: { variantId: variant.id } },
    () => variant && { command: renameVariant, args: { variantId: variant.id, name: s.text } },
  ];
  return options[s.command % options.length]?.() ?? null;
}

describe('every accepted edit restores', () => {
  it(
    'random command sequences: the edit check agrees with restore, and the store accepts only what restores',
    { timeout: 120_000 },
    () => {
      let accepted = 0;
      let refused = 0;
      fc.assert(
        fc.property(fc.array(step, { minLength: 1, maxLength: 12 }), (steps) => {
          const store = createAppStore(demoDesign());
          for (const s of steps) {
            const before = store.getState().history.present;
            const call = commandFor(before, s);
            if (!call) continue;
            const direct = call.command.run(before, call.args as never);
            if (direct.ok && direct.design !== before) {
              // The incremental check says exactly what a full restore of the saved text says.
              const restored = restoreDesign(JSON.stringify(direct.design));
              const problems = editProblems(direct.design, before);
              expect(problems.length === 0, problems.join('; ')).toBe(restored.ok);
            }
            const ok = store.getState().execute(call.command, call.args as never);
            const after = store.getState().history.present;
            if (ok) {
              accepted += after === before ? 0 : 1;
              const reloaded = restoreDesign(JSON.stringify(after));
              expect(reloaded.ok, reloaded.ok ? '' : reloaded.errors.join('; ')).toBe(true);
              // The report the store keeps (often made incrementally) has sound figures.
              expect(figureProblems(store.getState().report, after)).toEqual([]);
            } else {
              refused++;
              expect(after).toBe(before);
            }
          }
        }),
        { numRuns: 300 },
      );
      // The sequences must exercise both outcomes, or the property proves little.
      expect(accepted).toBeGreaterThan(100);
      expect(refused).toBeGreaterThan(50);
    },
  );

  it('refuses a cell pitch that would make a mat longer than the limit, with restore’s message', () => {
    const store = createAppStore(demoDesign());
    const before = store.getState().history.present;
    const cell = before.cells.find((c) => before.blocks.some((b) => b.type === 'mat' && b.cellId === c.id));
    expect(cell).toBeDefined();
    const ok = store.getState().execute(setCellPitchOverride, {
      cellId: cell?.id ?? '',
      override: { bitlinePitch: 100e-6, wordlinePitch: 100e-6 },
    });
    expect(ok).toBe(false);
    expect(store.getState().lastError).toMatch(
      /blocks\[\d+\]: mat ".*" would be [\d.]+ mm long; the limit is 100 mm/,
    );
    expect(store.getState().history.present).toBe(before);
  });

  it('checks a design without a base in full, like restore', () => {
    const broken = { ...demoDesign(), name: '' };
    const restored = restoreDesign(JSON.stringify(broken));
    expect(restored.ok).toBe(false);
    expect(editProblems(broken, null)).toEqual(restored.ok ? [] : restored.errors);
    expect(editProblems(demoDesign(), null)).toEqual([]);
  });
});
