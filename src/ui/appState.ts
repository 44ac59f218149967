/**
 * The page's whole state: the design (a CoverSweep case file), the view settings, an optional pinned
 * baseline design, and optional sections added later (version-compatible: a state without them is
 * read as before, with defaults): the "On the road" inputs, the mark of a calibrated model, the design
 * study's inputs and the imported data (data/savedData.ts: its CSV, mapping and fit; a link carries a
 * reference to it, never its rows). One
 * validated shape travels three ways: the URL fragment (shareable link), the local autosave and the
 * project file. Every reader validates (validateCase for designs, validateView for the view, the ride
 * file's rules for the road inputs) and returns messages naming the field; nothing is applied unless
 * everything is valid.
 */
import {
  type CaseFile,
  describeValue,
  MAX_NAME_CHARS,
  type Parsed,
  parseJsonText,
  validateCase,
} from '../compute/caseFile';
import { MAX_DATA_BYTES } from '../compute/compare/index';
import { type FormatVersions, migrateFile } from '../compute/fileVersion';
import { base64UrlToText, textToBase64Url } from './base64url';
import { pinnedBaselines } from './baselines/pinnedBaselines';
import { validateBaselines } from './baselines/validateBaselines';
import { type CalibrationMark, validateCalibration } from './calibrationMark';
import { dataReference, type SavedData, validateSavedData } from './data/savedData';
import { type RoadState, validateRoadFor, validateRoadShape } from './roadState';
import { type StudyInputs, validateStudyInputs } from './study/studyState';
import { type ViewState, validateView } from './viewState';

export interface AppState {
  case: CaseFile;
  view: ViewState;
  /** The reference baseline (differences, the map and the road panel use it), or none pinned. */
  baseline: CaseFile | null;
  /** Every pinned baseline in pinning order, the reference among them (absent: just `baseline`);
   * see baselines/pinnedBaselines. */
  baselines?: CaseFile[];
  /** The "On the road" inputs (absent: the defaults). */
  road?: RoadState;
  /** Present while a calibrated model is in use. */
  calibration?: CalibrationMark | null;
  /** The design study's inputs (absent: the defaults); its result is recomputed, never stored. */
  study?: StudyInputs;
  /** The "Your data" panel's table, mapping and fit (absent or null: no data imported). */
  data?: SavedData | null;
}

export type { CalibrationMark };

export const PROJECT_FORMAT = 'coversweep-project';
/** Version 2 added the `data` section; a version 1 file is read as before (migrated: nothing to change). */
export const PROJECT_VERSION = 2;
const PROJECT_VERSIONS: FormatVersions = {
  format: PROJECT_FORMAT,
  label: 'project',
  current: PROJECT_VERSION,
  steps: { 1: (raw) => raw },
};
export const LINK_VERSION = 1;
export const AUTOSAVE_KEY = 'coversweep.autosave.v1';

/** Longest design name (characters) the page accepts, in a link, a project file or the autosave: the
 * case file's own limit. */
export { MAX_NAME_CHARS };
/** Largest project file the page opens (bytes): a design with its view is a few kB, plus the imported
 * data's CSV (at most MAX_DATA_BYTES) and the JSON escapes of its line ends. */
export const MAX_PROJECT_BYTES = 1024 * 1024 + 2 * MAX_DATA_BYTES;
/** Largest case file the page opens (bytes); a design is a few kB. */
export const MAX_CASE_FILE_BYTES = 1024 * 1024;
/** Longest link fragment the page makes or reads (characters); larger designs go in a project file. */
export const MAX_LINK_CHARS = 256 * 1024;

/** Names too long for the page: messages naming the field, or none. */
export function nameErrors(parts: { case?: unknown; baseline?: unknown }, label: string): string[] {
  const errors: string[] = [];
  for (const key of ['case', 'baseline'] as const) {
    const part = parts[key];
    const name = isObject(part) ? part.name : undefined;
    if (typeof name === 'string' && name.length > MAX_NAME_CHARS)
      errors.push(
        `${label}: ${key}.name: at most ${MAX_NAME_CHARS} characters, got ${name.length} (a name, not a document)`,
      );
  }
  return errors;
}

/** Validate the parts of a state object; `label` prefixes every message. */
export function validateStateParts(
  parts: {
    case: unknown;
    view: unknown;
    baseline: unknown;
    baselines?: unknown;
    road?: unknown;
    calibration?: unknown;
    study?: unknown;
    data?: unknown;
  },
  label: string,
): Parsed<AppState> {
  const errors: string[] = nameErrors(parts, label);
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
  const pinned = validateBaselines(parts.baselines, baseline, label);
  if (!pinned.ok) errors.push(...pinned.errors);
  let road: RoadState | undefined;
  if (parts.road !== undefined) {
    const r = validateRoadShape(parts.road);
    if (!r.ok) errors.push(...r.errors.map((e) => `${label}: ${e}`));
    else if (c.ok) {
      // The values by the ride file's rules (as a ride of the design against itself).
      const ride = validateRoadFor(r.value, c.value, c.value.wheel);
      const own = ride.ok ? [] : ride.errors.filter((e) => !/^(design|baseline|steering|model)\b/.test(e));
      if (own.length > 0) errors.push(...own.map((e) => `${label}: road: ${e}`));
      else road = r.value;
    }
  }
  let calibration: CalibrationMark | null | undefined;
  if (parts.calibration !== undefined && parts.calibration !== null) {
    const m = validateCalibration(parts.calibration, label);
    if (!m.ok) errors.push(...m.errors);
    else calibration = m.value;
  } else if (parts.calibration === null) {
    calibration = null;
  }
  let study: StudyInputs | undefined;
  if (parts.study !== undefined) {
    const st = validateStudyInputs(parts.study);
    if (!st.ok) errors.push(...st.errors.map((e) => `${label}: ${e}`));
    else study = st.value;
  }
  let data: SavedData | null | undefined;
  if (parts.data !== undefined && parts.data !== null) {
    const d = validateSavedData(parts.data, label);
    if (!d.ok) errors.push(...d.errors);
    else data = d.value;
  } else if (parts.data === null) data = null;
  if (errors.length > 0 || !c.ok || !v.ok) return { ok: false, errors };
  const value: AppState = { case: c.value, view: v.value, baseline };
  if (pinned.ok && pinned.value && pinned.value.length > 1) value.baselines = pinned.value;
  if (road !== undefined) value.road = road;
  if (calibration !== undefined) value.calibration = calibration;
  if (study !== undefined) value.study = study;
  if (data) value.data = data;
  return { ok: true, value };
}

