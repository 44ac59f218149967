/**
 * The page's whole state: the design (a CoverSweep case file), the view settings and an optional pinned
 * baseline design. One validated shape travels three ways: the URL fragment (shareable link), the
 * local autosave and the project file. Every reader validates (validateCase for designs, validateView for
 * the view) and returns messages naming the field; nothing is applied unless everything is valid.
 */
import { type CaseFile, describeValue, type Parsed, parseJsonText, validateCase } from '../compute/caseFile';
import { base64UrlToText, textToBase64Url } from './base64url';
import { type ViewState, validateView } from './viewState';

export interface AppState {
  case: CaseFile;
  view: ViewState;
  baseline: CaseFile | null;
}

export const PROJECT_FORMAT = 'coversweep-project';
export const PROJECT_VERSION = 1;
export const LINK_VERSION = 1;
export const AUTOSAVE_KEY = 'coversweep.autosave.v1';

/** Validate the parts of a state object; `label` prefixes every message. */
export function validateStateParts(
  parts: { case: unknown; view: unknown; baseline: unknown },
  label: string,
): Parsed<AppState> {
  const errors: string[] = [];
  const c = validateCase(parts.case);
  if (!c.ok) errors.push(...c.errors.map((e) => `${label}: case.${e}`));
  const v = validateView(parts.view ?? {});
  if (!v.ok) errors.push(...v.errors.map((e) => `${label}: ${e}`));
  let baseline: CaseFile | null = null;
  if (parts.baseline !== null && parts.baseline !== undefined) {
    const b = validateCase(parts.baseline);
    if (!b.ok) errors.push(...b.errors.map((e) => `${label}: baseline.${e}`));
    else baseline = b.value;
  }
  if (errors.length > 0 || !c.ok || !v.ok) return { ok: false, errors };
  return { ok: true, value: { case: c.value, view: v.value, baseline } };
}

function isObject(x: unknown): x is Record<string, unknown> {
  return x !== null && typeof x === 'object' && !Array.isArray(x);
}

// ---------------------------------------------------------------------------------------------
// URL fragment: #s=<base64url of {"v":1,"case":...,"view":...,"baseline":...}>

export function stateToHash(state: AppState): string {
  const json = JSON.stringify({
    v: LINK_VERSION,
    case: state.case,
    view: state.view,
    baseline: state.baseline,
  });
  return `#s=${textToBase64Url(json)}`;
}

/** Read a state from a URL fragment. `null` when the fragment carries no state at all. */
export function hashToState(hash: string): Parsed<AppState> | null {
  const body = hash.startsWith('#') ? hash.slice(1) : hash;
  if (body === '') return null;
  const params = new URLSearchParams(body);
  const encoded = params.get('s');
  if (encoded === null) return null;
  let text: string;
  try {
    text = base64UrlToText(encoded);
  } catch (error) {
    return { ok: false, errors: [`link: cannot decode the state: ${(error as Error).message}`] };
  }
  const json = parseJsonText(text, 'link');
  if (!json.ok) return json;
  const raw = json.value;
  if (!isObject(raw)) return { ok: false, errors: [`link: must hold an object, got ${describeValue(raw)}`] };
  if (raw.v !== LINK_VERSION) {
    return {
      ok: false,
      errors: [
        `link: v: unsupported link version ${describeValue(raw.v)}; this page reads version ${LINK_VERSION}`,
      ],
    };
  }
  return validateStateParts({ case: raw.case, view: raw.view, baseline: raw.baseline }, 'link');
}

// ---------------------------------------------------------------------------------------------
// Project file

export function stateToProjectText(state: AppState): string {
  return `${JSON.stringify(
    {
      format: PROJECT_FORMAT,
      version: PROJECT_VERSION,
      case: state.case,
      view: state.view,
      baseline: state.baseline,
    },
    null,
    2,
  )}\n`;
}

export function projectTextToState(text: string, label = 'project file'): Parsed<AppState> {
  const json = parseJsonText(text, label);
  if (!json.ok) return json;
  const raw = json.value;
  if (!isObject(raw))
    return { ok: false, errors: [`${label}: must be a JSON object, got ${describeValue(raw)}`] };
  const errors: string[] = [];
  if (raw.format !== PROJECT_FORMAT) {
    errors.push(
      `${label}: format: must be "${PROJECT_FORMAT}", got ${describeValue(raw.format)}` +
        (raw.format === 'coversweep-case' ? ' (this is a case file: use "Open case file")' : ''),
    );
  }
  if (raw.version !== PROJECT_VERSION) {
    errors.push(
      `${label}: version: unsupported project version ${describeValue(raw.version)}; this page reads version ${PROJECT_VERSION}`,
    );
  }
  for (const key of Object.keys(raw)) {
    if (!['format', 'version', 'case', 'view', 'baseline'].includes(key)) {
      errors.push(`${label}: ${key}: unknown key (allowed: format, version, case, view, baseline)`);
    }
  }
  if (!('case' in raw)) errors.push(`${label}: case: is required (the design, a CoverSweep case)`);
  if (errors.length > 0) return { ok: false, errors };
  return validateStateParts({ case: raw.case, view: raw.view, baseline: raw.baseline }, label);
}

// ---------------------------------------------------------------------------------------------
// Autosave (same document as the project file)

export function saveAutosave(storage: Pick<Storage, 'setItem'>, state: AppState): string | null {
  try {
    storage.setItem(AUTOSAVE_KEY, stateToProjectText(state));
    return null;
  } catch (error) {
    return `autosave failed: ${(error as Error).message}`;
  }
}

export function loadAutosave(storage: Pick<Storage, 'getItem'>): Parsed<AppState> | null {
  let text: string | null;
  try {
    text = storage.getItem(AUTOSAVE_KEY);
  } catch {
    return null;
  }
  if (text === null) return null;
  return projectTextToState(text, 'autosave');
}
