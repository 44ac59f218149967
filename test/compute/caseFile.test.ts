import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  type CaseFile,
  caseToModelInput,
  findJsonSyntaxError,
  parseCaseFile,
  parseJsonText,
  solutionToDocument,
  validateCase,
} from '../../src/compute/caseFile';
import { mphToMps } from '../../src/compute/units';
import { solveWheel } from '../../src/model/wheel/solveWheel';

const FAST_MODEL = { lattice_span: 8, lattice_chord: 6, grid_convergence: false };

function ok(json: unknown): CaseFile {
  const r = validateCase(json);
  if (!r.ok) throw new Error(`expected a valid case, got errors:\n${r.errors.join('\n')}`);
  return r.value;
}

function errorsOf(json: unknown): string[] {
  const r = validateCase(json);
  expect(r.ok, `expected errors for ${JSON.stringify(json)}`).toBe(false);
  return r.ok ? [] : r.errors;
}

function relClose(got: number, expected: number, rel: number, input: string) {
  const tol = rel * Math.abs(expected);
  expect(Math.abs(got - expected), `${input} got=${got} expected=${expected} tol=${tol}`).toBeLessThanOrEqual(
    tol,
  );
}

const minimal = { conditions: { airspeed_mps: 10, yaw_deg: 0 } };

describe('parseCaseFile: defaults', () => {
  it('fills the documented defaults (ISA sea-level air, 700c-like wheel, 73 deg / 45 mm steering)', () => {
    const c = ok(minimal);
    expect(c.format).toBe('coversweep-case');
    expect(c.version).toBe(1);
    expect(c.wheel.outer_radius_m).toBe(0.334);
    expect(c.wheel.rim_depth_m).toBe(0.05);
    expect(c.wheel.spokes).toMatchObject({ count: 20, section: 'round', diameter_m: 0.002 });
    expect(c.wheel.cover).toEqual({ fraction: 0, placement: 'rim', sides: 2 });
    expect(c.conditions).toMatchObject({
      airspeed_mps: [10],
      yaw_deg: [0],
      ground_speed_mps: null,
      temperature_c: 15,
      pressure_pa: 101325,
      relative_humidity: 0,
      reference_speed_kmh: 50,
    });
    expect(c.steering).toEqual({ head_angle_deg: 73, fork_offset_m: 0.045 });
    expect(c.model.ground).toBe(true);
    expect(c.model.grid_convergence).toBe(true);
  });

  it('default air is ISA sea level: rho = 1.2250 kg/m^3, mu = 1.7894e-5 Pa s (US Standard Atmosphere 1976, table)', () => {
    const input = caseToModelInput(ok(minimal));
    relClose(input.points[0]!.rhoKgPerM3, 1.225, 2e-4, 'T=15 C p=101325 Pa RH=0');
    relClose(input.points[0]!.muPaS, 1.7894e-5, 2e-4, 'T=15 C');
  });

  it('altitude_m uses the standard atmosphere: 1000 m -> 8.5 C, rho = 1.1117 kg/m^3 (US Standard Atmosphere 1976, table)', () => {
    const c = ok({ conditions: { airspeed_mps: 10, yaw_deg: 0, altitude_m: 1000 } });
    relClose(c.conditions.temperature_c, 8.5, 1e-12, 'altitude=1000 m');
    relClose(caseToModelInput(c).points[0]!.rhoKgPerM3, 1.1117, 3e-4, 'altitude=1000 m');
  });

  it('humid air is lighter: 20 C, 101325 Pa, 50 % RH -> about 1.199 kg/m^3 (from memory)', () => {
    const c = ok({ conditions: { airspeed_mps: 10, yaw_deg: 0, temperature_c: 20, relative_humidity: 0.5 } });
    relClose(caseToModelInput(c).points[0]!.rhoKgPerM3, 1.199, 1e-3, 'T=20 C RH=0.5');
  });

  it('a given density is used as is; viscosity still follows the temperature', () => {
    const c = ok({ conditions: { airspeed_mps: 10, yaw_deg: 0, air_density_kgpm3: 1.1, temperature_c: 15 } });
    const p = caseToModelInput(c).points[0]!;
    expect(p.rhoKgPerM3).toBe(1.1);
    relClose(p.muPaS, 1.7894e-5, 2e-4, 'T=15 C');
    expect(c.conditions.pressure_pa).toBeUndefined();
  });

  it('the normalised case reads back to itself', () => {
    const c = ok({
      name: 'x',
      wheel: { cover: { placement: 'explicit', inner_radius_m: 0.1, outer_radius_m: 0.2 } },
      conditions: { airspeed_mps: [10, 12], yaw_deg: [0, 5], ground_speed_mps: 9, altitude_m: 500 },
    });
    expect(ok(JSON.parse(JSON.stringify(c)))).toEqual(c);
  });
});

