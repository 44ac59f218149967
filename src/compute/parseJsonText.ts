/**
 * JSON text: parse without throwing, and say where broken JSON is broken (line and column). Node's
 * JSON.parse messages do not always carry a position, so on failure findJsonSyntaxError finds the
 * first offending character.
 */
import { findDuplicateKey } from './findDuplicateKey';
import { findJsonSyntaxError, MAX_JSON_DEPTH } from './findJsonSyntaxError';
import { lineColumn } from './lineColumn';

export type JsonParseResult = { ok: true; value: unknown } | { ok: false; errors: string[] };

export function parseJsonText(text: string, label = 'input'): JsonParseResult {
  if (typeof text !== 'string') return { ok: false, errors: [`${label}: expected JSON text`] };
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  try {
    const value: unknown = JSON.parse(body);
    // Valid but absurdly deep JSON would overflow the stack of every recursive step after parsing
    // (validation, copying, messages): refuse it here, where the position is known.
    const deep = nestingBeyond(body, MAX_JSON_DEPTH);
    if (deep >= 0) {
      const { line, column } = lineColumn(body, deep);
      return {
        ok: false,
        errors: [`${label}: nesting deeper than ${MAX_JSON_DEPTH} levels at line ${line}, column ${column}`],
      };
    }
    const twice = findDuplicateKey(body);
    if (twice !== null) {
      const { line, column } = lineColumn(body, twice.pos);
      return {
        ok: false,
        errors: [
          `${twice.path}: the key "${twice.key}" appears twice in one object (line ${line}, column ${column}); name each key once`,
        ],
      };
    }
    return { ok: true, value };
  } catch (error) {
    let located: { pos: number; message: string } | null = null;
    try {
      located = findJsonSyntaxError(body);
    } catch {
      located = null;
    }
    if (located === null) {
      const reason = error instanceof Error ? error.message : String(error);
      return { ok: false, errors: [`${label}: invalid JSON: ${reason}`] };
    }
    const { line, column } = lineColumn(body, located.pos);
    return {
      ok: false,
      errors: [`${label}: invalid JSON at line ${line}, column ${column}: ${located.message}`],
    };
  }
}

/** Offset of the first bracket opening a level deeper than `max` in valid JSON text, or -1. */
function nestingBeyond(text: string, max: number): number {
  let depth = 0;
  let inString = false;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (inString) {
      if (c === 92) i++;
      else if (c === 34) inString = false;
    } else if (c === 34) {
      inString = true;
    } else if (c === 91 || c === 123) {
      if (++depth > max) return i;
    } else if (c === 93 || c === 125) {
      depth--;
    }
  }
  return -1;
}
