/**
 * One CSV field (RFC 4180): quoted when it holds a comma, quote or line break; a number written as is,
 * a non-finite one left empty. Text that a spreadsheet would run as a formula (starting with =, +, -, @,
 * a tab or a carriage return) gets a leading apostrophe, so that a mat named "=HYPERLINK(…)" stays
 * text when the file is opened (the usual defence against CSV formula injection; common practice, no
 * standard). Numbers are never changed: a negative figure is still a number.
 */
export function csvField(value: string | number): string {
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : '';
  const text = /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}
