/**
 * The first key that appears twice in one object of valid JSON text, with its key path and offset, or
 * null. RFC 8259 (section 4) leaves duplicate names' meaning to the reader; JSON.parse keeps the last
 * silently, so a second `conditions` object would replace the first without a word. CoverSweep refuses
 * them. Keys are compared after unescaping ("a" and "\u0061" are the same key). A linear scan with an
 * explicit stack (no recursion); call it only on text JSON.parse accepted.
 */
export interface DuplicateKey {
  /** Key path of the repeated key, e.g. `wheel.cover.fraction` or `conditions.yaw_deg[2].x`. */
  path: string;
  key: string;
  /** Offset of the second occurrence's opening quote. */
  pos: number;
}

interface Frame {
  /** Keys seen so far (objects) or null (arrays). */
  keys: Set<string> | null;
  /** Current key (objects) or element index (arrays). */
  slot: string | number;
}

function pathOf(stack: readonly Frame[], last: string): string {
  let out = '';
  for (const frame of stack.slice(0, -1)) {
    out += typeof frame.slot === 'number' ? `[${frame.slot}]` : out === '' ? frame.slot : `.${frame.slot}`;
  }
  return out === '' ? last : `${out}.${last}`;
}

export function findDuplicateKey(text: string): DuplicateKey | null {
  const stack: Frame[] = [];
  let expectKey = false;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 34) {
      // A string: find its end (a quote not escaped).
      const start = i;
      i++;
      while (i < text.length && text.charCodeAt(i) !== 34) {
        if (text.charCodeAt(i) === 92) i++;
        i++;
      }
      const top = stack[stack.length - 1];
      if (expectKey && top?.keys) {
        const key = JSON.parse(text.slice(start, i + 1)) as string;
        if (top.keys.has(key)) return { path: pathOf(stack, key), key, pos: start };
        top.keys.add(key);
        top.slot = key;
        expectKey = false;
      }
    } else if (c === 123) {
      stack.push({ keys: new Set(), slot: '' });
      expectKey = true;
    } else if (c === 91) {
      stack.push({ keys: null, slot: 0 });
      expectKey = false;
    } else if (c === 125 || c === 93) {
      stack.pop();
      expectKey = false;
    } else if (c === 44) {
      const top = stack[stack.length - 1];
      if (top?.keys) expectKey = true;
      else if (top) top.slot = (top.slot as number) + 1;
    }
  }
  return null;
}
