// Exported file names follow the current design: the demo's name only while the design is the demo,
// the design's own name once renamed, and an edited-but-unrenamed demo named by its rim depth and
// covered fraction (read back from the state, so the name cannot go stale).
import { describe, expect, it } from 'vitest';
import { type CaseFile, validateCase } from '../../src/compute/caseFile';
import { defaultCase } from '../../src/ui/defaultCase';
import { designFileStem } from '../../src/ui/designFileStem';

type Mutable<T> = { -readonly [K in keyof T]: T[K] extends object ? Mutable<T[K]> : T[K] };

function edited(patch: (raw: Mutable<CaseFile>) => void) {
  const raw = structuredClone(defaultCase()) as Mutable<CaseFile>;
  patch(raw);
  const r = validateCase(raw);
  if (!r.ok) throw new Error(r.errors.join('; '));
  return r.value;
}

describe('designFileStem', () => {
  it('keeps the demo name for the unchanged demo', () => {
    expect(designFileStem(defaultCase())).toBe('Demo-wheel-invented');
  });
  it('drops the demo name once the demo is edited, naming the design it now is', () => {
    const c = edited((raw) => {
      raw.wheel.rim_depth_m = 0.08;
      raw.wheel.cover.fraction = 0.5;
    });
    const stem = designFileStem(c);
    expect(stem, `stem for rim 0.08 m, cover 0.5`).toBe('design-rim-80mm-cover-50pct');
    expect(stem).not.toMatch(/Demo/);
  });
  it('uses the name the user gave', () => {
    const c = edited((raw) => {
      raw.name = 'Trial 7: deep rim / half cover';
      raw.wheel.rim_depth_m = 0.08;
    });
    expect(designFileStem(c)).toBe('Trial-7-deep-rim-half-cover');
  });
});
