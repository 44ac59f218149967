/**
 * Plan files (a plan runs as one study: src/compute/study/commandLineStudy.ts). A plan is a case file
 * in which any leaf value may instead be a list of values or a range {"from": a, "to": b, "step": s}; the plan stands for the Cartesian product of
 * all of them (key paths in document order, the last varying fastest). The lists or ranges given for
 * conditions.yaw_deg and conditions.airspeed_mps stay inside each case: they are the points of one
 * solve, not separate cases.
 */
import {
  CASE_VERSION,
  type CaseFile,
  describeValue,
  type Parsed,
  parseJsonText,
  validateCase,
} from './caseFile';
import { migratePlan } from './fileVersion';

export const PLAN_FORMAT = 'coversweep-plan';
export const PLAN_VERSION = 1;
/** Most operating points (cases x airspeeds x yaw angles) one plan may ask for. */
export const MAX_PLAN_POINTS = 1_000_000;
/** Most cases one plan may expand into: every case is held in memory (about 1 kB each), so this bounds
 * a sweep's memory (measured in bench/hardening.bench.ts; README "Hardening"). */
export const MAX_PLAN_CASES = 100_000;
/** Most validation messages reported for one plan. */
export const MAX_PLAN_ERRORS = 40;

/** A plain value a plan may vary. */
export type PlanValue = number | string | boolean | null;

export interface ExpandedCase {
  /** Position in the plan's deterministic order (0-based). */
  index: number;
  /** The varied leaves' values for this case, by key path. */
  varied: Record<string, PlanValue>;
  caseFile: CaseFile;
}

export interface ExpandedPlan {
  cases: ExpandedCase[];
  /** Key paths of the varied leaves, in document order. */
  variedKeys: string[];
  /** Total operating points (sum over cases of airspeeds x yaw angles). */
  pointCount: number;
}

/** Keys whose lists are the points of one solve (not expanded into cases). */
const POINT_LIST_PATHS = new Set(['conditions.yaw_deg', 'conditions.airspeed_mps']);

/** Relative tolerance on (to - from) / step being a whole number. */
const RANGE_TOLERANCE = 1e-9;

/**
 * Values of an inclusive range: count = round((to - from) / step) + 1, accepted when (to - from) / step
 * is within 1e-9 (relative) of a whole number; values from + k step rounded to 15 significant digits
 * (so a decimal step such as 0.05 gives 0.15, not 0.15000000000000002), the last snapped to `to`.
 * Returns an error message instead when the range is malformed.
 */
export function rangeValues(
  from: number,
  to: number,
  step: number,
  maxCount = MAX_PLAN_POINTS,
): number[] | string {
  for (const [name, v] of [
    ['from', from],
    ['to', to],
    ['step', step],
  ] as const) {
    if (typeof v !== 'number' || !Number.isFinite(v))
      return `range ${name} must be a finite number, got ${describeValue(v)}`;
  }
  if (from === to) return [from];
  if (step === 0) return 'range step must not be 0';
  if (Math.sign(step) !== Math.sign(to - from)) {
    return `range step ${step} must have the sign of to - from (${to} - ${from}), or the range never reaches "to"`;
  }
  const n = (to - from) / step;
  const k = Math.round(n);
  if (Math.abs(n - k) > RANGE_TOLERANCE * Math.max(1, Math.abs(n))) {
    return `range (to - from) / step = (${to} - ${from}) / ${step} = ${n} must be a whole number (the range includes "to")`;
  }
  if (k + 1 > maxCount)
    return `range from ${from} to ${to} step ${step} has ${k + 1} values, more than ${maxCount}`;
  const out = new Array<number>(k + 1);
  for (let i = 0; i < k; i++) out[i] = Number((from + i * step).toPrecision(15));
  out[k] = to;
  return out;
}

function isPlainObject(v: unknown): v is Record<string, unknown> {
  return v !== null && typeof v === 'object' && !Array.isArray(v);
}

function isRangeObject(v: unknown): v is { from: unknown; to: unknown; step: unknown } {
  return isPlainObject(v) && ('from' in v || 'to' in v || 'step' in v);
}

function isPlanValue(v: unknown): v is PlanValue {
  return v === null || typeof v === 'number' || typeof v === 'string' || typeof v === 'boolean';
}

interface VariedLeaf {
  path: string[];
  key: string;
  values: PlanValue[];
}

