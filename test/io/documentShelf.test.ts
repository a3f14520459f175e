import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { designFilePieces, designTextPieces, INDENTED_FILE_BLOCKS } from '../../src/io/designText';
import {
  designKey,
  discardKeptAside,
  forgetDocument,
  keptAsideList,
  keptAsideText,
  listDocuments,
  listKeptAside,
  loadDocument,
  newDocumentId,
  rememberDocument,
  saveDocument,
  type KeyValueArea,
} from '../../src/io/documentShelf';
import { demoDesign, generatedDemoGrid } from '../../src/designs/demoDesign';
import type { Design } from '../../src/model/design';
import { variantContent } from '../../src/model/variants';
import { restoreDesign } from '../../src/io/restore';
import { designFromQuery } from '../../src/app/startupDesign';

// Source: common practice (no source): stored work is never dropped, and a message says only what is true.

/** An in-memory key-value area; `failSet` makes every write fail as a full disk would. */
function memoryArea(
  failSet: (key: string) => boolean = () => false,
): KeyValueArea & { data: Map<string, unknown> } {
  const data = new Map<string, unknown>();
  return {
    data,
    get: async (k) => data.get(k),
    set: async (k, v) => {
      if (failSet(k)) throw new DOMException('The quota has been exceeded.', 'QuotaExceededError');
      data.set(k, v);
    },
    del: async (k) => void data.delete(k),
    keys: async () => [...data.keys()],
  };
}

const textOf = (design: unknown) => JSON.stringify(design);

