import { MAX_VARIANTS, type Design, type VariantDesign, type VariantShelf } from './design';

/**
 * Named variants of one document. The document itself is the active variant, so everything that edits
 * or evaluates a design keeps working on it unchanged; its `variants` shelf holds the others in order,
 * each a whole design, with a null placeholder where the active one sits. A document without a shelf is
 * a single variant. Switching, creating, renaming and deleting variants are ordinary document edits, so
 * they share the one undo history and are saved with the document. A variant's name is its design name.
 */

/** Id of the only variant of a document that has no shelf yet. */
export const FIRST_VARIANT_ID = 'v1';

/** One variant as panels list it. */
export interface VariantEntry {
  readonly id: string;
  readonly name: string;
  /** The variant's design without a shelf; for the active variant, the document's own content. */
  readonly design: VariantDesign;
  readonly active: boolean;
}

/** The document's own design without its shelf. */
export function variantContent(design: Design | VariantDesign): VariantDesign {
  if (!('variants' in design)) return design;
  // eslint-disable-next-line @typescript-eslint/no-unused-vars
  const { variants, ...content } = design;
  return content;
}

/** The shelf of a document, or the implied one-variant shelf. */
export function shelfOf(design: Design): VariantShelf {
  return design.variants ?? { activeId: FIRST_VARIANT_ID, entries: [{ id: FIRST_VARIANT_ID, design: null }] };
}

export function activeVariantId(design: Design): string {
  return shelfOf(design).activeId;
}

/** Every variant in shelf order; the active one is the document. */
export function variantEntries(design: Design): VariantEntry[] {
  const shelf = shelfOf(design);
  const own = variantContent(design);
  return shelf.entries.map((entry) => {
    const content = entry.design ?? own;
    return { id: entry.id, name: content.name, design: content, active: entry.id === shelf.activeId };
  });
}

/** A variant id the document does not use yet ("v2", "v3", …). */
export function freshVariantId(design: Design): string {
  const used = new Set(shelfOf(design).entries.map((e) => e.id));
  for (let n = 1; ; n++) {
    const id = `v${n}`;
    if (!used.has(id)) return id;
  }
}

/** True when one more variant fits on the shelf. */
export function hasRoomForVariant(design: Design): boolean {
  return shelfOf(design).entries.length < MAX_VARIANTS;
}

/**
 * The document with `activeId` as the active variant: that variant's design becomes the document and
 * the previous document's content goes back on the shelf.
 */
export function activateVariant(design: Design, activeId: string, entries: VariantShelf['entries']): Design {
  const target = entries.find((e) => e.id === activeId);
  if (!target) throw new Error(`no variant "${activeId}"`);
  const content = target.design ?? variantContent(design);
  return {
    ...content,
    variants: {
      activeId,
      entries: entries.map((e) => (e.id === activeId ? { id: e.id, design: null } : e)),
    },
  };
}

/** The shelf's entries with the active placeholder filled in with the document's content. */
export function filledEntries(design: Design): VariantShelf['entries'] {
  const shelf = shelfOf(design);
  const own = variantContent(design);
  return shelf.entries.map((e) => (e.design === null ? { id: e.id, design: own } : e));
}