/** The optional sections of a state, for writing (absent ones are left out); a link's data is its reference. */
function optionalParts(state: AppState, forLink = false): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  const pinned = pinnedBaselines(state);
  if (pinned.length > 1) out.baselines = pinned;
  if (state.road !== undefined) out.road = state.road;
  if (state.calibration) out.calibration = state.calibration;
  if (state.study !== undefined) out.study = state.study;
  if (state.data) out.data = forLink ? dataReference(state.data) : state.data;
  return out;
}

function isObject(x: unknown): x is Record<string, unknown> {
  return x !== null && typeof x === 'object' && !Array.isArray(x);
}

// ---------------------------------------------------------------------------------------------
// URL fragment: #s=<base64url of {"v":1,"case":...,"view":...,"baseline":...}>

/** The state's link fragment, or null when it would be longer than MAX_LINK_CHARS. */
export function stateToHashOrNull(state: AppState): string | null {
  const hash = stateToHash(state);
  return hash.length > MAX_LINK_CHARS ? null : hash;
}

export function stateToHash(state: AppState): string {
  const json = JSON.stringify({
    v: LINK_VERSION,
    case: state.case,
    view: state.view,
    baseline: state.baseline,
    ...optionalParts(state, true),
  });
  return `#s=${textToBase64Url(json)}`;
}

/** Read a state from a URL fragment. `null` when the fragment carries no state at all. */
export function hashToState(hash: string): Parsed<AppState> | null {
  const body = hash.startsWith('#') ? hash.slice(1) : hash;
  if (body === '') return null;
  if (body.length > MAX_LINK_CHARS) {
    return {
      ok: false,
      errors: [
        `link: ${Math.round(body.length / 1024)} kB long, more than the ${MAX_LINK_CHARS / 1024} kB a link may carry; open the design from a project file instead`,
      ],
    };
  }
  const encoded = new URLSearchParams(body).get('s');
  if (encoded === null) return null;
  let text: string;
  try {
    text = base64UrlToText(encoded);
  } catch (error) {
    return {
      ok: false,
      errors: [
        `link: the design data after "#s=" must be base64url-encoded UTF-8 JSON written by this page; ${(error as Error).message}. Copy the whole link again from where it was made.`,
      ],
    };
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
  return validateStateParts(
    {
      case: raw.case,
      view: raw.view,
      baseline: raw.baseline,
      baselines: raw.baselines,
      road: raw.road,
      calibration: raw.calibration,
      study: raw.study,
      data: raw.data,
    },
    'link',
  );
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
      ...optionalParts(state),
    },
    null,
    2,
  )}\n`;
}

export function projectTextToState(text: string, label = 'project file'): Parsed<AppState> {
  if (text.length > MAX_PROJECT_BYTES) {
    return {
      ok: false,
      errors: [
        `${label}: ${Math.round(text.length / 1024)} kB, more than the ${MAX_PROJECT_BYTES / 1024} kB a project file may hold (a design with its view is a few kB; imported data at most ${MAX_DATA_BYTES / (1024 * 1024)} MB)`,
      ],
    };
  }
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
  // Versions 1..PROJECT_VERSION open (migrated step by step); a newer or malformed one is named.
  const migrated = migrateFile(raw, PROJECT_VERSIONS);
  if (!migrated.ok) errors.push(...migrated.errors.map((e) => `${label}: ${e}`));
  for (const key of Object.keys(raw)) {
    if (!PROJECT_KEYS.includes(key)) {
      errors.push(`${label}: ${key}: unknown key (allowed: ${PROJECT_KEYS.join(', ')})`);
    }
  }
  if (!('case' in raw)) errors.push(`${label}: case: is required (the design, a CoverSweep case)`);
  if (errors.length > 0 || !migrated.ok) return { ok: false, errors };
  const doc = migrated.value as Record<string, unknown>;
  return validateStateParts(
    {
      case: doc.case,
      view: doc.view,
      baseline: doc.baseline,
      baselines: doc.baselines,
      road: doc.road,
      calibration: doc.calibration,
      study: doc.study,
      data: doc.data,
    },
    label,
  );
}

const PROJECT_KEYS = [
  'format',
  'version',
  'case',
  'view',
  'baseline',
  'baselines',
  'road',
  'calibration',
  'study',
  'data',
];

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
