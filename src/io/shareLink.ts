import type { Design } from '../model/design';
import { clipForMessage } from '../model/messageText';
import { restoreDesignWhenLoaded } from './checksOnDemand';
import type { RestoreResult } from './restore';
import { formatWholeNumber } from '../model/units';

/**
 * A design carried in a page address: its file text, deflate-compressed (the browser's own
 * CompressionStream, RFC 1951 raw deflate) and written in URL-safe base64 (RFC 4648 §5) after
 * `#design=`. A fragment is never sent to a server, and opening one starts a new document.
 */

export const SHARE_FRAGMENT_KEY = 'design';

/**
 * Longest fragment a share link may carry (characters). Browsers accept far longer addresses, but chat
 * programs and mail cut long links; 16,000 is a choice, enough for a few hundred blocks.
 */
export const MAX_SHARE_FRAGMENT_LENGTH = 16_000;

/** Largest design text a share link may unpack to, so a small link cannot expand into gigabytes. */
const MAX_UNPACKED_LENGTH = 4 * 1024 * 1024;

async function pipeBytes(
  bytes: Uint8Array,
  stream: CompressionStream | DecompressionStream,
  limit = Infinity,
) {
  const reader = new Blob([bytes as BlobPart]).stream().pipeThrough(stream).getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.length;
    if (total > limit) {
      await reader.cancel();
      throw new Error(`it unpacks to more than ${formatWholeNumber(limit)} bytes`);
    }
    chunks.push(value);
  }
  const out = new Uint8Array(total);
  let at = 0;
  for (const chunk of chunks) {
    out.set(chunk, at);
    at += chunk.length;
  }
  return out;
}

function toBase64Url(bytes: Uint8Array): string {
  let binary = '';
  for (let i = 0; i < bytes.length; i += 0x8000) {
    binary += String.fromCharCode(...bytes.subarray(i, i + 0x8000));
  }
  return btoa(binary).replace(/\+/g, '-').replace(/\//g, '_').replace(/=+$/, '');
}

function fromBase64Url(text: string): Uint8Array {
  const binary = atob(text.replace(/-/g, '+').replace(/_/g, '/'));
  const bytes = new Uint8Array(binary.length);
  for (let i = 0; i < binary.length; i++) bytes[i] = binary.charCodeAt(i);
  return bytes;
}

/** The fragment (without "#") for a design, or why it is too large for a link. */
export async function shareFragment(
  design: Design,
): Promise<{ ok: true; fragment: string } | { ok: false; error: string }> {
  const packed = await pipeBytes(
    new TextEncoder().encode(JSON.stringify(design)),
    new CompressionStream('deflate-raw'),
  );
  const fragment = `${SHARE_FRAGMENT_KEY}=${toBase64Url(packed)}`;
  if (fragment.length > MAX_SHARE_FRAGMENT_LENGTH) {
    return {
      ok: false,
      error: `this design needs a ${formatWholeNumber(fragment.length)}-character link; links are kept under ${formatWholeNumber(MAX_SHARE_FRAGMENT_LENGTH)}. Save it to a file and send the file instead`,
    };
  }
  return { ok: true, fragment };
}

/** The packed text of a page address's fragment, or null when it carries no design. */
export function sharedPayload(hash: string): string | null {
  const params = new URLSearchParams(hash.replace(/^#/, ''));
  return params.get(SHARE_FRAGMENT_KEY);
}

/** Unpacks a share link's payload through the one restore path. Never throws. */
export async function restoreShared(payload: string): Promise<RestoreResult> {
  if (payload.length > MAX_SHARE_FRAGMENT_LENGTH) {
    return {
      ok: false,
      errors: [
        `the link is ${formatWholeNumber(payload.length)} characters long; the limit is ${formatWholeNumber(MAX_SHARE_FRAGMENT_LENGTH)}`,
      ],
    };
  }
  let text: string;
  try {
    const bytes = await pipeBytes(
      fromBase64Url(payload),
      new DecompressionStream('deflate-raw'),
      MAX_UNPACKED_LENGTH,
    );
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch (error) {
    return {
      ok: false,
      errors: [
        `the link is damaged (${clipForMessage(error instanceof Error ? error.message : String(error), 120)})`,
      ],
    };
  }
  return restoreDesignWhenLoaded(text);
}
