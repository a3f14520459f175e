/**
 * A typed buffer kept between calls for a temporary that never leaves the module owning it, grown when a
 * call needs more: evaluating a large die again and again then allocates (and zero-fills) tens of
 * megabytes less per call. Its contents are stale, and it may be longer than asked for; callers
 * initialise what they read and use their own lengths. Not for anything a caller keeps.
 */
export class ScratchBuffer {
  private buffer = new Int32Array(0);

  take(length: number): Int32Array {
    if (this.buffer.length < length)
      this.buffer = new Int32Array(Math.max(length, Math.ceil(1.5 * this.buffer.length)));
    return this.buffer;
  }

  /** Grows to at least `length`, keeping the first `keep` entries. */
  grow(length: number, keep: number): Int32Array {
    if (this.buffer.length >= length) return this.buffer;
    const old = this.buffer;
    this.take(length).set(old.subarray(0, keep));
    return this.buffer;
  }
}