describe('parseCaseFile: validation messages name the key path, the value and the rule', () => {
  it('suggests the nearest allowed key for a misspelt one (optimal string alignment distance)', () => {
    const errors = errorsOf({ wheel: { rim_dept_m: 0.05 } });
    expect(errors[0], errors.join('\n')).toMatch(
      /^wheel\.rim_dept_m: unknown key \(did you mean wheel\.rim_depth_m\?\)/,
    );
  });

  it('reports every error at once', () => {
    const errors = errorsOf({
      wheel: {
        rim_depth_m: 0.4,
        cover: { fraction: 1.3, colour: 'red' },
        spokes: { count: 20.5, section: 'flat' },
      },
      conditions: { airspeed_mps: [10, -1], yaw_deg: 'x' },
      extra: 1,
    });
    const expected = [
      'wheel.cover.fraction: must be a number between 0 and 1, got 1.3',
      'wheel.cover.colour: unknown key',
      'wheel.spokes.count: must be an integer between 0 and 200, got 20.5',
      'wheel.spokes.section: must be one of "round", "bladed", got "flat"',
      'conditions.airspeed_mps[1]: must be a number greater than 0 and at most 60 m/s, got -1',
      'conditions.yaw_deg: must be a number or a non-empty list of numbers',
      'extra: unknown key',
      'wheel.rim_depth_m: rim depth 0.4 m + tyre width 0.025 m must be less than outer radius 0.334 m - hub flange radius 0.028 m',
    ];
    for (const e of expected) {
      expect(
        errors.some((m) => m.startsWith(e)),
        `missing "${e}" in:\n${errors.join('\n')}`,
      ).toBe(true);
    }
    expect(errors.length).toBe(expected.length);
  });

  it('a rim deeper than the wheel', () => {
    const errors = errorsOf({ wheel: { rim_depth_m: 0.29 }, conditions: { airspeed_mps: 10, yaw_deg: 0 } });
    expect(errors).toHaveLength(1);
    expect(errors[0]).toMatch(/^wheel\.rim_depth_m: .*the rim is deeper than the wheel/);
  });

  it('required keys, versions, conflicting air descriptions, explicit cover radii, yaw range', () => {
    expect(errorsOf({ conditions: { yaw_deg: 0 } })[0]).toMatch(/^conditions\.airspeed_mps: is required/);
    expect(errorsOf({ version: 2, ...minimal })[0]).toMatch(/^version: unsupported case-file version 2/);
    expect(errorsOf({ format: 'other', ...minimal })[0]).toMatch(/^format: must be "coversweep-case"/);
    expect(
      errorsOf({
        conditions: { airspeed_mps: 10, yaw_deg: 0, air_density_kgpm3: 1.2, pressure_pa: 90000 },
      })[0],
    ).toMatch(/^conditions\.pressure_pa: cannot be given together with conditions\.air_density_kgpm3/);
    const cover = errorsOf({
      wheel: { cover: { placement: 'explicit', inner_radius_m: 0.02, outer_radius_m: 0.3 } },
      ...minimal,
    });
    expect(cover[0]).toMatch(
      /^wheel\.cover\.inner_radius_m: must be at least the hub flange radius 0\.028 m/,
    );
    expect(cover[1]).toMatch(
      /^wheel\.cover\.outer_radius_m: must be at most the rim's inner radius 0\.259 m/,
    );
    expect(errorsOf({ wheel: { cover: { placement: 'explicit' } }, ...minimal })[0]).toMatch(
      /^wheel\.cover\.inner_radius_m: is required when/,
    );
    expect(errorsOf({ conditions: { airspeed_mps: 10, yaw_deg: [0, 95] } })).toEqual([
      'conditions.yaw_deg[1]: must be a number between -90 and 90 deg, got 95',
    ]);
    expect(errorsOf({ conditions: { airspeed_mps: 10, yaw_deg: [] } })[0]).toMatch(
      /^conditions\.yaw_deg: must be a number or a non-empty list of numbers.*got an empty list/,
    );
    expect(errorsOf({ model: { ground: 'yes' }, ...minimal })).toEqual([
      'model.ground: must be true or false, got "yes"',
    ]);
  });

  it('says where broken JSON is broken', () => {
    const r = parseCaseFile('{\n  "conditions": {\n    "yaw_deg": 0,\n  }\n}');
    expect(r.ok).toBe(false);
    if (!r.ok)
      expect(r.errors[0]).toBe(
        'case file: invalid JSON at line 4, column 3: trailing comma before "}" (not allowed in JSON), found "}"',
      );
    const empty = parseCaseFile('');
    expect(empty.ok === false && empty.errors[0]).toMatch(/line 1, column 1: expected a value/);
    expect(parseJsonText('\uFEFF{"a": 1}')).toEqual({ ok: true, value: { a: 1 } });
  });

  it('the JSON scanner agrees with JSON.parse on arbitrary text (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.oneof(
          fc.string(),
          fc.json().map((j) => j.slice(0, Math.max(0, j.length - 1))),
        ),
        (text) => {
          let valid = true;
          try {
            JSON.parse(text);
          } catch {
            valid = false;
          }
          expect(findJsonSyntaxError(text) === null, `text=${JSON.stringify(text)}`).toBe(valid);
        },
      ),
      { numRuns: 500 },
    );
  });

  it('never throws, whatever the input (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.oneof(
          fc.string(),
          fc.json(),
          fc.jsonValue().map((v) => JSON.stringify({ conditions: v })),
        ),
        (text) => {
          const r = parseCaseFile(text);
          expect(typeof r.ok).toBe('boolean');
          if (!r.ok) expect(r.errors.length).toBeGreaterThan(0);
        },
      ),
      { numRuns: 300 },
    );
  });
});

