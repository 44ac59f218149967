// Optimal string alignment distance (Damerau 1964; Wagner & Fischer 1974): values worked by hand from
// the definition (one edit per insertion, deletion, substitution or adjacent transposition).
import { describe, expect, it } from 'vitest';
import { editDistance, nearestName } from '../../src/compute/nearestName';
import { unknownKeyMessage } from '../../src/compute/unknownKeyMessage';

describe('editDistance', () => {
  it('counts insertions, deletions, substitutions and adjacent transpositions as one edit each', () => {
    const cases: [string, string, number][] = [
      ['', '', 0],
      ['', 'abc', 3],
      ['abc', '', 3],
      ['kitten', 'sitting', 3], // the classic Levenshtein example
      ['rim_depht_m', 'rim_depth_m', 1], // one transposition
      ['ca', 'abc', 3], // optimal string alignment (unrestricted Damerau-Levenshtein gives 2)
      ['--outt', '--out', 1],
      ['flaw', 'lawn', 2],
    ];
    for (const [a, b, d] of cases) {
      expect(editDistance(a, b), `editDistance(${a}, ${b}), expected ${d}`).toBe(d);
      expect(editDistance(b, a), `editDistance(${b}, ${a}) is symmetric`).toBe(d);
    }
  });
});

describe('nearestName', () => {
  const keys = ['outer_radius_m', 'rim_depth_m', 'tyre_width_m', 'spoke_count', 'cover'];
  it('suggests the nearest key for a small typo, case-insensitively', () => {
    expect(nearestName('rim_dept_m', keys)).toBe('rim_depth_m');
    expect(nearestName('rim_depth_mm', keys)).toBe('rim_depth_m');
    expect(nearestName('Spoke_Count', keys)).toBe('spoke_count');
    expect(nearestName('cvoer', keys)).toBe('cover');
  });
  it('suggests nothing for an unrelated name or an empty list', () => {
    expect(nearestName('airspeed', keys)).toBeNull();
    expect(nearestName('x', keys)).toBeNull();
    expect(nearestName('cover', [])).toBeNull();
  });
  it('refuses a non-string name', () => {
    expect(() => nearestName(3 as unknown as string, keys)).toThrow(RangeError);
  });
});

describe('unknownKeyMessage', () => {
  it('names the key path, the nearest allowed key and the allowed list', () => {
    expect(unknownKeyMessage('wheel', 'rim_dept_m', ['rim_depth_m', 'cover'])).toBe(
      'wheel.rim_dept_m: unknown key (did you mean wheel.rim_depth_m?) (allowed here: rim_depth_m, cover)',
    );
    expect(unknownKeyMessage('', 'colums', ['format', 'columns'])).toBe(
      'colums: unknown key (did you mean columns?) (allowed here: format, columns)',
    );
    expect(unknownKeyMessage('', 'zzz', undefined)).toBe('zzz: unknown key');
  });
});
