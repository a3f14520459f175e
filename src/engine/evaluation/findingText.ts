/** Names shown before a grouped finding's detail: one name, or the count and the first few. */
export function groupLabel(count: number, labels: readonly string[]): string {
  if (count === 1) return labels[0] ?? '';
  return `${count} mats (${labels.join(', ')}${count > labels.length ? ', …' : ''})`;
}
