/**
 * `text` cut with an ellipsis so that it is at most `maxWidth` pixels wide in the context's current font
 * (binary search over the length, so a 200-character name costs a handful of measurements). Used where
 * a person's name is drawn into a fixed space: a mat label, the PNG title block.
 */
export function fitText(
  ctx: { measureText(text: string): { width: number } },
  text: string,
  maxWidth: number,
): string {
  if (ctx.measureText(text).width <= maxWidth) return text;
  const chars = Array.from(text);
  let low = 0;
  let high = chars.length;
  while (low < high) {
    const mid = Math.ceil((low + high) / 2);
    if (ctx.measureText(`${chars.slice(0, mid).join('')}…`).width <= maxWidth) low = mid;
    else high = mid - 1;
  }
  return low === 0 ? '' : `${chars.slice(0, low).join('')}…`;
}
