import { createHash } from 'node:crypto';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { sha256Hex } from '../../src/compute/sha256';

describe('sha256Hex', () => {
  // FIPS 180-4's examples (NIST, "SHA256.pdf", Cryptographic Standards and Guidelines: Examples with
  // Intermediate Values): "abc" and the 448-bit two-block message; the empty message's digest is the
  // well-known value (from memory, checked against Node's crypto below).
  const vectors: Array<[string, string]> = [
    ['abc', 'ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad'],
    [
      'abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq',
      '248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1',
    ],
    ['', 'e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855'],
  ];
  for (const [text, expected] of vectors) {
    it(`digests ${JSON.stringify(text.slice(0, 12))}… as FIPS 180-4 says`, () => {
      const got = sha256Hex(text);
      expect(got, `input=${JSON.stringify(text)} got=${got} expected=${expected} (exact)`).toBe(expected);
    });
  }

  it('agrees with Node crypto (an independent implementation) on random UTF-8 text of every padding length', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'grapheme', maxLength: 300 }), (text) => {
        const expected = createHash('sha256').update(text, 'utf8').digest('hex');
        expect(sha256Hex(text), `input=${JSON.stringify(text)}`).toBe(expected);
      }),
      { seed: 12, numRuns: 300 },
    );
    for (let n = 0; n < 200; n++) {
      const text = 'x'.repeat(n);
      expect(sha256Hex(text), `length ${n}`).toBe(createHash('sha256').update(text).digest('hex'));
    }
  });
});
