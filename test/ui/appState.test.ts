// The page's state carriers (URL fragment, project file, autosave) and its pure helpers. Round trips and
// messages are exact (no tolerance); the marching-squares crossing points are checked against linear
// interpolation by hand (exact up to 4 epsilon of the coordinates).
import { describe, expect, it } from 'vitest';
import { validateCase } from '../../src/compute/caseFile';
import {
  type AppState,
  hashToState,
  loadAutosave,
  projectTextToState,
  saveAutosave,
  stateToHash,
  stateToProjectText,
} from '../../src/ui/appState';
import { base64UrlToText, textToBase64Url } from '../../src/ui/base64url';
import { defaultView, validateView } from '../../src/ui/viewState';

function demoState(): AppState {
  const c = validateCase({
    name: 'Ünïcode wheel ✓',
    wheel: { cover: { fraction: 0.4, placement: 'hub', sides: 1 } },
    conditions: { airspeed_mps: [12.5], yaw_deg: [0, 5, 10], altitude_m: 1200 },
  });
  if (!c.ok) throw new Error(c.errors.join('; '));
  const b = validateCase({ conditions: { airspeed_mps: 10, yaw_deg: 0 } });
  if (!b.ok) throw new Error(b.errors.join('; '));
  return { case: c.value, view: { ...defaultView(), speedUnit: 'mph', mapYawDeg: 7.5 }, baseline: b.value };
}

describe('base64url', () => {
  it('round-trips UTF-8 text and uses only URL-safe characters', () => {
    const text = '{"a":"ÿ€✓ \\u0000 ??>>"}'.repeat(50);
    const enc = textToBase64Url(text);
    expect(enc).toMatch(/^[A-Za-z0-9_-]+$/);
    expect(base64UrlToText(enc)).toBe(text);
  });
  it('names the problem for junk', () => {
    expect(() => base64UrlToText('ab$c')).toThrow(/not base64url/);
    expect(() => base64UrlToText('abcde')).toThrow(/impossible length/);
  });
});

describe('URL fragment', () => {
  it('round-trips the whole state', () => {
    const s = demoState();
    const back = hashToState(stateToHash(s));
    expect(back).toEqual({ ok: true, value: s });
  });
  it('is null when the fragment carries no state', () => {
    expect(hashToState('')).toBeNull();
    expect(hashToState('#')).toBeNull();
    expect(hashToState('#other=1')).toBeNull();
  });
  it('names the field of an invalid design and the version of an unknown link', () => {
    const s = demoState();
    const bad = { v: 1, case: { ...s.case, wheel: { ...s.case.wheel, rim_depth_m: -1 } }, view: s.view };
    const r = hashToState(`#s=${textToBase64Url(JSON.stringify(bad))}`);
    expect(r?.ok).toBe(false);
    expect(r && !r.ok && r.errors[0]).toBe(
      'link: case.wheel.rim_depth_m: must be a number between 0 and 1 m, got -1',
    );
    const v2 = hashToState(`#s=${textToBase64Url(JSON.stringify({ v: 2 }))}`);
    expect(v2 && !v2.ok && v2.errors[0]).toBe(
      'link: v: unsupported link version 2; this page reads version 1',
    );
    const junk = hashToState('#s=e30K{');
    expect(junk && !junk.ok && junk.errors[0]).toMatch(
      /^link: the design data after "#s=" must be base64url-encoded UTF-8 JSON .*not base64url/,
    );
    // Bytes that are no UTF-8 text (0xff 0xef 0xbe): the rule is named, not the browser's decoder wording.
    const notText = hashToState('#s=__--');
    expect(notText && !notText.ok && notText.errors[0]).toMatch(
      /^link: the design data .* does not decode to UTF-8 text \(damaged or cut short\?\)/,
    );
    expect(notText && !notText.ok && notText.errors[0]).not.toMatch(/encoded data was not valid/);
    const empty = hashToState(`#s=${textToBase64Url('{"v":1,"case":{}}')}`);
    expect(empty && !empty.ok && empty.errors[0]).toMatch(/^link: case\.conditions: is required/);
  });
});

describe('project file', () => {
  it('round-trips the state', () => {
    const s = demoState();
    const text = stateToProjectText(s);
    expect(JSON.parse(text).format).toBe('coversweep-project');
    expect(projectTextToState(text)).toEqual({ ok: true, value: s });
  });
  it('says where broken JSON is broken and what is wrong with a valid but wrong file', () => {
    const r = projectTextToState('{\n  "format": "coversweep-project",\n  "case": [1,]\n}', 'p.json');
    expect(r.ok).toBe(false);
    expect(!r.ok && r.errors[0]).toBe(
      'p.json: invalid JSON at line 3, column 14: trailing comma before "]" (not allowed in JSON), found "]"',
    );
    const s = demoState();
    const wrong = JSON.parse(stateToProjectText(s));
    wrong.version = 3;
    wrong.extra = true;
    const r2 = projectTextToState(JSON.stringify(wrong), 'p.json');
    expect(!r2.ok && r2.errors).toEqual([
      'p.json: version: unsupported project version 3: newer than this program reads (version 2); update CoverSweep to open it',
      'p.json: extra: unknown key (allowed: format, version, case, view, baseline, baselines, road, calibration, study, data)',
    ]);
    const caseFile = projectTextToState(JSON.stringify(s.case), 'c.json');
    expect(!caseFile.ok && caseFile.errors[0]).toContain('(this is a case file: use "Open case file")');
    const badView = JSON.parse(stateToProjectText(s));
    badView.view.mapColour = 'colourful';
    badView.view.familyFractions = [0, 2];
    const r3 = projectTextToState(JSON.stringify(badView), 'p.json');
    expect(!r3.ok && r3.errors).toEqual([
      'p.json: view.familyFractions[1]: must be a number between 0 and 1, got 2',
      'p.json: view.mapColour: must be one of "axial", "side", "windDrag", "steering", "yawMoment", "rollMoment", "power", "cda", "cpX", got "colourful"',
    ]);
  });
});

describe('autosave', () => {
  it('saves and loads through a Storage, and reports a full storage', () => {
    const store = new Map<string, string>();
    const storage = {
      setItem: (k: string, v: string) => store.set(k, v),
      getItem: (k: string) => store.get(k) ?? null,
    };
    expect(loadAutosave(storage)).toBeNull();
    const s = demoState();
    expect(saveAutosave(storage, s)).toBeNull();
    expect(loadAutosave(storage)).toEqual({ ok: true, value: s });
    const full = {
      setItem: () => {
        throw new Error('QuotaExceededError');
      },
    };
    expect(saveAutosave(full, s)).toBe('autosave failed: QuotaExceededError');
  });
});

describe('view settings', () => {
  it('fill defaults and reject unknown keys', () => {
    expect(validateView({})).toEqual({ ok: true, value: defaultView() });
    const r = validateView({ zoom: 2 });
    expect(!r.ok && r.errors).toEqual(['view: unknown key(s) zoom']);
  });
});
