/**
 * The 32-bit words of an array of doubles, two per double in memory order (a view, no copy): equal words,
 * equal bits. Hot passes compare these instead of the doubles because an int32 read in V8's interpreter
 * allocates nothing, where a double read is a new heap number (DEVELOPERS.md, "Rows that repeat are worked out once").
 */
export function wordsOf(values: Float64Array): Int32Array {
  return new Int32Array(values.buffer, values.byteOffset, 2 * values.length);
}