describe('document shelf', () => {
  it('keeps each document under its own id and lists them newest first', async () => {
    const area = memoryArea();
    const first = { ...demoDesign(), name: 'First' };
    const second = { ...demoDesign(), name: 'Second' };
    await saveDocument(area, 'a', first, textOf(first), 1000);
    await saveDocument(area, 'b', second, new Blob([textOf(second)]), 2000);
    expect((await listDocuments(area)).map((d) => d.name)).toEqual(['Second', 'First']);
    const a = await loadDocument(area, 'a');
    const b = await loadDocument(area, 'b');
    expect(a.kind === 'restored' && a.design.name).toBe('First');
    expect(b.kind === 'restored' && b.design.name).toBe('Second');
    expect(await loadDocument(area, 'missing')).toEqual({ kind: 'none' });
  });

  it('keeps a bad stored design aside under a new key every time, and says so', async () => {
    const area = memoryArea();
    for (const [round, now] of [
      [1, 10],
      [2, 20],
    ] as const) {
      area.data.set(designKey('a'), `{"broken":${round}`);
      const loaded = await loadDocument(area, 'a', now);
      expect(loaded.kind).toBe('keptAside');
      if (loaded.kind === 'keptAside') expect(loaded.message).toContain(`unreadable:a:${now}`);
      expect(area.data.has(designKey('a'))).toBe(false);
    }
    const aside = await listKeptAside(area);
    expect(aside).toHaveLength(2);
    expect(aside.map((k) => area.data.get(k))).toEqual(['{"broken":1', '{"broken":2']);
    // The recent list shows them newest first, gives their text back as stored, and discards one.
    const listed = await keptAsideList(area);
    expect(listed.map((k) => k.keptAt)).toEqual([20, 10]);
    expect(await keptAsideText(area, 'unreadable:a:10')).toBe('{"broken":1');
    expect(await keptAsideText(area, designKey('b'))).toBeNull();
    await discardKeptAside(area, 'unreadable:a:20');
    expect(await listKeptAside(area)).toEqual(['unreadable:a:10']);
  });

  it('discards only kept-aside designs, never a document', async () => {
    const area = memoryArea();
    const design = demoDesign();
    await saveDocument(area, 'a', design, textOf(design), 1000);
    await expect(discardKeptAside(area, designKey('a'))).rejects.toThrow('is not a kept-aside design');
    expect((await loadDocument(area, 'a')).kind).toBe('restored');
  });

  it('does not claim a copy was kept when writing it failed, and leaves the design where it was', async () => {
    const area = memoryArea((k) => k.startsWith('unreadable:'));
    area.data.set(designKey('a'), '{"broken":true');
    const loaded = await loadDocument(area, 'a');
    expect(loaded.kind).toBe('unreadable');
    if (loaded.kind === 'unreadable') {
      expect(loaded.message).toContain('keeping a copy aside failed');
      expect(loaded.message).not.toContain('was kept aside');
    }
    expect(area.data.get(designKey('a'))).toBe('{"broken":true');
  });

  it('reports a storage failure to the caller', async () => {
    const area = memoryArea(() => true);
    await expect(saveDocument(area, 'a', demoDesign(), '{}')).rejects.toThrow(/quota/);
  });

  it(
    'valid designs with one field broken are kept aside, never restored, never lost',
    { timeout: 60_000 },
    async () => {
      const base = JSON.parse(textOf(demoDesign())) as Record<string, unknown>;
      const broken = fc.oneof(
        fc.constant({ ...base, name: '' }),
        fc.constant({ ...base, name: 'x'.repeat(201) }),
        fc.constant({ ...base, version: 99 }),
        fc.constant({ ...base, blocks: 'none' }),
        fc.constant({ ...base, process: { ...(base.process as object), featureSize: -1 } }),
        fc.constant({ ...base, cells: [] }),
        fc.integer({ min: 0, max: 15 }).map((i) => ({
          ...base,
          blocks: (base.blocks as Record<string, unknown>[]).map((b, k) =>
            k === i ? { ...b, x: 'left' } : b,
          ),
        })),
        fc.integer({ min: 0, max: 15 }).map((i) => ({
          ...base,
          blocks: (base.blocks as Record<string, unknown>[]).map((b, k) =>
            k === i || k === (i + 1) % 16 ? { ...b, id: 'dup' } : b,
          ),
        })),
      );
      await fc.assert(
        fc.asyncProperty(broken, fc.nat(), async (design, now) => {
          const area = memoryArea();
          const text = textOf(design);
          area.data.set(designKey('d'), text);
          const loaded = await loadDocument(area, 'd', now);
          expect(loaded.kind).toBe('keptAside');
          expect(area.data.get(`unreadable:d:${now}`)).toBe(text);
          expect(({} as Record<string, unknown>).polluted).toBeUndefined();
        }),
        { numRuns: 200 },
      );
    },
  );

  it('reads a stored design with a __proto__ key without polluting objects', async () => {
    const area = memoryArea();
    area.data.set(designKey('p'), `{"__proto__":{"polluted":true},${textOf(demoDesign()).slice(1)}`);
    const loaded = await loadDocument(area, 'p');
    expect(loaded.kind).toBe('restored');
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    if (loaded.kind === 'restored') expect(Object.getPrototypeOf(loaded.design)).toBe(Object.prototype);
  });

  it('makes distinct ids', () => {
    const ids = new Set(Array.from({ length: 1000 }, () => newDocumentId(42)));
    expect(ids.size).toBe(1000);
  });
});

describe('forgetting a document', () => {
  it('removes only its design and entry, and puts both back exactly as they were', async () => {
    const area = memoryArea();
    const kept = { ...demoDesign(), name: 'Kept' };
    const gone = { ...demoDesign(), name: 'Gone' };
    await saveDocument(area, 'a', kept, textOf(kept), 1);
    const blob = new Blob([textOf(gone)]);
    await saveDocument(area, 'b', gone, blob, 2);
    area.data.set('unreadable:b:5', 'old text');
    const forgotten = await forgetDocument(area, 'b');
    expect(forgotten?.about?.name).toBe('Gone');
    expect((await listDocuments(area)).map((d) => d.name)).toEqual(['Kept']);
    expect([...area.data.keys()].sort()).toEqual(['about:a', 'design:a', 'unreadable:b:5']);
    if (!forgotten) throw new Error('forgotten');
    await rememberDocument(area, forgotten);
    expect((await listDocuments(area)).map((d) => d.name)).toEqual(['Gone', 'Kept']);
    // The very Blob that was stored comes back, and it still restores.
    expect(area.data.get(designKey('b'))).toBe(blob);
    const load = await loadDocument(area, 'b');
    expect(load.kind === 'restored' && load.design.name).toBe('Gone');
  });

  it('forgetting what is not there changes nothing', async () => {
    const area = memoryArea();
    await saveDocument(area, 'a', demoDesign(), textOf(demoDesign()), 1);
    expect(await forgetDocument(area, 'missing')).toBeNull();
    expect(area.data.size).toBe(2);
  });
});

