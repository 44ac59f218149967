/**
 * The Design study tab's "More design variables" (src/ui/study/studyState.ts): a freed tyre width and
 * discrete variables become the study file's variables and grid (checked by validateStudy, as
 * `coversweep optimise` reads them); bad values get the study file's message beside the input that
 * holds them; inputs without them (older links and autosaves) stay valid; and a study run from these
 * inputs evaluates every combination with the values the inputs asked for.
 */
import { describe, expect, it } from 'vitest';
import { validateStudy } from '../../../src/compute/design/studyFile';
import { studyJob } from '../../../src/compute/engine/studyJobs';
import { defaultCase } from '../../../src/ui/defaultCase';
import { defaultRoad, validateRoadFor } from '../../../src/ui/roadState';
import {
  defaultStudyInputs,
  type StudyInputs,
  studyMessageInput,
  studyToRaw,
  validateStudyInputs,
} from '../../../src/ui/study/studyState';

const design = defaultCase();
const ride = (() => {
  const r = validateRoadFor(defaultRoad(), design, {
    ...design.wheel,
    cover: { ...design.wheel.cover, fraction: 0 },
  });
  if (!r.ok) throw new Error(r.errors.join('\n'));
  return r.value;
})();

/** The messages of inputs the study file refuses, each with the input it is shown beside. */
function refusals(inputs: StudyInputs): { input: string | null; message: string }[] {
  const shape = validateStudyInputs(inputs);
  const errors = shape.ok ? [] : shape.errors;
  if (shape.ok) {
    const parsed = validateStudy(studyToRaw(inputs, ride));
    if (!parsed.ok) errors.push(...parsed.errors);
  }
  return errors.map((message) => ({ input: studyMessageInput(message), message }));
}

describe('more design variables in the study inputs', () => {
  it('frees the tyre width and the discrete variables as the study file has them', () => {
    const inputs: StudyInputs = {
      ...defaultStudyInputs(),
      coverFraction: { min: 0, max: 1, points: 3 },
      rimDepthMm: { min: 30, max: 60, points: 2 },
      tyreWidthMm: { min: 23, max: 28, points: 2 },
      coverSides: [1, 2],
      spokeCount: [16, 24],
      spokeSection: ['bladed'],
    };
    expect(validateStudyInputs(inputs).ok).toBe(true);
    const parsed = validateStudy(studyToRaw(inputs, ride));
    if (!parsed.ok) throw new Error(parsed.errors.join('\n'));
    expect(parsed.value.continuous).toEqual([
      { id: 'cover_fraction', min: 0, max: 1 },
      { id: 'rim_depth_m', min: 0.03, max: 0.06 },
      { id: 'tyre_width_m', min: 0.023, max: 0.028 },
    ]);
    expect(parsed.value.discrete).toEqual([
      { id: 'cover_sides', choices: [1, 2] },
      { id: 'spoke_count', choices: [16, 24] },
      { id: 'spoke_section', choices: ['bladed'] },
    ]);
    expect(parsed.value.search.gridCounts).toEqual({ cover_fraction: 3, rim_depth_m: 2, tyre_width_m: 2 });
    // The grid method evaluates exactly its grid: 2 x 2 x 1 combinations x 3 x 2 x 2 points.
    expect(parsed.value.search.maxEvaluations).toBe(48);
  });

  it('keeps older inputs without them valid, and frees nothing more', () => {
    const raw = studyToRaw(defaultStudyInputs(), ride) as { variables: Record<string, unknown> };
    expect(Object.keys(raw.variables)).toEqual(['cover_fraction', 'rim_depth_m']);
  });

  it('shows each refusal beside its input, naming the field and the rule', () => {
    const base = defaultStudyInputs();
    const cases: [Partial<StudyInputs>, string, RegExp][] = [
      [
        { spokeCount: [16, 300] },
        'spokeCount',
        /variables\.spoke_count\[1\]: must be an integer from 0 to 200, got 300/,
      ],
      [{ spokeCount: [] }, 'spokeCount', /variables\.spoke_count: must be a non-empty list of choices/],
      [{ coverSides: [1, 1] }, 'coverSides', /variables\.cover_sides\[1\]: repeats 1/],
      [{ spokeSection: [] }, 'spokeSection', /variables\.spoke_section: must be a non-empty list/],
      [
        { coverPlacement: ['spiral'] },
        'coverPlacement',
        /variables\.cover_placement\[0\]: must be one of "rim", "hub", "centre"/,
      ],
      [
        { tyreWidthMm: { min: 30, max: 20, points: 2 } },
        'tyreWidthMm.max',
        /variables\.tyre_width_m\.max: must be greater than/,
      ],
      [
        { tyreWidthMm: { min: 1, max: 20, points: 2 } },
        'tyreWidthMm.min',
        /variables\.tyre_width_m\.min: must be at least 0\.005/,
      ],
      [{ tyreWidthMm: { min: 20, max: 30, points: 0 } }, 'tyreWidthMm.points', /study\.tyreWidthMm\.points/],
      [
        { spokeCount: [Number.NaN] },
        'spokeCount',
        /study\.spokeCount\[0\]: must be whole numbers separated by commas, e\.g\. 16, 20, 24/,
      ],
    ];
    for (const [patch, input, message] of cases) {
      const got = refusals({ ...base, ...patch });
      const shown = got.find((e) => e.input === input);
      expect(
        shown?.message,
        `${JSON.stringify(patch)}: got ${JSON.stringify(got)}; expected beside ${input}`,
      ).toMatch(message);
    }
  });

  it('runs a study over every combination of the chosen values', () => {
    const inputs: StudyInputs = {
      ...defaultStudyInputs(),
      coverFraction: { min: 1, max: 1, points: 1 },
      rimDepthMm: { min: 40, max: 40, points: 1 },
      coverSides: [1, 2],
      lattice: { span: 8, chord: 4 },
    };
    const raw = studyToRaw(inputs, ride);
    // A range of one point: the study file wants max > min, so widen it by a hair for the grid's 1 point.
    (raw.variables as Record<string, { min: number; max: number }>).cover_fraction = { min: 0.99, max: 1 };
    (raw.variables as Record<string, { min: number; max: number }>).rim_depth_m = { min: 0.039, max: 0.04 };
    const out = studyJob(raw);
    if (!out.ok) throw new Error(out.errors.join('\n'));
    const sides = out.document.designs.map((d) => d.design.cover_sides).sort();
    expect(sides).toEqual([1, 2]);
    const [one, two] = [1, 2].map((s) => out.document.designs.find((d) => d.design.cover_sides === s)!);
    // One side covered leaves the other open: a different wheel, so different ride figures.
    expect(one!.objectives.time_s).not.toBe(two!.objectives.time_s);
  });
});
