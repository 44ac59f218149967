// The control panel's rules for typed values, and the words its refusals speak. Held against the fields'
// own data (every number field's range), the case rules' messages and, for the road form's wind note, the
// log wind profile worked by hand.
import { describe, expect, it } from 'vitest';
import { validateCase } from '../../src/compute/caseFile';
import { defaultCase } from '../../src/ui/defaultCase';
import { FIELDS, type RawJson } from '../../src/ui/fields';
import { checkTypedNumber } from '../../src/ui/fields/checkTypedNumber';
import { labelParts } from '../../src/ui/fields/labelParts';
import { speakLabels } from '../../src/ui/fields/speakLabels';
import { hubWindNote } from '../../src/ui/road/hubWindNote';
import { defaultRoad } from '../../src/ui/roadState';
import { defaultView } from '../../src/ui/viewState';

const ctx = { case: defaultCase(), view: defaultView() };
const numberFields = FIELDS.filter((f) => f.control === 'number');

describe('checkTypedNumber', () => {
  it('takes a value at either end of every number control exactly as typed (no snapping)', () => {
    for (const f of numberFields) {
      for (const x of [f.min!, f.max!]) {
        expect(checkTypedNumber(f, String(x), ctx), `${f.key} <- ${x}`).toEqual({ ok: true, value: x });
      }
      if (!f.integer) {
        // Half a step off the step grid: lil-gui would snap it; the rule keeps it.
        const x = f.min! + f.step! / 2;
        expect(checkTypedNumber(f, String(x), ctx), `${f.key} <- ${x}`).toEqual({ ok: true, value: x });
      }
    }
  });

  it('refuses a value beyond either end with a rule naming the control and its unit', () => {
    for (const f of numberFields) {
      const { name, unit } = labelParts(f.label(ctx));
      const low = checkTypedNumber(f, String(f.min! - 1), ctx);
      const high = checkTypedNumber(f, String(f.max! + 1), ctx);
      expect(low.ok || high.ok, f.key).toBe(false);
      if (!low.ok) expect(low.rule, f.key).toMatch(new RegExp(`^${name.replace(/[()×]/g, '.')}: at least `));
      if (!high.ok) expect(high.rule, f.key).toContain(`at most ${f.max}`);
      expect(unit, `${f.key}: the label "${f.label(ctx)}" names no unit`).not.toBe('');
    }
    const rim = FIELDS.find((f) => f.key === 'rimDepthMm')!;
    expect(checkTypedNumber(rim, '400', ctx)).toEqual({
      ok: false,
      rule: 'Rim depth: at most 200 mm, got 400',
    });
  });

  it('refuses text that is not a number, and a fraction for a count', () => {
    const spokes = FIELDS.find((f) => f.key === 'spokeCount')!;
    expect(checkTypedNumber(spokes, '20.5', ctx)).toEqual({
      ok: false,
      rule: 'Spoke count: a whole number, got 20.5',
    });
    expect(checkTypedNumber(spokes, '', ctx)).toEqual({
      ok: false,
      rule: 'Spoke count: a number is needed, got ""',
    });
    expect(checkTypedNumber(spokes, '1e1', ctx)).toEqual({ ok: true, value: 10 });
  });
});

describe('speakLabels', () => {
  it('names a refused rim by the labels on screen, not the file keys', () => {
    const raw = structuredClone(ctx.case) as RawJson;
    raw.wheel.rim_depth_m = 0.4;
    const r = validateCase(raw);
    expect(r.ok).toBe(false);
    const message = !r.ok ? r.errors.find((e) => e.startsWith('wheel.rim_depth_m'))! : '';
    const spoken = speakLabels(message, FIELDS, ctx);
    expect(spoken).toMatch(/^rim depth: rim depth 0\.4 m/);
    expect(spoken).not.toMatch(/wheel\.\w/);
  });

  it('replaces whole keys only', () => {
    expect(speakLabels('wheel.cover.fraction_x and wheel.cover.fraction:', FIELDS, ctx)).toBe(
      'wheel.cover.fraction_x and covered fraction of spoked area:',
    );
  });
});

describe('hubWindNote', () => {
  it('says what a 10 m wind is at the hub by the log profile', () => {
    // ln(0.334 / 0.03) / ln(10 / 0.03) = 2.4100 / 5.8091 = 0.41487 (log wind profile, Stull 1988 sec. 9.7;
    // from memory), so 3 m/s at 10 m is 1.2446 m/s at a 0.334 m hub.
    const road = defaultRoad();
    road.wind.speed_mps = 3;
    road.wind.reference_height_m = 10;
    road.wind.roughness_length_m = 0.03;
    const ctxRoad = {
      speedUnit: 'kmh' as const,
      referenceSpeedMps: 50 / 3.6,
      designLabel: 'd',
      baselineLabel: 'b',
      baselinePinned: false,
      hubHeightM: 0.334,
    };
    const note = hubWindNote((r) => r.wind.speed_mps, 'a wind of')(road, ctxRoad);
    expect(note).toBe(
      'Taken at the station height, 10 m. At the hub, 0.334 m up, it is × 0.41 (log wind profile, roughness 0.03 m): a wind of 3 m/s is 1.24 m/s at the wheel.',
    );
    road.wind.roughness_length_m = 0.5;
    expect(hubWindNote((r) => r.wind.speed_mps, 'a wind of')(road, ctxRoad)).toContain(
      'cannot be taken to the hub (0.334 m) until both heights exceed the roughness length',
    );
  });
});
