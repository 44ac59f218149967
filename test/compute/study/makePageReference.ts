// Writes reference/page-*.json (see pageReference.ts). Run once, with the code the reference describes:
//   npx tsx test/compute/study/makePageReference.ts
import { createHash } from 'node:crypto';
import { writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { solveJob } from '../../../src/compute/engine/solverApi';
import type { WheelInput } from '../../../src/model/wheel';
import { computePlan } from '../../../src/ui/computePlan';
import { pageReferenceStates } from './pageReference';

interface Solved {
  input: string;
  surface: unknown;
  pointCount: number;
  packed: string;
}

function solve(input: WheelInput): Solved {
  const outcome = solveJob({ jobId: 0, cases: [{ caseIndex: 0, input }] }).outcomes[0]!;
  if (!outcome.ok) throw new Error(outcome.error);
  return {
    input: createHash('sha256').update(JSON.stringify(input)).digest('hex'),
    surface: outcome.surface,
    pointCount: outcome.pointCount,
    packed: Buffer.from(outcome.packed.buffer, outcome.packed.byteOffset, outcome.packed.byteLength).toString(
      'base64',
    ),
  };
}

for (const state of pageReferenceStates()) {
  const plan = computePlan(state.case, state.view, state.baseline);
  const quick = { ...plan.current, options: { ...plan.current.options, gridConvergence: false } };
  const doc = {
    name: state.name,
    axes: {
      familyFractions: plan.family.fractions,
      coverFractions: plan.cover.fractions,
      coverSpeedsMps: plan.cover.speedsMps,
      coverYawsDeg: plan.cover.yawsDeg,
      mapFractions: plan.map.fractions,
      mapDepthsM: plan.map.depthsM,
      mapYawDeg: plan.map.yawDeg,
    },
    notes: plan.notes,
    quick: solve(quick),
    current: solve(plan.current),
    family: plan.family.inputs.map(solve),
    cover: plan.cover.inputs.map(solve),
    map: plan.map.inputs.map(solve),
    baseline: plan.baseline
      ? {
          curve: solve(plan.baseline.curve),
          cover: solve(plan.baseline.cover),
          map: solve(plan.baseline.map),
        }
      : null,
  };
  const path = join(dirname(fileURLToPath(import.meta.url)), 'reference', `page-${state.name}.json`);
  writeFileSync(path, `${JSON.stringify(doc)}\n`);
  console.log(`wrote ${path}`);
}
