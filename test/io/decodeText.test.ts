import { describe, expect, it } from 'vitest';
import { decodeDesignBytes } from '../../src/io/decodeText';
import { restoreShared, shareFragment, sharedPayload } from '../../src/io/shareLink';
import { demoDesign } from '../../src/designs/demoDesign';

// Source: The Unicode Standard, §23.8 (byte-order marks: EF BB BF for UTF-8, FF FE / FE FF for UTF-16),
// from memory.

const text = '{"name":"Ünïcode µm ✓"}';

describe('design file bytes to text', () => {
  it('reads UTF-8 with and without a byte-order mark', () => {
    const plain = new TextEncoder().encode(text);
    expect(decodeDesignBytes(plain)).toEqual({ ok: true, text });
    expect(decodeDesignBytes(new Uint8Array([0xef, 0xbb, 0xbf, ...plain]))).toEqual({ ok: true, text });
  });

  it('reads UTF-16 little- and big-endian after their byte-order marks', () => {
    const le = Buffer.from(text, 'utf16le');
    const be = Buffer.from(le).swap16();
    expect(decodeDesignBytes(new Uint8Array([0xff, 0xfe, ...le]))).toEqual({ ok: true, text });
    expect(decodeDesignBytes(new Uint8Array([0xfe, 0xff, ...be]))).toEqual({ ok: true, text });
  });

  it('refuses bytes that are not UTF-8 when there is no mark, naming the encodings it reads', () => {
    const latin1 = new Uint8Array([0x7b, 0x22, 0xe9, 0x22, 0x7d]);
    const decoded = decodeDesignBytes(latin1);
    expect(decoded.ok).toBe(false);
    if (!decoded.ok) expect(decoded.error).toMatch(/UTF-8.*UTF-16/);
  });
});

describe('share links', () => {
  it('round-trips the demo design through a compressed fragment', async () => {
    const made = await shareFragment(demoDesign());
    expect(made.ok).toBe(true);
    if (!made.ok) return;
    // The demo's 11.6 kB of JSON must shrink, or links would be needlessly long.
    expect(made.fragment.length).toBeLessThan(JSON.stringify(demoDesign()).length / 2);
    const payload = sharedPayload(`#${made.fragment}`);
    expect(payload).not.toBeNull();
    const restored = await restoreShared(payload ?? '');
    expect(restored.ok && restored.design).toEqual(demoDesign());
  });

  it('refuses a damaged link with a message and never throws', async () => {
    const restored = await restoreShared('not-really-deflate');
    expect(restored.ok).toBe(false);
    if (!restored.ok) expect(restored.errors[0]).toMatch(/damaged/);
    expect(sharedPayload('#other=1')).toBeNull();
  });

  it('says a design is too large for a link instead of making one', async () => {
    const many = {
      ...demoDesign(),
      blocks: Array.from({ length: 3000 }, (_, i) => ({
        ...demoDesign().blocks[0],
        id: `b${i}`,
        x: i * 1e-6,
      })),
    };
    const made = await shareFragment(many as ReturnType<typeof demoDesign>);
    expect(made.ok).toBe(false);
    if (!made.ok) expect(made.error).toMatch(/Save it to a file/);
  });
});
