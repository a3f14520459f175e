/**
 * Design files as bytes to text, the same way in the CLI and the browser: UTF-8 with or without a
 * byte-order mark, and UTF-16 (little- or big-endian) when it starts with its byte-order mark. Without a
 * mark the bytes must be valid UTF-8; anything else is refused with a message rather than read as
 * replacement characters. (The byte-order marks are those of the Unicode Standard, §23.8.)
 */

export type DecodedText =
  { readonly ok: true; readonly text: string } | { readonly ok: false; readonly error: string };

export function decodeDesignBytes(bytes: Uint8Array): DecodedText {
  const b0 = bytes[0];
  const b1 = bytes[1];
  let encoding: 'utf-8' | 'utf-16le' | 'utf-16be' = 'utf-8';
  let skip = 0;
  if (b0 === 0xef && b1 === 0xbb && bytes[2] === 0xbf) skip = 3;
  else if (b0 === 0xff && b1 === 0xfe) [encoding, skip] = ['utf-16le', 2];
  else if (b0 === 0xfe && b1 === 0xff) [encoding, skip] = ['utf-16be', 2];
  try {
    // ignoreBOM: the mark was already skipped above, so a second one would be kept as text (and refused).
    const decoder = new TextDecoder(encoding, { fatal: true, ignoreBOM: true });
    return { ok: true, text: decoder.decode(bytes.subarray(skip)) };
  } catch {
    const name =
      encoding === 'utf-8'
        ? 'UTF-8'
        : encoding === 'utf-16le'
          ? 'UTF-16 (little-endian)'
          : 'UTF-16 (big-endian)';
    return {
      ok: false,
      error: `not readable as ${name} text; save the file as UTF-8 (or as UTF-16 with a byte-order mark)`,
    };
  }
}
