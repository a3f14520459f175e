/**
 * Longest piece of a person's text (a name, an id, a file name) quoted in a message, in characters.
 * Names may be up to 200 characters and ids 80; a message stays one readable line (the number is a
 * choice, not a standard).
 */
export const MESSAGE_QUOTE_LIMIT = 40;

/**
 * A string as quoted in a message: cut to {@link MESSAGE_QUOTE_LIMIT} characters with an ellipsis, and
 * control characters (line breaks, escapes, tabs) shown as \u escapes so that a message stays one line
 * and a terminal never obeys them.
 */
export function clipForMessage(text: string, limit = MESSAGE_QUOTE_LIMIT): string {
  const chars = Array.from(text);
  const cut = chars.length > limit ? `${chars.slice(0, limit).join('')}…` : text;
  return escapeControlCharacters(cut);
}

// eslint-disable-next-line no-control-regex -- finding control characters is the point
const CONTROL_CHARACTERS = /[\u0000-\u001f\u007f-\u009f]/g;

/** Replaces C0 and C1 control characters (and DEL) with visible \u escapes. */
export function escapeControlCharacters(text: string): string {
  return text.replace(CONTROL_CHARACTERS, (c) => `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`);
}
