import { describe, expect, it } from 'vitest';
import {
  chooseSaveTarget,
  DOWNLOAD_TEXT_LIMIT,
  writePieces,
  type WritableFileHandle,
  type WriteOptions,
} from '../../src/app/saveToFile';

// Source: common practice (no source): a file export completes or fails with a message; it never throws
// at the page, and a download never grows past what the browser can hold.

const JSON_KIND = { description: 'JSON', mime: 'application/json', extension: '.json' };

/** A file handle whose writable stream records each write, and can fail at a given write. */
function fakeFile(failAt = -1) {
  const writes: string[] = [];
  const log: string[] = [];
  const handle: WritableFileHandle = {
    kind: 'file',
    name: 'picked.json',
    createWritable: async () => ({
      write: async (data) => {
        if (writes.length === failAt) throw new Error('disk full');
        writes.push(String(data));
      },
      close: async () => void log.push('close'),
      abort: async () => void log.push('abort'),
    }),
  };
  return { handle, writes, log };
}

/** Download options that keep the offered Blob. */
function downloadOptions(extra: Partial<WriteOptions> = {}) {
  const offered: { blob: Blob; name: string }[] = [];
  const options: WriteOptions = {
    fileName: 'x.json',
    kind: JSON_KIND,
    pause: async () => undefined,
    download: (blob, name) => void offered.push({ blob, name }),
    ...extra,
  };
  return { options, offered };
}

/** Pieces that count how many were pulled. */
function* counted(pieces: string[], pulled: { n: number }) {
  for (const p of pieces) {
    pulled.n++;
    yield p;
  }
}

describe('choosing where a file goes', () => {
  it('downloads without a picker; uses the picked file; a cancelled picker writes nothing', async () => {
    expect(await chooseSaveTarget('a.json', JSON_KIND, undefined)).toEqual({ kind: 'download' });
    const { handle } = fakeFile();
    let asked: unknown;
    const picked = await chooseSaveTarget('a.json', JSON_KIND, async (options) => {
      asked = options;
      return handle;
    });
    expect(picked).toEqual({ kind: 'file', handle });
    expect(asked).toEqual({
      suggestedName: 'a.json',
      types: [{ description: 'JSON', accept: { 'application/json': ['.json'] } }],
    });
    const cancel = async () => {
      throw new DOMException('The user aborted a request.', 'AbortError');
    };
    expect(await chooseSaveTarget('a.json', JSON_KIND, cancel)).toEqual({ kind: 'cancelled' });
    // A picker refused for another reason (blocked, no user activation): the download still works.
    const blocked = async () => {
      throw new DOMException('Must be handling a user gesture.', 'SecurityError');
    };
    expect(await chooseSaveTarget('a.json', JSON_KIND, blocked)).toEqual({ kind: 'download' });
  });
});

describe('writing pieces', () => {
  it('streams each piece into a picked file as its own write, then closes it', async () => {
    const { handle, writes, log } = fakeFile();
    const { options } = downloadOptions();
    const outcome = await writePieces({ kind: 'file', handle }, ['{"a":', '1', '}'], options);
    expect(outcome).toEqual({ kind: 'written', name: 'picked.json', characters: 7 });
    expect(writes).toEqual(['{"a":', '1', '}']);
    expect(log).toEqual(['close']);
  });

  it('a write that fails aborts the stream and is an outcome, not an exception', async () => {
    const { handle, log } = fakeFile(1);
    const outcome = await writePieces({ kind: 'file', handle }, ['a', 'b', 'c'], downloadOptions().options);
    expect(outcome.kind).toBe('failed');
    expect(log).toEqual(['abort']);
  });

  it('a download is the pieces, in order, in one Blob', async () => {
    const { options, offered } = downloadOptions();
    const pieces = Array.from({ length: 1000 }, (_, i) => `${i},`);
    const outcome = await writePieces({ kind: 'download' }, pieces, options);
    expect(outcome).toEqual({ kind: 'downloaded', name: 'x.json', characters: pieces.join('').length });
    expect(offered).toHaveLength(1);
    expect(await offered[0]?.blob.text()).toBe(pieces.join(''));
    expect(offered[0]?.blob.type).toBe('application/json');
  });

  it('refuses a download over the limit: at once from the estimate, or when the text passes it', async () => {
    const pulled = { n: 0 };
    const early = downloadOptions({ lengthEstimate: 2001, limit: 2000 });
    expect(await writePieces({ kind: 'download' }, counted(['x'], pulled), early.options)).toEqual({
      kind: 'tooLarge',
      characters: 2001,
      limit: 2000,
    });
    expect(pulled.n).toBe(0);
    expect(early.offered).toHaveLength(0);
    // The estimate was low: the text is stopped as soon as it passes the limit.
    const late = downloadOptions({ lengthEstimate: 10, limit: 2000 });
    const outcome = await writePieces(
      { kind: 'download' },
      counted(
        Array.from({ length: 100 }, () => 'y'.repeat(100)),
        pulled,
      ),
      late.options,
    );
    expect(outcome).toEqual({ kind: 'tooLarge', characters: 2100, limit: 2000 });
    expect(pulled.n).toBe(21);
    expect(late.offered).toHaveLength(0);
    expect(DOWNLOAD_TEXT_LIMIT).toBe(256 * 1024 * 1024);
  });

  it('pieces that throw (out of memory, say) end as a failure', async () => {
    function* broken(): Generator<string> {
      yield 'a';
      throw new RangeError('Invalid string length');
    }
    const { options, offered } = downloadOptions();
    const outcome = await writePieces({ kind: 'download' }, broken(), options);
    expect(outcome.kind).toBe('failed');
    expect(offered).toHaveLength(0);
    const { handle, log } = fakeFile();
    expect((await writePieces({ kind: 'file', handle }, broken(), options)).kind).toBe('failed');
    expect(log).toEqual(['abort']);
  });
});