/** Parse and expand plan-file text. Never throws. */
export function parsePlanFile(text: string): Parsed<ExpandedPlan> {
  try {
    const json = parseJsonText(text, 'plan file');
    if (!json.ok) return json;
    return expandPlan(json.value);
  } catch (error) {
    return { ok: false, errors: [`internal error while reading the plan: ${errorText(error)}`] };
  }
}

function errorText(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}

/** Expand a parsed plan into validated cases. Never throws. */
export function expandPlan(raw: unknown): Parsed<ExpandedPlan> {
  try {
    return expandPlanUnsafe(raw);
  } catch (error) {
    return { ok: false, errors: [`internal error while expanding the plan: ${errorText(error)}`] };
  }
}

function expandPlanUnsafe(given: unknown): Parsed<ExpandedPlan> {
  const migrated = migratePlan(given);
  if (!migrated.ok) return migrated;
  const raw = migrated.value;
  if (!isPlainObject(raw)) {
    return {
      ok: false,
      errors: [`(top level): must be an object (a CoverSweep plan), got ${describeValue(raw)}`],
    };
  }
  const errors: string[] = [];
  const template: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(raw)) {
    if (key === 'format') {
      if (value !== PLAN_FORMAT && value !== 'coversweep-case') {
        errors.push(`format: must be "${PLAN_FORMAT}" (or "coversweep-case"), got ${describeValue(value)}`);
      }
    } else if (key === 'version') {
      if (value !== PLAN_VERSION) {
        errors.push(
          `version: unsupported plan-file version ${describeValue(value)}; this program reads version ${PLAN_VERSION}`,
        );
      }
    } else {
      template[key] = value;
    }
  }
  const varied: VariedLeaf[] = [];
  const walk = (node: Record<string, unknown>, path: string[]) => {
    for (const [key, value] of Object.entries(node)) {
      const childPath = [...path, key];
      const keyPath = childPath.join('.');
      if (POINT_LIST_PATHS.has(keyPath)) {
        if (isRangeObject(value)) {
          const values = rangeFrom(value, keyPath, errors);
          if (values) node[key] = values;
        }
        continue;
      }
      if (Array.isArray(value)) {
        if (value.length === 0) {
          errors.push(`${keyPath}: a list of values to vary must not be empty`);
          continue;
        }
        const bad = value.findIndex((v) => !isPlanValue(v));
        if (bad >= 0) {
          errors.push(
            `${keyPath}[${bad}]: values to vary must be numbers, strings, true/false or null, got ${describeValue(value[bad])}`,
          );
          continue;
        }
        varied.push({ path: childPath, key: keyPath, values: value as PlanValue[] });
      } else if (isRangeObject(value)) {
        const values = rangeFrom(value, keyPath, errors);
        if (values) varied.push({ path: childPath, key: keyPath, values });
      } else if (isPlainObject(value)) {
        walk(value, childPath);
      }
    }
  };
  const clone = structuredClone(template);
  walk(clone, []);
  if (errors.length > 0) return { ok: false, errors };

  let caseCount = 1;
  for (const leaf of varied) caseCount *= leaf.values.length;
  const pointsPerCase = countPoints(clone);
  const pointCount = caseCount * pointsPerCase;
  if (caseCount > MAX_PLAN_CASES) {
    const shape = varied.map((l) => `${l.key}: ${l.values.length}`).join(', ');
    return {
      ok: false,
      errors: [
        `the plan expands into ${caseCount} cases, more than the limit of ${MAX_PLAN_CASES} (values per varied key: ${shape}); put yaw angles and airspeeds in lists inside the case (they do not multiply cases), or split the plan`,
      ],
    };
  }
  if (pointCount > MAX_PLAN_POINTS) {
    const shape = varied.map((l) => `${l.key}: ${l.values.length}`).join(', ');
    return {
      ok: false,
      errors: [
        `the plan asks for ${caseCount} cases x ${pointsPerCase} points = ${pointCount} operating points, more than the limit of ${MAX_PLAN_POINTS} (values per varied key: ${shape || 'none'}); split it into smaller plans`,
      ],
    };
  }

  // Blank the varied leaves in the template, so each case copies a small template and not every list
  // (copying a 10^5-value list for each of its 10^5 cases would take minutes).
  for (const leaf of varied) setAt(clone, leaf.path, null);
  const cases: ExpandedCase[] = [];
  const failures = new Map<string, number[]>();
  const digits = new Array<number>(varied.length).fill(0);
  for (let index = 0; index < caseCount; index++) {
    const json = structuredClone(clone) as Record<string, unknown>;
    const values: Record<string, PlanValue> = {};
    for (let d = 0; d < varied.length; d++) {
      const leaf = varied[d]!;
      const v = leaf.values[digits[d]!]!;
      values[leaf.key] = v;
      setAt(json, leaf.path, v);
    }
    json.format = 'coversweep-case';
    json.version = CASE_VERSION;
    const parsed = validateCase(json);
    if (parsed.ok) {
      cases.push({ index, varied: values, caseFile: parsed.value });
    } else {
      for (const message of parsed.errors) {
        const list = failures.get(message);
        if (list) list.push(index);
        else failures.set(message, [index]);
      }
    }
    // Advance the mixed-radix counter, last digit fastest.
    for (let d = varied.length - 1; d >= 0; d--) {
      digits[d]!++;
      if (digits[d]! < varied[d]!.values.length) break;
      digits[d] = 0;
    }
  }
  if (failures.size > 0) {
    return { ok: false, errors: failureMessages(failures, caseCount, varied) };
  }
  return { ok: true, value: { cases, variedKeys: varied.map((l) => l.key), pointCount } };
}

