import { formatWholeNumber } from '../model/units';
/**
 * Writing a file the person asked for (a design, a summary JSON, a CSV), made of text pieces so that a
 * whole die never becomes one giant string. Two ways, chosen by what the browser has:
 *
 * - **A save picker** (File System Access `showSaveFilePicker`, Chromium-based browsers): the person
 *   picks the file, and the pieces stream into it one by one; nothing but the current piece is held in
 *   memory, so there is no size limit below the disk's.
 * - **A download** otherwise: the pieces go into Blobs a few megabytes at a time (the strings are let go
 *   as they are copied), and one Blob of those is offered as a download. The browser holds that Blob
 *   until the download is saved, so a text above {@link DOWNLOAD_TEXT_LIMIT} is refused with a message
 *   before it is made, never an out-of-memory crash of the tab.
 *
 * Picking must happen inside the click that asked for the file (browsers allow a picker only during
 * user activation), so {@link chooseSaveTarget} runs first and the pieces are made after.
 */

/** The parts of a File System Access writable stream used here (not yet in TypeScript's DOM library). */
export interface WritableFileStream {
  write(data: string | Blob): Promise<void>;
  close(): Promise<void>;
  abort?: () => Promise<void>;
}

/** A file the browser lets us write (from a save or open picker, or a drop). */
export interface WritableFileHandle {
  readonly kind: 'file';
  readonly name: string;
  createWritable?: () => Promise<WritableFileStream>;
}

/** What a file holds, for the picker's type filter and the download's MIME type. */
export interface FileKind {
  readonly description: string;
  readonly mime: string;
  readonly extension: string;
}

export type SaveFilePicker = (options: {
  suggestedName: string;
  types: { description: string; accept: Record<string, string[]> }[];
}) => Promise<WritableFileHandle>;

/**
 * Most characters a download may have (UTF-16 code units; the file's UTF-8 bytes are about as many for
 * our ASCII-heavy JSON and CSV): 256 Mi. A limit we chose (common practice, no source): well below what
 * desktop browsers keep of a Blob in memory, so a download never takes the tab down. The 300,000-mat
 * summary JSON (~714 MB) is above it and is refused; its per-mat CSV (~98 MB) is below it.
 */
export const DOWNLOAD_TEXT_LIMIT = 256 * 1024 * 1024;

/** Characters gathered before they are copied into a Blob and let go. */
const BLOB_CHUNK = 8 * 1024 * 1024;

/** Where a file goes: a picked file, a download, or nowhere (the person cancelled). */
export type SaveTarget =
  | { readonly kind: 'file'; readonly handle: WritableFileHandle }
  | { readonly kind: 'download' }
  | { readonly kind: 'cancelled' };

/** The browser's save picker, when it has one. */
export function browserSavePicker(): SaveFilePicker | undefined {
  if (typeof window === 'undefined') return undefined;
  const picker = (window as unknown as { showSaveFilePicker?: SaveFilePicker }).showSaveFilePicker;
  return typeof picker === 'function' ? picker.bind(window) : undefined;
}

const isAbort = (error: unknown) =>
  typeof error === 'object' && error !== null && (error as { name?: unknown }).name === 'AbortError';

/**
 * Asks where to write: the save picker where the browser has one (call this first, inside the click),
 * else a download. A cancelled picker is `cancelled`; a picker that fails for another reason (a
 * blocked or insecure page) falls back to a download.
 */
export async function chooseSaveTarget(
  suggestedName: string,
  kind: FileKind,
  picker: SaveFilePicker | undefined = browserSavePicker(),
): Promise<SaveTarget> {
  if (!picker) return { kind: 'download' };
  try {
    const handle = await picker({
      suggestedName,
      types: [{ description: kind.description, accept: { [kind.mime]: [kind.extension] } }],
    });
    return handle.createWritable ? { kind: 'file', handle } : { kind: 'download' };
  } catch (error) {
    return isAbort(error) ? { kind: 'cancelled' } : { kind: 'download' };
  }
}

