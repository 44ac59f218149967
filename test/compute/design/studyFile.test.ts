import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseStudyFile, validateStudy } from '../../../src/compute/design/studyFile';

// biome-ignore lint/suspicious/noExplicitAny: a free-form JSON document edited by the tests
type Doc = Record<string, any>;
const example: Doc = JSON.parse(
  readFileSync(new URL('../../../public/examples/study.json', import.meta.url), 'utf8'),
);

function errorsOf(change: (s: Doc) => void): string[] {
  const s = structuredClone(example);
  change(s);
  const p = validateStudy(s);
  return p.ok ? [] : p.errors;
}

describe('the study file', () => {
  it('the example parses, with the defaults filled in', () => {
    const p = parseStudyFile(JSON.stringify(example));
    if (!p.ok) throw new Error(p.errors.join('\n'));
    expect(p.value.continuous.map((v) => v.id)).toEqual(['cover_fraction', 'rim_depth_m']);
    expect(p.value.search.lattice).toEqual({ span: 12, chord: 6 });
    expect(p.value.front.handling).toBe('steering_gust_Nm');
  });

  it.each([
    [(s: Doc) => (s.format = 'coversweep-ride'), 'format: must be "coversweep-study", got "coversweep-ride"'],
    [
      (s: Doc) => (s.version = 2),
      'version: unsupported study-file version 2: newer than this program reads (version 1)',
    ],
    [
      (s: Doc) => (s.variables.spoke_length = { min: 0, max: 1 }),
      'variables.spoke_length: unknown design variable',
    ],
    [
      (s: Doc) => (s.variables.cover_fraction = { min: 0.5, max: 0.2 }),
      'variables.cover_fraction.max: must be greater than variables.cover_fraction.min 0.5, got 0.2',
    ],
    [
      (s: Doc) => (s.variables.cover_fraction = { min: 0, max: 1.5 }),
      'variables.cover_fraction.max: must be at most 1, got 1.5',
    ],
    [
      (s: Doc) => (s.variables.rim_depth_m = { min: 0.03, max: 0.3 }),
      'variables.rim_depth_m.max: must be at most 0.28 m',
    ],
    [(s: Doc) => (s.variables.cover_sides = [1, 3]), 'variables.cover_sides[1]: must be one of 1, 2, got 3'],
    [(s: Doc) => (s.variables.spoke_count = [16, 16]), 'variables.spoke_count[1]: repeats 16'],
    [(s: Doc) => (s.objective = 'speed'), 'objective: must be one of time_s, power_W'],
    [
      (s: Doc) => (s.limits = { steering_gust_Nm: -1 }),
      'limits.steering_gust_Nm: must be a number greater than 0 N m, got -1',
    ],
    [(s: Doc) => (s.limits = { grip: 1 }), 'limits.grip: unknown objective'],
    [
      (s: Doc) => (s.ride.rider.crr = 0.5),
      'ride.rider.crr: must be a number at least 0 and at most 0.05, got 0.5',
    ],
    [
      (s: Doc) => (s.search.max_evaluations = 10),
      "search.max_evaluations: must be at least the start grid's 25 designs",
    ],
    [
      (s: Doc) => delete s.search.lattice_chord,
      'search.lattice_chord: must be given with search.lattice_span (both or neither)',
    ],
    [
      (s: Doc) => (s.front.handling = 'time_s'),
      'front.handling: must be one of side_p90_N, side_gust_N, steering_gust_Nm, lean_gust_deg, got "time_s"',
    ],
    [(s: Doc) => (s.extra = 1), 'extra: unknown key'],
  ])('rejects a bad field with a message naming it and the rule (%#)', (change, message) => {
    const errors = errorsOf(change);
    expect(
      errors.some((e) => e.startsWith(message)),
      `errors: ${JSON.stringify(errors)}; expected one starting ${message}`,
    ).toBe(true);
  });

  it('the front defaults to the first limited handling figure (a limit on power is not one)', () => {
    const s = structuredClone(example);
    s.limits = { power_W: 400, lean_gust_deg: 2 };
    delete s.front;
    const p = validateStudy(s);
    if (!p.ok) throw new Error(p.errors.join('\n'));
    expect(p.value.front).toEqual({ handling: 'lean_gust_deg', limitSteps: 3 });
  });

  it('a rear wheel: the steering moment is neither an objective nor a limit', () => {
    const errors = errorsOf((s) => {
      s.ride.position = 'rear';
      s.objective = 'steering_gust_Nm';
    });
    expect(errors).toContain(
      'objective: "steering_gust_Nm" does not apply to this ride (a rear wheel makes no steering moment)',
    );
    expect(errors).toContain(
      'limits.steering_gust_Nm: does not apply to this ride (a rear wheel makes no steering moment)',
    );
  });

  it('bad JSON and a non-object are refused without throwing', () => {
    expect(parseStudyFile('{').ok).toBe(false);
    const p = validateStudy([1]);
    expect(p.ok ? [] : p.errors).toEqual(['the study file: must be a JSON object, got a list [1]']);
  });
});
