import { z } from 'zod';
import type { Block } from '../model/block';
import { blockSchema } from '../model/blockSchema';
import type { CellDefinition } from '../model/cell';
import { MAX_BLOCKS, matLengthProblem, type Design, type VariantDesign } from '../model/design';
import { designSchema, shelfSchemaWith } from '../model/designSchema';
import { clipForMessage } from '../model/messageText';
import { MAX_DESIGN_TEXT_LENGTH } from './designText';
import { designTextLength } from './designTextLength';
import { formatPath } from './restore';
import { formatWholeNumber } from '../model/units';

/**
 * The invariant "every accepted edit restores": a command's result must pass the same schema and limits
 * as io/restore, or it is refused with restore's message. Validating a whole die on every edit would cost
 * a quarter of a second (about 200,000 blocks through zod), so this check compares the result with the
 * design it came from, which was itself restorable, and validates only what changed: the header fields,
 * the blocks that are new objects, the id and cell rules those blocks take part in, and the variants
 * whose design changed. The property test in test/io/editCheck.property.test.ts holds it to restore.
 */

/** Most messages given back, as restore does. */
const MAX_MESSAGES = 20;

/** The schema's limit on the length of the block list (its blocks are checked one by one below). */
const blockListSchema = z.array(z.unknown()).max(MAX_BLOCKS);

/** A shelf whose stored designs are checked one by one below, not by the schema. */
const shelfStructureSchema = shelfSchemaWith(
  z.custom<VariantDesign>((value) => typeof value === 'object' && value !== null),
);

function issuesOf(error: z.ZodError, prefix: readonly PropertyKey[]): string[] {
  return error.issues
    .slice(0, MAX_MESSAGES)
    .map((issue) => `${formatPath([...prefix, ...issue.path])}: ${issue.message}`);
}

/** Fields outside the block list and the shelf, compared by identity (commands copy what they change). */
function headerChanged(next: VariantDesign, base: VariantDesign): boolean {
  return (
    next.format !== base.format ||
    next.version !== base.version ||
    next.name !== base.name ||
    next.lengthUnit !== base.lengthUnit ||
    next.process !== base.process ||
    next.operating !== base.operating ||
    next.cells !== base.cells
  );
}

/** Indices of blocks in `next` that are not (by identity) blocks of `base`. */
function changedBlockIndices(next: readonly Block[], base: readonly Block[]): number[] {
  const changed: number[] = [];
  if (next.length === base.length) {
    for (let i = 0; i < next.length; i++) if (next[i] !== base[i]) changed.push(i);
    return changed;
  }
  const known = new Set<Block>(base);
  for (let i = 0; i < next.length; i++) if (!known.has(next[i] as Block)) changed.push(i);
  return changed;
}

/** True when every changed block keeps the id of the block it replaced at the same place. */
function idsKeptInPlace(next: readonly Block[], base: readonly Block[], changed: readonly number[]): boolean {
  if (next.length !== base.length) return false;
  return changed.every((i) => next[i]?.id === base[i]?.id);
}

function duplicateIdProblems(blocks: readonly Block[], prefix: readonly PropertyKey[]): string[] {
  const problems: string[] = [];
  const seen = new Set<string>();
  for (let i = 0; i < blocks.length && problems.length < MAX_MESSAGES; i++) {
    const id = (blocks[i] as Block).id;
    if (seen.has(id))
      problems.push(
        `${formatPath([...prefix, 'blocks', i, 'id'])}: duplicate block id "${clipForMessage(id)}"`,
      );
    seen.add(id);
  }
  return problems;
}

/** The cell and length rules of one mat (the schema's own, see model/design.ts). */
function matProblem(
  block: Block,
  index: number,
  cellsById: ReadonlyMap<string, CellDefinition>,
  featureSize: number,
  prefix: readonly PropertyKey[],
): string | null {
  if (block.type !== 'mat') return null;
  const cell = cellsById.get(block.cellId);
  if (!cell) {
    return `${formatPath([...prefix, 'blocks', index, 'cellId'])}: mat "${clipForMessage(block.id)}" uses cell "${clipForMessage(block.cellId)}", which the design does not define`;
  }
  const length = matLengthProblem(block, cell, featureSize);
  return length ? `${formatPath([...prefix, 'blocks', index])}: ${length}` : null;
}

