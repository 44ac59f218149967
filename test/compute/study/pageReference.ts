/**
 * The page's reference states for the bit-identity test (studyReference.test.ts): the default design
 * and a non-default state (explicit cover radii, two airspeeds, a pinned baseline, a changed view).
 * test/compute/study/makePageReference.ts (commit 1df3d46) wrote reference/page-*.json from the code before
 * the study runner: every model input the page solved (as a sha256 of its JSON) and every result, in the
 * page's old per-role lists (family[k], cover[k] with point index speed * yaws + yaw, map[depth * nx +
 * fraction]), each packed result as the base64 of its Float64Array bytes (little-endian).
 */
import { exampleCase } from '../../../src/cli/examples';
import { type CaseFile, validateCase } from '../../../src/compute/caseFile';
import { defaultCase } from '../../../src/ui/defaultCase';
import { defaultView, type ViewState } from '../../../src/ui/viewState';

export interface PageReferenceState {
  name: string;
  case: CaseFile;
  view: ViewState;
  baseline: CaseFile | null;
}

function valid(raw: unknown): CaseFile {
  const r = validateCase(raw);
  if (!r.ok) throw new Error(`reference case invalid: ${r.errors.join('; ')}`);
  return r.value;
}

export function pageReferenceStates(): PageReferenceState[] {
  const example = exampleCase() as { wheel: Record<string, unknown>; conditions: Record<string, unknown> };
  const explicitCase = valid({
    ...example,
    name: 'Reference: explicit covers, two airspeeds (invented)',
    wheel: {
      ...example.wheel,
      cover: { fraction: 0, placement: 'explicit', inner_radius_m: 0.1, outer_radius_m: 0.22, sides: 1 },
    },
    conditions: { ...example.conditions, airspeed_mps: [13.9, 8] },
  });
  const baseline = valid({
    ...example,
    name: 'Reference baseline (invented)',
    wheel: { ...example.wheel, rim_depth_m: 0.03, cover: { fraction: 0, placement: 'rim', sides: 2 } },
  });
  const view: ViewState = {
    ...defaultView(),
    familyFractions: [0, 0.6],
    coverPlotYawsDeg: [5, 20],
    coverPlotSpeedsMps: [9, 13.9],
    mapYawDeg: 15,
    mapMaxRimDepthM: 0.06,
    difference: 'percent',
  };
  return [
    { name: 'default', case: defaultCase(), view: defaultView(), baseline: null },
    { name: 'explicit-baseline', case: explicitCase, view, baseline },
  ];
}