function rangeFrom(value: Record<string, unknown>, keyPath: string, errors: string[]): number[] | null {
  const extra = Object.keys(value).filter((k) => k !== 'from' && k !== 'to' && k !== 'step');
  if (extra.length > 0) {
    errors.push(
      `${keyPath}: a range takes exactly the keys from, to, step; unknown key(s) ${extra.join(', ')}`,
    );
    return null;
  }
  for (const k of ['from', 'to', 'step'] as const) {
    if (!(k in value)) {
      errors.push(`${keyPath}: a range needs "from", "to" and "step"; "${k}" is missing`);
      return null;
    }
  }
  const values = rangeValues(value.from as number, value.to as number, value.step as number);
  if (typeof values === 'string') {
    errors.push(`${keyPath}: ${values}`);
    return null;
  }
  return values;
}

function countPoints(template: Record<string, unknown>): number {
  const c = template.conditions;
  if (!isPlainObject(c)) return 1;
  const len = (v: unknown) => (Array.isArray(v) ? Math.max(1, v.length) : 1);
  return len(c.airspeed_mps) * len(c.yaw_deg);
}

function setAt(root: Record<string, unknown>, path: readonly string[], value: PlanValue): void {
  let node = root;
  for (let i = 0; i < path.length - 1; i++) node = node[path[i]!] as Record<string, unknown>;
  node[path[path.length - 1]!] = value;
}

function caseLabel(index: number, varied: readonly VariedLeaf[], caseCount: number): string {
  // Recover the case's values from its index (mixed radix, last fastest).
  const parts: string[] = [];
  let rest = index;
  const values = new Array<PlanValue>(varied.length);
  for (let d = varied.length - 1; d >= 0; d--) {
    const n = varied[d]!.values.length;
    values[d] = varied[d]!.values[rest % n]!;
    rest = Math.floor(rest / n);
  }
  for (let d = 0; d < varied.length; d++) parts.push(`${varied[d]!.key}=${describeValue(values[d])}`);
  return `case ${index + 1} of ${caseCount}${parts.length > 0 ? ` (${parts.join(', ')})` : ''}`;
}

function failureMessages(
  failures: Map<string, number[]>,
  caseCount: number,
  varied: readonly VariedLeaf[],
): string[] {
  const out: string[] = [];
  let omitted = 0;
  for (const [message, indices] of failures) {
    if (out.length >= MAX_PLAN_ERRORS) {
      omitted += indices.length;
      continue;
    }
    if (indices.length === caseCount) {
      out.push(caseCount > 1 ? `${message} (in every case)` : message);
      continue;
    }
    const shown = indices.slice(0, 3);
    for (const i of shown) out.push(`${caseLabel(i, varied, caseCount)}: ${message}`);
    if (indices.length > shown.length)
      out.push(`  ... the same in ${indices.length - shown.length} more case(s)`);
  }
  if (omitted > 0) out.push(`... and ${omitted} more error(s)`);
  return out;
}