describe('design text in pieces', () => {
  it('joins to exactly JSON.stringify of the design, for any piece size', () => {
    const design = designFromQuery('?generate=5x7');
    if (!design) throw new Error('no generated design');
    for (const size of [1, 3, 100, 5000]) {
      expect(Array.from(designTextPieces(design, size)).join('')).toBe(JSON.stringify(design));
    }
    const empty = { ...design, blocks: [] };
    expect(Array.from(designTextPieces(empty)).join('')).toBe(JSON.stringify(empty));
  });

  it('a small design file is indented for people; a big one is compact, both restore to the same design', () => {
    const small = designFromQuery('?generate=5x7');
    if (!small) throw new Error('no generated design');
    expect(Array.from(designFilePieces(small))).toEqual([`${JSON.stringify(small, null, 2)}\n`]);
    const big = generatedDemoGrid(130, 130);
    expect(big.blocks.length).toBeGreaterThan(INDENTED_FILE_BLOCKS);
    const text = Array.from(designFilePieces(big)).join('');
    expect(text).toBe(`${JSON.stringify(big)}\n`);
  });

  it('slices every inactive variant’s block list as well, and still joins to exactly JSON.stringify', () => {
    const big = variantContent(generatedDemoGrid(40, 40));
    const design: Design = {
      ...demoDesign(),
      variants: {
        activeId: 'v2',
        entries: [
          { id: 'v1', design: variantContent({ ...demoDesign(), name: 'Small' }) },
          { id: 'v2', design: null },
          { id: 'v3', design: big },
          { id: 'v4', design: { ...variantContent(demoDesign()), name: 'Empty', blocks: [] } },
        ],
      },
    };
    const whole = JSON.stringify(design);
    expect(restoreDesign(whole).ok).toBe(true);
    for (const size of [1, 7, 500, 100_000]) {
      expect(Array.from(designTextPieces(design, size)).join('')).toBe(whole);
    }
    // No piece holds the big variant whole: its 4,800 blocks come a few hundred at a time.
    const pieces = Array.from(designTextPieces(design, 500));
    const largest = Math.max(...pieces.map((p) => p.length));
    expect(largest).toBeLessThan(JSON.stringify(big.blocks.slice(0, 600)).length);
    expect(big.blocks.length).toBeGreaterThan(4000);
  });
});

describe('exports in pieces', () => {
  it('the summary JSON pieces join to exactly JSON.stringify(reportSummary(…), null, 2)', async () => {
    const { summaryJsonPieces } = await import('../../src/io/summaryText');
    const { reportSummary } = await import('../../src/io/summary');
    const { evaluate } = await import('../../src/engine');
    const design = designFromQuery('?generate=3x4');
    if (!design) throw new Error('no generated design');
    const report = evaluate(design);
    const whole = JSON.stringify(reportSummary(design, report), null, 2);
    for (const size of [1, 5, 1000])
      expect(Array.from(summaryJsonPieces(design, report, size)).join('')).toBe(whole);
    const empty = { ...design, blocks: [] };
    const emptyReport = evaluate(empty);
    expect(Array.from(summaryJsonPieces(empty, emptyReport)).join('')).toBe(
      JSON.stringify(reportSummary(empty, emptyReport), null, 2),
    );
  });
});
