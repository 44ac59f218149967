/**
 * The first syntax error of JSON text, by a small recursive-descent scanner following the JSON grammar
 * (RFC 8259, sections 2-7).
 */

/** Deepest nesting accepted in CoverSweep's JSON files (deeper would overflow recursive steps). */
export const MAX_JSON_DEPTH = 512;

class JsonSyntaxError {
  constructor(
    readonly pos: number,
    readonly message: string,
  ) {}
}

function describeAt(text: string, pos: number): string {
  if (pos >= text.length) return 'the end of the text';
  const ch = text[pos]!;
  if (ch === '\n') return 'a line break';
  return JSON.stringify(ch);
}

/** The first syntax error of `text` as JSON, or null when it is valid. */
export function findJsonSyntaxError(text: string): { pos: number; message: string } | null {
  let i = 0;
  const n = text.length;
  const fail = (message: string): never => {
    throw new JsonSyntaxError(i, `${message}, found ${describeAt(text, i)}`);
  };
  const ws = () => {
    while (i < n) {
      const c = text.charCodeAt(i);
      if (c === 32 || c === 9 || c === 10 || c === 13) i++;
      else break;
    }
  };
  const literal = (word: string) => {
    for (let k = 0; k < word.length; k++) {
      if (text[i] !== word[k]) fail(`expected "${word}"`);
      i++;
    }
  };
  const string = () => {
    i++; // opening quote
    while (true) {
      if (i >= n) fail('unterminated string');
      const c = text.charCodeAt(i);
      if (c === 34) {
        i++;
        return;
      }
      if (c < 32) fail('control character or line break inside a string (escape it)');
      if (c === 92) {
        i++;
        const e = text[i];
        if (e === 'u') {
          for (let k = 1; k <= 4; k++) {
            if (!/[0-9a-fA-F]/.test(text[i + k] ?? '')) {
              i += k;
              fail('expected 4 hex digits after \\u');
            }
          }
          i += 5;
        } else if (e !== undefined && '"\\/bfnrt'.includes(e)) {
          i++;
        } else {
          fail('invalid escape in string');
        }
      } else {
        i++;
      }
    }
  };
  const digits = () => {
    const start = i;
    while (i < n && text.charCodeAt(i) >= 48 && text.charCodeAt(i) <= 57) i++;
    return i - start;
  };
  const number = () => {
    if (text[i] === '-') i++;
    if (text[i] === '0') i++;
    else if (digits() === 0) fail('expected a digit');
    if (text[i] === '.') {
      i++;
      if (digits() === 0) fail('expected a digit after the decimal point');
    }
    if (text[i] === 'e' || text[i] === 'E') {
      i++;
      if (text[i] === '+' || text[i] === '-') i++;
      if (digits() === 0) fail('expected a digit in the exponent');
    }
  };
  const value = (depth: number) => {
    if (depth > MAX_JSON_DEPTH) fail(`nesting deeper than ${MAX_JSON_DEPTH} levels`);
    ws();
    const ch = text[i];
    if (ch === '{') {
      i++;
      ws();
      if (text[i] === '}') {
        i++;
        return;
      }
      while (true) {
        ws();
        if (text[i] !== '"') fail('expected a property name in double quotes');
        string();
        ws();
        if (text[i] !== ':') fail('expected ":" after the property name');
        i++;
        value(depth + 1);
        ws();
        if (text[i] === ',') {
          i++;
          ws();
          if (text[i] === '}') fail('trailing comma before "}" (not allowed in JSON)');
          continue;
        }
        if (text[i] === '}') {
          i++;
          return;
        }
        fail('expected "," or "}" after a property value');
      }
    } else if (ch === '[') {
      i++;
      ws();
      if (text[i] === ']') {
        i++;
        return;
      }
      while (true) {
        value(depth + 1);
        ws();
        if (text[i] === ',') {
          i++;
          ws();
          if (text[i] === ']') fail('trailing comma before "]" (not allowed in JSON)');
          continue;
        }
        if (text[i] === ']') {
          i++;
          return;
        }
        fail('expected "," or "]" after a list element');
      }
    } else if (ch === '"') {
      string();
    } else if (ch === '-' || (ch !== undefined && ch >= '0' && ch <= '9')) {
      number();
    } else if (ch === 't') {
      literal('true');
    } else if (ch === 'f') {
      literal('false');
    } else if (ch === 'n') {
      literal('null');
    } else {
      fail(i >= n ? 'expected a value (the text is empty or ends early)' : 'expected a value');
    }
  };
  try {
    value(0);
    ws();
    if (i < n) fail('expected the end of the text after the top-level value');
    return null;
  } catch (error) {
    if (error instanceof JsonSyntaxError) return { pos: error.pos, message: error.message };
    throw error;
  }
}
