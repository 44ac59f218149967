/**
 * The design study's inputs in the page state: the defaults make a study the study file's rules accept
 * (validateStudy, as `coversweep optimise` reads it) on the road panel's default ride; bad inputs get
 * messages naming the input; the inputs travel in the link and the project file. And the map's ride
 * objectives (studyJobs.mapObjectivesJob) equal the same designs evaluated by a grid study.
 */
import { describe, expect, it } from 'vitest';
import { validateStudy } from '../../../src/compute/design/studyFile';
import { mapObjectivesJob, studyJob } from '../../../src/compute/engine/studyJobs';
import { hashToState, projectTextToState, stateToHash, stateToProjectText } from '../../../src/ui/appState';
import { defaultCase } from '../../../src/ui/defaultCase';
import { defaultRoad, validateRoadFor } from '../../../src/ui/roadState';
import {
  defaultStudyInputs,
  studyMessageInput,
  studyToRaw,
  validateStudyInputs,
} from '../../../src/ui/study/studyState';
import { defaultView } from '../../../src/ui/viewState';

const design = defaultCase();
const ride = (() => {
  const r = validateRoadFor(defaultRoad(), design, {
    ...design.wheel,
    cover: { ...design.wheel.cover, fraction: 0 },
  });
  if (!r.ok) throw new Error(r.errors.join('\n'));
  return r.value;
})();

describe('study inputs', () => {
  it('the defaults are a 6 x 4 grid study the study file accepts', () => {
    const inputs = defaultStudyInputs();
    const parsed = validateStudy(studyToRaw(inputs, ride));
    if (!parsed.ok) throw new Error(parsed.errors.join('\n'));
    expect(parsed.value.search.method).toBe('grid');
    expect(parsed.value.search.gridCounts).toEqual({ cover_fraction: 6, rim_depth_m: 4 });
    expect(parsed.value.continuous).toEqual([
      { id: 'cover_fraction', min: 0, max: 1 },
      { id: 'rim_depth_m', min: 0.03, max: 0.09 },
    ]);
    expect(parsed.value.limits).toEqual({});
  });

  it('a rim too deep for the wheel and a negative limit are named at their inputs', () => {
    const inputs = { ...defaultStudyInputs(), limits: { steering_gust_Nm: -1 } };
    inputs.rimDepthMm = { ...inputs.rimDepthMm, max: 400 };
    const parsed = validateStudy(studyToRaw(inputs, ride));
    expect(parsed.ok).toBe(false);
    const at = parsed.ok ? [] : parsed.errors.map(studyMessageInput);
    expect(at).toContain('rimDepthMm.max');
    expect(at).toContain('limits.steering_gust_Nm');
    const shape = validateStudyInputs({
      ...defaultStudyInputs(),
      coverFraction: { min: 0, max: 1, points: 2.5 },
    });
    expect(shape.ok ? [] : shape.errors).toEqual(['study.coverFraction.points: must be a whole number']);
  });

  it('travels in the link and the project file (the inputs only)', () => {
    const study = { ...defaultStudyInputs(), limits: { lean_gust_deg: 6 }, mapColour: 'time_s' };
    const state = { case: design, view: defaultView(), baseline: null, study };
    const viaLink = hashToState(stateToHash(state));
    expect(viaLink?.ok && viaLink.value.study).toEqual(study);
    const viaFile = projectTextToState(stateToProjectText(state));
    expect(viaFile.ok && viaFile.value.study).toEqual(study);
    const bad = projectTextToState(
      stateToProjectText({ ...state, study: { ...study, method: 'guess' } as never }),
    );
    expect(bad.ok ? [] : bad.errors.join('\n')).toContain('project file: study.method');
  });
});

describe('the map ride objectives and the grid study agree', () => {
  it('each map cell equals the same design of a grid study (the same numbers by two paths)', () => {
    const inputs = { ...defaultStudyInputs(), coverFraction: { min: 0, max: 1, points: 2 } };
    inputs.rimDepthMm = { min: 40, max: 80, points: 2 };
    const out = studyJob(studyToRaw(inputs, ride));
    if (!out.ok) throw new Error(out.errors.join('\n'));
    const cells = out.document.designs.map((d) => ({
      coverFraction: d.design.cover_fraction as number,
      rimDepthM: d.design.rim_depth_m as number,
    }));
    const map = mapObjectivesJob({ ride, cells, lattice: inputs.lattice });
    out.document.designs.forEach((d, k) => {
      for (const [id, v] of Object.entries(d.objectives))
        expect(map[k]![id], `${id} at ${JSON.stringify(cells[k])}`).toBe(v);
    });
  });
});
