/** The study file's `variables` section: which design variables are freed, within which bounds. */
import { describeValue } from '../caseFile';
import { applyDesign, DESIGN_VARIABLES, designVariable } from './designVariables';
import type { ContinuousRange, DiscreteChoices } from './studyTypes';
import type { DesignWheel } from './types';

const fmt = (x: number) => String(Math.round(x * 1e6) / 1e6);

/**
 * Check `variables` against the registry and the ride's design wheel. Continuous bounds must lie within
 * what every wheel in the box allows (e.g. the deepest rim with the widest tyre still clears the hub);
 * discrete choices must be allowed values, without repeats. Returns null after pushing messages.
 */
export function checkVariables(
  raw: unknown,
  wheel: DesignWheel,
  errors: string[],
): { continuous: ContinuousRange[]; discrete: DiscreteChoices[] } | null {
  if (raw === null || typeof raw !== 'object' || Array.isArray(raw) || Object.keys(raw).length === 0) {
    errors.push(
      `variables: must be an object freeing at least one design variable (${DESIGN_VARIABLES.map((v) => v.id).join(', ')}), got ${describeValue(raw)}`,
    );
    return null;
  }
  const continuous: ContinuousRange[] = [];
  const discrete: DiscreteChoices[] = [];
  const before = errors.length;
  for (const [id, spec] of Object.entries(raw as Record<string, unknown>)) {
    const v = designVariable(id);
    const path = `variables.${id}`;
    if (v === undefined) {
      errors.push(
        `${path}: unknown design variable (expected one of: ${DESIGN_VARIABLES.map((x) => x.id).join(', ')})`,
      );
      continue;
    }
    if (v.kind === 'continuous') {
      const s = spec as Record<string, unknown> | null;
      const ok = s !== null && typeof s === 'object' && !Array.isArray(s);
      const min = ok ? s.min : undefined;
      const max = ok ? s.max : undefined;
      if (
        !ok ||
        typeof min !== 'number' ||
        typeof max !== 'number' ||
        !Number.isFinite(min) ||
        !Number.isFinite(max)
      ) {
        errors.push(
          `${path}: must be {"min": number, "max": number} in ${v.unit}, got ${describeValue(spec)}`,
        );
        continue;
      }
      if (!(min < max)) errors.push(`${path}.max: must be greater than ${path}.min ${min}, got ${max}`);
      continuous.push({ id, min, max });
    } else {
      const list = spec;
      const allowed = v.choices ?? null;
      const range = v.integerRange;
      const rule =
        allowed !== null
          ? `one of ${allowed.map((c) => JSON.stringify(c)).join(', ')}`
          : `an integer from ${range!.min} to ${range!.max}`;
      if (!Array.isArray(list) || list.length === 0) {
        errors.push(`${path}: must be a non-empty list of choices, each ${rule}, got ${describeValue(spec)}`);
        continue;
      }
      list.forEach((c, i) => {
        const valid =
          allowed !== null ? allowed.includes(c) : Number.isInteger(c) && c >= range!.min && c <= range!.max;
        if (!valid) errors.push(`${path}[${i}]: must be ${rule}, got ${describeValue(c)}`);
        else if (list.indexOf(c) !== i) errors.push(`${path}[${i}]: repeats ${describeValue(c)}`);
      });
      discrete.push({ id, choices: list as (number | string)[] });
    }
  }
  if (errors.length > before) return null;
  // The bounds every wheel of the box allows: check each continuous variable against the wheel with the
  // other continuous variables at their largest (the radial rule binds there) and the discrete at each choice.
  const widest: Record<string, number> = {};
  for (const c of continuous) widest[c.id] = c.max;
  for (const c of continuous) {
    const v = designVariable(c.id)!;
    if (v.kind !== 'continuous') continue;
    const others = { ...widest };
    delete others[c.id];
    const lim = v.limits(applyDesign(wheel, others));
    const unit = v.unit === '1' ? '' : ` ${v.unit}`;
    if (c.min < lim.min)
      errors.push(`variables.${c.id}.min: must be at least ${fmt(lim.min)}${unit}, got ${c.min}`);
    if (c.max > lim.max) {
      const why = v.limitsRule === undefined ? '' : ` (${v.limitsRule})`;
      errors.push(`variables.${c.id}.max: must be at most ${fmt(lim.max)}${unit}${why}, got ${c.max}`);
    }
  }
  return errors.length > before ? null : { continuous, discrete };
}
