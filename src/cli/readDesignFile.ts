import { closeSync, constants, fstatSync, openSync, readSync } from 'node:fs';
import { formatWholeNumber } from '../model/units';

/**
 * Reads a design file for the CLI: only a regular file (a device, FIFO or socket could block or never
 * end), and never more than `limit` bytes, counted while reading, so a file that grows or lies about
 * its size is still cut off. Throws an Error whose message says why.
 */
export function readDesignFileBytes(path: string, limit: number): Uint8Array {
  // Non-blocking, so that opening a FIFO with no writer returns at once instead of waiting forever.
  const fd = openSync(path, constants.O_RDONLY | constants.O_NONBLOCK);
  try {
    const stat = fstatSync(fd);
    if (!stat.isFile()) {
      const kind = stat.isDirectory()
        ? 'a directory'
        : stat.isFIFO()
          ? 'a FIFO (named pipe)'
          : stat.isCharacterDevice() || stat.isBlockDevice()
            ? 'a device'
            : stat.isSocket()
              ? 'a socket'
              : 'not a regular file';
      throw new Error(`it is ${kind}; give a regular design file`);
    }
    if (stat.size > limit) throw new TooLargeError(stat.size, limit);
    const chunks: Uint8Array[] = [];
    let total = 0;
    const buffer = new Uint8Array(1 << 20);
    for (;;) {
      const read = readSync(fd, buffer, 0, buffer.length, null);
      if (read === 0) break;
      total += read;
      if (total > limit) throw new TooLargeError(total, limit);
      chunks.push(buffer.slice(0, read));
    }
    const bytes = new Uint8Array(total);
    let at = 0;
    for (const chunk of chunks) {
      bytes.set(chunk, at);
      at += chunk.length;
    }
    return bytes;
  } finally {
    closeSync(fd);
  }
}

export class TooLargeError extends Error {
  constructor(size: number, limit: number) {
    super(
      `it is at least ${formatWholeNumber(size)} bytes; the limit for a design file is ${formatWholeNumber(limit)}`,
    );
  }
}
