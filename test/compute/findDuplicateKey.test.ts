// Duplicate keys in JSON text (RFC 8259 section 4 leaves them to the reader; CoverSweep refuses them).
import { describe, expect, it } from 'vitest';
import { parseJsonText } from '../../src/compute/caseFile';
import { findDuplicateKey } from '../../src/compute/findDuplicateKey';

describe('findDuplicateKey', () => {
  it('finds the first repeated key with its key path and offset, after unescaping', () => {
    const cases: Array<[string, string | null, number | null]> = [
      ['{"a": 1, "b": 2}', null, null],
      ['{"a": 1, "a": 2}', 'a', 9],
      ['{"a": {"b": 1}, "c": {"b": 2}}', null, null],
      ['{"w": {"x": [1, {"k": 1, "k": 2}]}}', 'w.x[1].k', 25],
      ['{"s": "{\\"s\\": 1, \\"s\\": 2}", "t": ["a", "a"]}', null, null],
      ['{"q\\"": 1, "q\\u0022": 2}', 'q"', 11],
      ['{"__proto__": 1, "__proto__": 2}', '__proto__', 17],
      ['[{"a": 1}, {"a": 1}, {"b": 1, "b": 1}]', '[2].b', 30],
    ];
    for (const [text, path, pos] of cases) {
      const found = findDuplicateKey(text);
      expect(found?.path ?? null, text).toBe(path);
      expect(found?.pos ?? null, text).toBe(pos);
    }
  });

  it('parseJsonText refuses a duplicate with line and column', () => {
    const r = parseJsonText('{\n  "conditions": {},\n  "conditions": {}\n}', 'case file');
    expect(r).toEqual({
      ok: false,
      errors: [
        'conditions: the key "conditions" appears twice in one object (line 3, column 3); name each key once',
      ],
    });
  });
});
