/**
 * Versions of CoverSweep's own JSON files and their migration. Every format carries `format` and
 * `version`; a file without `version` is version 1 (the files written before the field was required).
 * Reading a file first migrates it, step by step, from its version to the current one (a function per
 * format and step), then validates it with the format's one schema. A version newer than this program
 * reads is refused with a message saying so; nothing is guessed. Today every format is at version 1,
 * so the step lists are empty: the mechanism is exercised by the tests with a stand-in step.
 */
import { describeValue } from './describeValue';

/** Largest case, plan, ride or map file accepted (bytes): hand-written files are a few kB. */
export const MAX_JSON_FILE_BYTES = 4 * 1024 * 1024;

/** A message when a JSON file of `bytes` is too large to read, else null. Check before reading. */
export function checkJsonFileSize(bytes: number, label: string): string | null {
  if (!(bytes <= MAX_JSON_FILE_BYTES)) {
    return `the ${label} is ${(bytes / (1024 * 1024)).toFixed(1)} MB, more than the ${MAX_JSON_FILE_BYTES / (1024 * 1024)} MB limit for CoverSweep's JSON files (is it the right file?)`;
  }
  return null;
}

/** One migration step: raw JSON of version `from` -> raw JSON of version `from + 1`. */
export type MigrationStep = (raw: Record<string, unknown>) => Record<string, unknown>;

export interface FormatVersions {
  /** The `format` value of the file, e.g. "coversweep-case". */
  format: string;
  /** What the file is, for messages ("case-file"). */
  label: string;
  /** Version this program writes and validates. */
  current: number;
  /** steps[v] migrates version v to v + 1, for every v from 1 to current - 1. */
  steps: Readonly<Record<number, MigrationStep>>;
}

export type Migrated = { ok: true; value: unknown; fromVersion: number } | { ok: false; errors: string[] };

/**
 * Bring raw JSON of a file up to the current version of its format. Values that are not objects are
 * passed through untouched (the schema reports them). Never throws.
 */
export function migrateFile(raw: unknown, spec: FormatVersions): Migrated {
  if (raw === null || typeof raw !== 'object' || Array.isArray(raw))
    return { ok: true, value: raw, fromVersion: spec.current };
  const file = raw as Record<string, unknown>;
  const given = file.version;
  const version = given === undefined ? 1 : given;
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 1) {
    return {
      ok: false,
      errors: [
        `version: unsupported ${spec.label} version ${describeValue(given)}: must be a whole number from 1 to ${spec.current}`,
      ],
    };
  }
  if (version > spec.current) {
    return {
      ok: false,
      errors: [
        `version: unsupported ${spec.label} version ${version}: newer than this program reads (version ${spec.current}); update CoverSweep to open it`,
      ],
    };
  }
  let out: Record<string, unknown> = { ...file };
  for (let v = version; v < spec.current; v++) {
    const step = spec.steps[v];
    if (!step) {
      return {
        ok: false,
        errors: [`version: no migration of the ${spec.label} format from version ${v} to ${v + 1}`],
      };
    }
    try {
      out = step(out);
    } catch (error) {
      const reason = error instanceof Error ? error.message : String(error);
      return {
        ok: false,
        errors: [`version: cannot migrate this ${spec.label} from version ${v}: ${reason}`],
      };
    }
  }
  out.version = spec.current;
  return { ok: true, value: out, fromVersion: version };
}

/** The four formats the tool reads. Add a step to `steps` when a format's version goes up. */
export const CASE_VERSIONS: FormatVersions = {
  format: 'coversweep-case',
  label: 'case-file',
  current: 1,
  steps: {},
};
export const PLAN_VERSIONS: FormatVersions = {
  format: 'coversweep-plan',
  label: 'plan-file',
  current: 1,
  steps: {},
};
export const RIDE_VERSIONS: FormatVersions = {
  format: 'coversweep-ride',
  label: 'ride-file',
  current: 1,
  steps: {},
};
export const MAP_VERSIONS: FormatVersions = {
  format: 'coversweep-map',
  label: 'map-file',
  current: 1,
  steps: {},
};

/** Raw case JSON of any known version -> the current version. */
export function migrateCase(raw: unknown): Migrated {
  return migrateFile(raw, CASE_VERSIONS);
}
/** Raw plan JSON of any known version -> the current version. */
export function migratePlan(raw: unknown): Migrated {
  return migrateFile(raw, PLAN_VERSIONS);
}
/** Raw ride JSON of any known version -> the current version. */
export function migrateRide(raw: unknown): Migrated {
  return migrateFile(raw, RIDE_VERSIONS);
}
/** Raw map JSON of any known version -> the current version. A map without `format` is taken as one. */
export function migrateMap(raw: unknown): Migrated {
  return migrateFile(raw, MAP_VERSIONS);
}
