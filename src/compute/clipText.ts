/**
 * Text from a user's file made safe to quote in a message: control characters shown as escapes (so a
 * cell cannot move a terminal's cursor or recolour it), and text longer than `maxChars` cut with an
 * ellipsis and its full length (a 5 MB cell is not echoed in full).
 */
export function clipText(text: string, maxChars = 60): string {
  if (!(Number.isInteger(maxChars) && maxChars >= 1)) {
    throw new RangeError(`maxChars must be an integer >= 1, got ${maxChars}`);
  }
  const head = text.length > maxChars ? text.slice(0, maxChars) : text;
  let shown = '';
  for (const c of head) {
    const code = c.charCodeAt(0);
    shown += code < 32 || code === 127 ? `\\x${code.toString(16).padStart(2, '0')}` : c;
  }
  return text.length > maxChars ? `${shown}... (${text.length} characters)` : shown;
}
