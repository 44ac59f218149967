// Several pinned baselines: the state operations (pin, remove, choose the reference) and the validation
// of the `baselines` entry of links, project files and the autosave. Held against the rules stated in
// src/ui/baselines (at most MAX_BASELINES, each design once, the reference among them) and against
// links written in the one-baseline format the page used before; messages are compared exactly where
// the rule is the point.
import { describe, expect, it } from 'vitest';
import { type CaseFile, validateCase } from '../../../src/compute/caseFile';
import {
  type AppState,
  hashToState,
  projectTextToState,
  stateToHash,
  stateToProjectText,
  validateStateParts,
} from '../../../src/ui/appState';
import { textToBase64Url } from '../../../src/ui/base64url';
import { baselineLabel } from '../../../src/ui/baselines/baselineLabel';
import { caseDifferences } from '../../../src/ui/baselines/caseDifferences';
import {
  chooseReference,
  MAX_BASELINES,
  pinCurrent,
  pinnedBaselines,
  referenceIndex,
  removeBaseline,
} from '../../../src/ui/baselines/pinnedBaselines';
import { defaultView } from '../../../src/ui/viewState';

function design(rimDepthM: number, fraction = 0.5): CaseFile {
  const r = validateCase({
    name: `Rim ${rimDepthM * 1000}`,
    wheel: { rim_depth_m: rimDepthM, cover: { fraction, placement: 'rim', sides: 2 } },
    conditions: { airspeed_mps: [12], yaw_deg: [0, 5, 10] },
  });
  if (!r.ok) throw new Error(r.errors.join('; '));
  return r.value;
}

function stateWith(current: CaseFile): AppState {
  return { case: current, view: defaultView(), baseline: null };
}

/** Pin designs one after another (each made current, then pinned). */
function pinAll(depths: number[]): AppState {
  let s = stateWith(design(depths[0]!));
  for (const d of depths) {
    s = { ...s, case: design(d) };
    const out = pinCurrent(s);
    if (!out.ok) throw new Error(out.message);
    s = out.state;
  }
  return s;
}

describe('pinning several baselines', () => {
  it('keeps the first pinned as the reference and every one in pinning order', () => {
    const s = pinAll([0.03, 0.05, 0.08]);
    expect(pinnedBaselines(s).map((b) => b.wheel.rim_depth_m)).toEqual([0.03, 0.05, 0.08]);
    expect(referenceIndex(s)).toBe(0);
    expect(s.baseline?.wheel.rim_depth_m).toBe(0.03);
  });

  it(`refuses a ${MAX_BASELINES + 1}th and a design already pinned, saying why, and changes nothing`, () => {
    const full = pinAll([0.02, 0.03, 0.05, 0.08]);
    const more = pinCurrent({ ...full, case: design(0.1) });
    expect(more).toEqual({
      ok: false,
      message: `Not pinned: at most ${MAX_BASELINES} baselines at once; remove one first (× beside it).`,
    });
    const twice = pinCurrent({ ...full, case: design(0.05) });
    expect(twice).toEqual({ ok: false, message: 'This design is already pinned (baseline 3).' });
  });

  it('chooses another reference without moving any baseline (their colours stay)', () => {
    const s = chooseReference(pinAll([0.03, 0.05, 0.08]), 2);
    expect(pinnedBaselines(s).map((b) => b.wheel.rim_depth_m)).toEqual([0.03, 0.05, 0.08]);
    expect(referenceIndex(s)).toBe(2);
  });

  it('removes one by one; removing the reference makes the first left the reference', () => {
    let s = chooseReference(pinAll([0.03, 0.05, 0.08]), 1);
    s = removeBaseline(s, 1);
    expect(pinnedBaselines(s).map((b) => b.wheel.rim_depth_m)).toEqual([0.03, 0.08]);
    expect(referenceIndex(s)).toBe(0);
    s = removeBaseline(s, 0);
    expect(pinnedBaselines(s).map((b) => b.wheel.rim_depth_m)).toEqual([0.08]);
    expect(s.baselines).toBeUndefined();
    s = { ...s, view: { ...s.view, difference: 'percent' } };
    s = removeBaseline(s, 0);
    expect(s.baseline).toBeNull();
    expect(pinnedBaselines(s)).toEqual([]);
    expect(s.view.difference).toBe('none');
    expect(() => removeBaseline(s, 0)).toThrow(/no pinned baseline 1 \(0 pinned\)/);
  });

  it('names each baseline by its design and what differs from the current design', () => {
    const current = design(0.05, 0.5);
    const b = design(0.03, 0);
    expect(caseDifferences(b, current)).toBe('rim 30 mm, cover 0 at the rim');
    expect(caseDifferences(current, current)).toBe('same as this design');
    expect(baselineLabel(b, current, 1, true)).toBe(
      'baseline 2 (reference): Rim 30 — rim 30 mm, cover 0 at the rim',
    );
  });
});

