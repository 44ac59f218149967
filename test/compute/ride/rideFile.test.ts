import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseRideFile, RIDE_DEFAULTS, validateRide } from '../../../src/compute/ride/rideFile';

// biome-ignore lint/suspicious/noExplicitAny: a free-form JSON document edited by the tests
type Ride = Record<string, any>;

const example = JSON.parse(
  readFileSync(new URL('../../../public/examples/ride.json', import.meta.url), 'utf8'),
);

function withChange(change: (r: Ride) => void): unknown {
  const r = structuredClone(example);
  change(r);
  return r;
}

function errorsOf(raw: unknown): string[] {
  const p = validateRide(raw);
  expect(p.ok, `expected invalid: ${JSON.stringify(raw).slice(0, 200)}`).toBe(false);
  return p.ok ? [] : p.errors;
}

describe('parseRideFile', () => {
  it('reads the example and fills the documented defaults', () => {
    const p = parseRideFile(JSON.stringify(example));
    expect(p.ok, p.ok ? '' : p.errors.join('\n')).toBe(true);
    if (!p.ok) return;
    const r = p.value;
    expect(r.rear_shield).toBe(RIDE_DEFAULTS.rear_shield);
    expect(r.wind.reference_height_m).toBe(10);
    expect(r.wind.roughness_length_m).toBe(0.03);
    expect(r.wind.hub_height_m).toBeNull();
    expect(r.wind.rider_height_m).toBe(RIDE_DEFAULTS.rider_height_m);
    expect(r.model.grid_convergence).toBe(false);
    expect(r.design.cover.fraction).toBe(1);
    expect(r.baseline.cover.fraction).toBe(0);
    expect(r.ride.gradient).toBe(0);
  });

  it('reads back the normalised ride file it returns (defaults filled, nulls included)', () => {
    const first = parseRideFile(JSON.stringify(example));
    expect(first.ok).toBe(true);
    if (!first.ok) return;
    const again = parseRideFile(JSON.stringify(first.value));
    expect(again.ok, again.ok ? '' : again.errors.join('\n')).toBe(true);
    if (again.ok) expect(again.value).toEqual(first.value);
  });

  it('names the key path, the value and the rule', () => {
    expect(errorsOf(withChange((r) => (r.rider.mass_kg = 5)))).toEqual([
      'rider.mass_kg: must be a number at least 20 and at most 300 kg (rider and bike), got 5',
    ]);
    expect(errorsOf(withChange((r) => (r.rider.mass_kgg = 80)))[0]).toMatch(
      /^rider.mass_kgg: unknown key \(did you mean rider.mass_kg\?\)/,
    );
    expect(errorsOf(withChange((r) => (r.rider.weight = 5)))[0]).toMatch(
      /^rider.weight: unknown key \(allowed here: mass_kg/,
    );
    expect(errorsOf(withChange((r) => delete r.design))).toEqual([
      'design: is required (a wheel object, as in a case file\'s "wheel")',
    ]);
    expect(errorsOf(withChange((r) => (r.position = 'middle')))).toEqual([
      'position: must be "front" or "rear", got "middle"',
    ]);
  });

  it('checks the wheels with the case-file rules, relabelled', () => {
    expect(errorsOf(withChange((r) => (r.design.cover.fraction = 1.5)))).toEqual([
      'design.cover.fraction: must be a number between 0 and 1, got 1.5',
    ]);
    expect(errorsOf(withChange((r) => (r.baseline.rim_depth_m = 0.4)))[0]).toMatch(
      /^baseline.rim_depth_m: rim depth 0.4 m/,
    );
    const air = errorsOf(withChange((r) => (r.air = { air_density_kgpm3: 1.2, pressure_pa: 100000 })));
    expect(air[0]).toMatch(/^air.pressure_pa: cannot be given together with air.air_density_kgpm3/);
  });

  it('asks for exactly one of power and speed, of wind speed and distribution, and a distance', () => {
    expect(errorsOf(withChange((r) => (r.ride.speed_mps = 10)))[0]).toMatch(
      /^ride: must give exactly one of power_W/,
    );
    expect(errorsOf(withChange((r) => (r.wind.distribution = { type: 'rayleigh', mean_mps: 4 })))[0]).toMatch(
      /^wind: must give exactly one of speed_mps/,
    );
    expect(errorsOf(withChange((r) => delete r.ride.distance_m))[0]).toMatch(/^ride.distance_m: is required/);
    expect(errorsOf(withChange((r) => (r.wind.distribution = { type: 'gamma' })))[0]).toMatch(
      /^wind.distribution(.type)?: must be \{"type": "rayleigh"/,
    );
  });

  it('takes a course length as the distance and rejects a different distance', () => {
    const ok = validateRide(
      withChange((r) => {
        delete r.ride.distance_m;
        r.course = [
          { length_m: 1000, heading_deg: 0, gradient: 0.02 },
          { length_m: 500, heading_deg: 90 },
        ];
      }),
    );
    expect(ok.ok).toBe(true);
    if (ok.ok) {
      expect(ok.value.ride.distance_m).toBe(1500);
      expect(ok.value.course![1]!.gradient).toBe(0);
    }
    expect(
      errorsOf(withChange((r) => (r.course = [{ length_m: 1000, heading_deg: 0, gradient: 0 }])))[0],
    ).toMatch(/^ride.distance_m: must equal the course's length 1000 m/);
  });

  it('keeps heights above the roughness length', () => {
    expect(errorsOf(withChange((r) => (r.wind.roughness_length_m = 0.5))).join('\n')).toMatch(
      /wind.hub_height_m \(the design outer radius\): must be greater than twice wind.roughness_length_m 0.5 m/,
    );
  });

  it('reports broken JSON with its position', () => {
    const p = parseRideFile('{"design": }');
    expect(p.ok).toBe(false);
    if (!p.ok) expect(p.errors[0]).toMatch(/^ride file: invalid JSON at line 1, column 12/);
  });
});