/** Problems of one design (without its shelf) that restore would report, checking what differs from `base`. */
function designProblems(
  next: VariantDesign,
  base: VariantDesign | null,
  prefix: readonly PropertyKey[],
): string[] {
  if (next === base) return [];
  const problems: string[] = [];
  if (!base || headerChanged(next, base)) {
    const header = designSchema.safeParse({ ...next, blocks: [], variants: undefined });
    if (!header.success) return issuesOf(header.error, prefix);
  }
  const blocksChanged = !base || next.blocks !== base.blocks;
  if (blocksChanged && next.blocks.length > MAX_BLOCKS) {
    const count = blockListSchema.safeParse(next.blocks);
    if (!count.success) return issuesOf(count.error, [...prefix, 'blocks']);
  }
  const cellsChanged =
    !base || next.cells !== base.cells || next.process.featureSize !== base.process.featureSize;
  if (!blocksChanged && !cellsChanged) return problems;

  const changed = base ? changedBlockIndices(next.blocks, base.blocks) : next.blocks.map((_, i) => i);
  for (const i of changed) {
    const parsed = blockSchema.safeParse(next.blocks[i]);
    if (!parsed.success) problems.push(...issuesOf(parsed.error, [...prefix, 'blocks', i]));
    if (problems.length >= MAX_MESSAGES) return problems.slice(0, MAX_MESSAGES);
  }
  if (problems.length > 0) return problems;
  if (!base || !idsKeptInPlace(next.blocks, base.blocks, changed)) {
    problems.push(...duplicateIdProblems(next.blocks, prefix));
  }
  const cellsById = new Map(next.cells.map((c) => [c.id, c]));
  const featureSize = next.process.featureSize;
  const toCheck = cellsChanged ? next.blocks.map((_, i) => i) : changed;
  for (const i of toCheck) {
    const problem = matProblem(next.blocks[i] as Block, i, cellsById, featureSize, prefix);
    if (problem) problems.push(problem);
    if (problems.length >= MAX_MESSAGES) break;
  }
  return problems;
}

/** The design a changed variant is compared with: its earlier copy on the shelf, or the earlier document. */
function baseForVariant(id: string, base: Design): VariantDesign | null {
  const shelf = base.variants;
  if (!shelf) return base;
  if (shelf.activeId === id) return base;
  return shelf.entries.find((e) => e.id === id)?.design ?? null;
}

/**
 * Everything restore would say about `next` (at most 20 messages, in restore's words), given that
 * `base` restores. An empty list means `next` restores. `base` null checks `next` in full.
 */
export function editProblems(next: Design, base: Design | null): string[] {
  if (next === base) return [];
  const problems = designProblems(next, base, []);
  if (problems.length > 0) return problems;
  if (next.variants !== undefined && next.variants !== base?.variants) {
    const shelf = shelfStructureSchema.safeParse(next.variants);
    if (!shelf.success) return issuesOf(shelf.error, ['variants']);
    for (const [index, entry] of next.variants.entries.entries()) {
      if (entry.design === null) continue;
      const earlier = base ? baseForVariant(entry.id, base) : null;
      const entryProblems = designProblems(entry.design, earlier, ['variants', 'entries', index, 'design']);
      if (entryProblems.length > 0) return entryProblems;
    }
  }
  return textLengthProblems(next, base);
}

/** Restore reads at most MAX_DESIGN_TEXT_LENGTH characters, so a design whose text is longer would not restore. */
function textLengthProblems(next: Design, base: Design | null): string[] {
  // + 1: Save ends the file with a newline, and restore counts it.
  const length = designTextLength(next, base, (id) => (base ? baseForVariant(id, base) : null)) + 1;
  if (length <= MAX_DESIGN_TEXT_LENGTH) return [];
  return [
    `the design would be ${formatWholeNumber(length)} characters as text; the limit is ${formatWholeNumber(MAX_DESIGN_TEXT_LENGTH)} (remove variants or blocks, or shorten names)`,
  ];
}
