// Clipping user text for messages (common practice, no source).
import { describe, expect, it } from 'vitest';
import { clipText } from '../../src/compute/clipText';

describe('clipText', () => {
  it('keeps short text, cuts long text with its length, escapes control characters', () => {
    expect(clipText('abc')).toBe('abc');
    expect(clipText('x'.repeat(100), 10)).toBe('xxxxxxxxxx... (100 characters)');
    expect(clipText('a\u001b[31mb\n\u007f')).toBe('a\\x1b[31mb\\x0a\\x7f');
    expect(() => clipText('a', 0)).toThrow(RangeError);
  });
});