describe('the baselines in links and project files', () => {
  it('round-trip two baselines and their reference through a link and a project file', () => {
    const s = chooseReference({ ...pinAll([0.03, 0.08]), case: design(0.05) }, 1);
    for (const back of [hashToState(stateToHash(s)), projectTextToState(stateToProjectText(s))]) {
      if (!back?.ok) throw new Error(JSON.stringify(back));
      expect(pinnedBaselines(back.value)).toEqual(pinnedBaselines(s));
      expect(referenceIndex(back.value)).toBe(1);
    }
  });

  it('opens an old one-baseline link (no `baselines` key) as one pinned baseline', () => {
    const old = { v: 1, case: design(0.05), view: defaultView(), baseline: design(0.03) };
    const back = hashToState(`#s=${textToBase64Url(JSON.stringify(old))}`);
    if (!back?.ok) throw new Error(JSON.stringify(back));
    expect(pinnedBaselines(back.value)).toEqual([design(0.03)]);
    expect(referenceIndex(back.value)).toBe(0);
  });

  const parts = (baselines: unknown, baseline: unknown = design(0.03)) => ({
    case: design(0.05),
    view: defaultView(),
    baseline,
    baselines,
  });

  it(`names the field and the rule: more than ${MAX_BASELINES}, not a list, a bad entry, a twin, no reference`, () => {
    const five = [0.02, 0.03, 0.04, 0.06, 0.08].map((d) => design(d));
    expect(validateStateParts(parts(five), 'link')).toEqual({
      ok: false,
      errors: [`link: baselines: at most ${MAX_BASELINES} pinned baselines, got 5`],
    });
    expect(validateStateParts(parts('two'), 'link')).toEqual({
      ok: false,
      errors: ['link: baselines: must be a list of pinned designs (case files), got "two"'],
    });
    const bad = validateStateParts(parts([design(0.03), { wheel: { rim_depth_m: -1 } }]), 'project file');
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.errors[0]).toMatch(/^project file: baselines\[1\]\.wheel\.rim_depth_m: /);
    expect(validateStateParts(parts([design(0.03), design(0.03)]), 'autosave')).toEqual({
      ok: false,
      errors: ['autosave: baselines[1]: the same design as baselines[0] (pin each design once)'],
    });
    expect(validateStateParts(parts([design(0.04), design(0.06)]), 'link')).toEqual({
      ok: false,
      errors: ['link: baseline: the reference must be one of baselines (the same design, key for key)'],
    });
    expect(validateStateParts(parts([design(0.04), design(0.06)], null), 'link')).toEqual({
      ok: false,
      errors: [
        'link: baseline: must name the reference (one of baselines) when baselines are pinned, got null',
      ],
    });
    const long = { ...design(0.04), name: 'x'.repeat(5000) };
    const named = validateStateParts(parts([design(0.03), long]), 'link');
    expect(named.ok).toBe(false);
    if (!named.ok)
      expect(named.errors[0]).toMatch(/^link: baselines\[1\]\.name: at most \d+ characters, got 5000/);
  });
});