/** How writing ended. `characters` counts what was written (for tooLarge: the size that was refused). */
export type WriteOutcome =
  | { readonly kind: 'written'; readonly name: string; readonly characters: number }
  | { readonly kind: 'downloaded'; readonly name: string; readonly characters: number }
  | { readonly kind: 'tooLarge'; readonly characters: number; readonly limit: number }
  | { readonly kind: 'failed'; readonly error: unknown };

export interface WriteOptions {
  /** Name of the download (a picked file keeps the name the person gave it). */
  readonly fileName: string;
  readonly kind: FileKind;
  /** An estimate of the text's length made before writing: a download above the limit is refused at once. */
  readonly lengthEstimate?: number;
  readonly limit?: number;
  /** Told the characters written so far, after each piece. */
  readonly onProgress?: (characters: number) => void;
  /** Lets the page paint and take input between pieces (default: a macrotask). */
  readonly pause?: () => Promise<void>;
  /** Offers a Blob as a download (default: the page's download link). */
  readonly download: (blob: Blob, fileName: string) => void;
}

const macrotask = () => new Promise<void>((resolve) => setTimeout(resolve, 0));

/** Pauses at most every this many milliseconds of work. */
const WORK_SLICE_MS = 40;

/** Writes the pieces to the target; never throws (a failure is an outcome). */
export async function writePieces(
  target: Exclude<SaveTarget, { kind: 'cancelled' }>,
  pieces: Iterable<string>,
  options: WriteOptions,
): Promise<WriteOutcome> {
  return target.kind === 'file'
    ? streamToFile(target.handle, pieces, options)
    : downloadInBlobs(pieces, options);
}

async function streamToFile(
  handle: WritableFileHandle,
  pieces: Iterable<string>,
  { onProgress }: WriteOptions,
): Promise<WriteOutcome> {
  let stream: WritableFileStream | undefined;
  let characters = 0;
  try {
    if (!handle.createWritable) throw new Error('the file cannot be written');
    stream = await handle.createWritable();
    for (const piece of pieces) {
      // Each write waits for the file: the next piece is made only then, so one piece is in memory.
      await stream.write(piece);
      characters += piece.length;
      onProgress?.(characters);
    }
    await stream.close();
    return { kind: 'written', name: handle.name, characters };
  } catch (error) {
    // Leave the file as it was: an aborted writable stream discards what it had.
    await stream?.abort?.().catch(() => undefined);
    return { kind: 'failed', error };
  }
}

async function downloadInBlobs(pieces: Iterable<string>, options: WriteOptions): Promise<WriteOutcome> {
  const limit = options.limit ?? DOWNLOAD_TEXT_LIMIT;
  if ((options.lengthEstimate ?? 0) > limit)
    return { kind: 'tooLarge', characters: options.lengthEstimate ?? 0, limit };
  const pause = options.pause ?? macrotask;
  const blobs: Blob[] = [];
  let chunk: string[] = [];
  let chunkLength = 0;
  let characters = 0;
  try {
    let sliceStart = Date.now();
    for (const piece of pieces) {
      characters += piece.length;
      if (characters > limit) return { kind: 'tooLarge', characters, limit };
      chunk.push(piece);
      chunkLength += piece.length;
      if (chunkLength >= BLOB_CHUNK) {
        blobs.push(new Blob(chunk));
        chunk = [];
        chunkLength = 0;
      }
      options.onProgress?.(characters);
      if (Date.now() - sliceStart > WORK_SLICE_MS) {
        await pause();
        sliceStart = Date.now();
      }
    }
    if (chunk.length > 0) blobs.push(new Blob(chunk));
    options.download(new Blob(blobs, { type: options.kind.mime }), options.fileName);
    return { kind: 'downloaded', name: options.fileName, characters };
  } catch (error) {
    return { kind: 'failed', error };
  }
}

/** Characters as people read a file size: "714 MB" (10⁶, as file managers show it). */
export function sizeText(characters: number): string {
  const mb = characters / 1e6;
  return mb >= 10 ? `${formatWholeNumber(mb)} MB` : `${mb.toPrecision(2)} MB`;
}
