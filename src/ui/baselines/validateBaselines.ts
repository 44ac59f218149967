/**
 * The `baselines` entry of a link, autosave or project file: a list of at most MAX_BASELINES case
 * files, each valid by the case file's rules and with a name of at most MAX_NAME_CHARS, no design twice,
 * the reference (`baseline`) among them. Absent (files from before several baselines): the one
 * `baseline`. Every message names the field and its rule.
 */
import {
  type CaseFile,
  describeValue,
  MAX_NAME_CHARS,
  type Parsed,
  validateCase,
} from '../../compute/caseFile';
import { MAX_BASELINES, sameCase } from './pinnedBaselines';

export function validateBaselines(
  raw: unknown,
  reference: CaseFile | null,
  label: string,
): Parsed<CaseFile[] | undefined> {
  if (raw === undefined || raw === null) return { ok: true, value: undefined };
  const errors: string[] = [];
  if (!Array.isArray(raw)) {
    return {
      ok: false,
      errors: [
        `${label}: baselines: must be a list of pinned designs (case files), got ${describeValue(raw)}`,
      ],
    };
  }
  if (raw.length > MAX_BASELINES) {
    return {
      ok: false,
      errors: [`${label}: baselines: at most ${MAX_BASELINES} pinned baselines, got ${raw.length}`],
    };
  }
  const list: CaseFile[] = [];
  raw.forEach((item, k) => {
    const name = (item as { name?: unknown } | null)?.name;
    if (typeof name === 'string' && name.length > MAX_NAME_CHARS) {
      errors.push(
        `${label}: baselines[${k}].name: at most ${MAX_NAME_CHARS} characters, got ${name.length} (a name, not a document)`,
      );
      return;
    }
    const r = validateCase(item);
    if (!r.ok) {
      errors.push(...r.errors.map((e) => `${label}: baselines[${k}].${e}`));
      return;
    }
    const twin = list.findIndex((b) => sameCase(b, r.value));
    if (twin >= 0)
      errors.push(`${label}: baselines[${k}]: the same design as baselines[${twin}] (pin each design once)`);
    list.push(r.value);
  });
  if (errors.length > 0) return { ok: false, errors };
  if (list.length > 0 && reference === null) {
    errors.push(
      `${label}: baseline: must name the reference (one of baselines) when baselines are pinned, got null`,
    );
  } else if (reference !== null && !list.some((b) => sameCase(b, reference))) {
    errors.push(`${label}: baseline: the reference must be one of baselines (the same design, key for key)`);
  }
  return errors.length > 0 ? { ok: false, errors } : { ok: true, value: list };
}
