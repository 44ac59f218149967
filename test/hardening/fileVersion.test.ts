/**
 * Versions and migration of CoverSweep's own files (issue 7): a file without "version" is version 1,
 * an unknown newer version is refused with a clear message, and a migration step runs from an older
 * version to the current one (today every format is at version 1; the step here is a stand-in that
 * shows the mechanism). Rules: common practice, no source.
 */
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { validateCase } from '../../src/compute/caseFile';
import { validateMap } from '../../src/compute/compare/mapFile';
import { type FormatVersions, migrateFile } from '../../src/compute/fileVersion';
import { expandPlan } from '../../src/compute/planFile';
import { validateRide } from '../../src/compute/ride/rideFile';

const read = (dir: string, name: string) =>
  JSON.parse(readFileSync(resolve(__dirname, '../../public', dir, name), 'utf8')) as Record<string, unknown>;

const formats: Array<
  [string, Record<string, unknown>, (raw: unknown) => { ok: boolean; errors?: string[] }]
> = [
  ['case-file', read('examples', 'demo-case.json'), validateCase],
  ['plan-file', read('examples', 'demo-plan.json'), expandPlan],
  ['ride-file', read('examples', 'ride.json'), validateRide],
  ['map-file', read('demo', 'demo-map.json'), validateMap],
];

describe('file versions', () => {
  it('a file without "version" reads as version 1, exactly like one with "version": 1', () => {
    for (const [label, file, validate] of formats) {
      const { version: _v, ...bare } = file;
      const a = validate(bare);
      const b = validate({ ...file, version: 1 });
      expect(a.ok, `${label}: ${a.errors?.join('; ')}`).toBe(true);
      expect(a, label).toEqual(b);
    }
  });

  it('an unknown newer version, or a version that is not a whole number, is refused and named', () => {
    for (const [label, file, validate] of formats) {
      const newer = validate({ ...file, version: 2 });
      expect(newer.errors, label).toEqual([
        `version: unsupported ${label} version 2: newer than this program reads (version 1); update CoverSweep to open it`,
      ]);
      for (const bad of [0, 1.5, '1', null]) {
        const r = validate({ ...file, version: bad });
        expect(r.ok, `${label} version ${String(bad)}`).toBe(false);
        expect(r.errors?.[0], `${label} version ${String(bad)}`).toMatch(
          /^version: unsupported .* must be a whole number from 1 to 1/,
        );
      }
    }
  });

  it('migrates step by step from an older version to the current one, and reports a failing step', () => {
    // A stand-in format at version 3: v1 named the field "rim_mm" (mm), v2 "rim_m" (m) as a string.
    const spec: FormatVersions = {
      format: 'example',
      label: 'example-file',
      current: 3,
      steps: {
        1: ({ rim_mm, ...rest }) => ({ ...rest, rim_m: String((rim_mm as number) / 1000) }),
        2: ({ rim_m, ...rest }) => {
          if (typeof rim_m !== 'string') throw new Error('rim_m missing');
          return { ...rest, rim_m: Number(rim_m) };
        },
      },
    };
    expect(migrateFile({ rim_mm: 50 }, spec)).toEqual({
      ok: true,
      value: { rim_m: 0.05, version: 3 },
      fromVersion: 1,
    });
    expect(migrateFile({ version: 2, rim_m: '0.06' }, spec)).toEqual({
      ok: true,
      value: { rim_m: 0.06, version: 3 },
      fromVersion: 2,
    });
    expect(migrateFile({ version: 3, rim_m: 0.07 }, spec)).toEqual({
      ok: true,
      value: { rim_m: 0.07, version: 3 },
      fromVersion: 3,
    });
    expect(migrateFile({ version: 2 }, spec)).toEqual({
      ok: false,
      errors: ['version: cannot migrate this example-file from version 2: rim_m missing'],
    });
    // The input is never modified.
    const original = { rim_mm: 50 };
    migrateFile(original, spec);
    expect(original).toEqual({ rim_mm: 50 });
  });
});
