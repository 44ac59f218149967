/**
 * Evaluate one design wheel on a study's ride: solve its yaw curve (the one lattice solve per design),
 * evaluate the ride against the baseline (src/compute/ride) and compute every applicable objective.
 */
import { evaluateRide, rideCases, solveRideCurve } from '../ride/index';
import { OBJECTIVES } from './objectives/index';
import type { DesignContext, DesignEvaluation, DesignValues, DesignWheel } from './types';

export function evaluateDesign(
  context: DesignContext,
  wheel: DesignWheel,
  values: DesignValues,
): DesignEvaluation {
  const ride = { ...context.ride, design: wheel };
  const curve = solveRideCurve(rideCases(ride).design, context.referenceSpeedMps);
  const doc = evaluateRide(ride, {
    design: curve,
    baseline: context.baseline,
    referenceSpeedMps: context.referenceSpeedMps,
    rhoKgPerM3: context.rhoKgPerM3,
    referenceSpeedCapped: context.referenceSpeedCapped,
  });
  const objectives: Record<string, number> = {};
  for (const o of OBJECTIVES) {
    if (o.applies(ride) !== null) continue;
    objectives[o.id] = o.compute({ ride, doc, curve, context });
  }
  return {
    values,
    wheel,
    objectives,
    flags: doc.flags.filter((f) => !f.startsWith('baseline:')),
  };
}