describe('caseToModelInput', () => {
  it('converts degrees to radians and orders the points airspeed-major, yaw fastest', () => {
    const c = ok({
      conditions: { airspeed_mps: [10, 12], yaw_deg: [0, 90], ground_speed_mps: 8 },
      steering: { head_angle_deg: 90 },
    });
    const input = caseToModelInput(c);
    expect(input.points.map((p) => [p.airspeedMps, p.yawRad, p.groundSpeedMps])).toEqual([
      [10, 0, 8],
      [10, Math.PI / 2, 8],
      [12, 0, 8],
      [12, Math.PI / 2, 8],
    ]);
    expect(input.steering.headAngleRad).toBe(Math.PI / 2);
    expect(input.wheel.outerRadiusM).toBe(0.334);
  });

  it('model.fixed_lattice: off and left out of the echo by default; true reaches the model options', () => {
    const plain = ok(minimal);
    expect('fixed_lattice' in plain.model).toBe(false);
    expect(caseToModelInput(plain).options.fixedLattice).toBeUndefined();
    const fixed = ok({ ...minimal, model: { fixed_lattice: true } });
    expect(fixed.model.fixed_lattice).toBe(true);
    expect(caseToModelInput(fixed).options.fixedLattice).toBe(true);
    expect(errorsOf({ ...minimal, model: { fixed_lattice: 1 } }).join('\n')).toMatch(/model\.fixed_lattice/);
  });

  it('ground speed defaults to each point airspeed (wind-tunnel convention)', () => {
    const input = caseToModelInput(ok({ conditions: { airspeed_mps: [10, 12], yaw_deg: 0 } }));
    expect(input.points.map((p) => p.groundSpeedMps)).toEqual([10, 12]);
  });
});

describe('solutionToDocument', () => {
  const c = ok({
    wheel: { cover: { fraction: 0.5 } },
    conditions: { airspeed_mps: 13.9, yaw_deg: [0, 7.5, 15], reference_speed_kmh: 48 },
    model: FAST_MODEL,
  });
  const doc = solutionToDocument(c, solveWheel(caseToModelInput(c)));

  it('has the documented fields, the case given back, and no NaN anywhere', () => {
    expect(doc.format).toBe('coversweep-result');
    expect(doc.version).toBe(1);
    expect(doc.case).toEqual(c);
    expect(doc.results).toHaveLength(3);
    expect(doc.results.map((r) => r.yaw_deg)).toEqual([0, 7.5, 15]);
    expect(doc.notes[0]).toMatch(/^axial_N is the force along the direction of travel/);
    const text = JSON.stringify(doc);
    expect(text).not.toMatch(/NaN|Infinity/);
    // At zero yaw the side force is zero and the centre of pressure undefined: null, not NaN.
    expect(doc.results[0]!.cp_x_m).toBeNull();
    expect(Object.keys(doc.results[0]!.components)).toEqual([
      'surface',
      'vortex',
      'spokes',
      'rim_tyre',
      'friction',
      'hub',
    ]);
  });

  it('axial_N is the sum of the components (minus the model force along +x)', () => {
    for (const r of doc.results) {
      const sum = Object.values(r.components).reduce((s, k) => s + (k.axial_N ?? 0), 0);
      const tol = 1e-12 * Math.max(1, Math.abs(r.axial_N!));
      expect(
        Math.abs(sum - r.axial_N!),
        `yaw=${r.yaw_deg} got=${sum} expected=${r.axial_N} tol=${tol}`,
      ).toBeLessThanOrEqual(tol);
    }
  });

  it('grams-force at the reference speed: cda * 0.5 rho Vref^2 / g0 * 1000 (definition)', () => {
    const vRef = 48 / 3.6;
    expect(doc.reference_speed_mps).toBe(vRef);
    for (const r of doc.results) {
      const expected = ((r.cda_axial_m2! * 0.5 * r.air_density_kgpm3! * vRef * vRef) / 9.80665) * 1000;
      relClose(r.axial_gf_ref!, expected, 1e-14, `yaw=${r.yaw_deg}`);
      const v30 = mphToMps(30);
      relClose(r.axial_gf_30mph!, (expected * v30 * v30) / (vRef * vRef), 1e-13, `yaw=${r.yaw_deg}`);
      relClose(r.cda_axial_cm2!, r.cda_axial_m2! * 1e4, 1e-15, `yaw=${r.yaw_deg}`);
      const q = 0.5 * r.air_density_kgpm3! * r.airspeed_mps! ** 2;
      relClose(r.cda_axial_m2!, r.axial_N! / q, 1e-12, `yaw=${r.yaw_deg}`);
    }
  });
});
