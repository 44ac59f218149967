// The "On the road" inputs in the page's state: defaults, the ride file built from them (checked by the
// ride file's own rules), messages mapped to the inputs, and the optional state sections (road inputs,
// calibration mark) through link and project file. Exact comparisons (no tolerance): these are data
// transformations, not arithmetic, except the unit conversions, checked to 1 ulp-scale tolerances.
import { describe, expect, it } from 'vitest';
import { validateCase } from '../../src/compute/caseFile';
import { RIDE_DEFAULTS } from '../../src/compute/ride/rideFile';
import {
  type AppState,
  hashToState,
  projectTextToState,
  stateToHash,
  stateToProjectText,
} from '../../src/ui/appState';
import { textToBase64Url } from '../../src/ui/base64url';
import {
  caseAirKeys,
  defaultRoad,
  rideMessageField,
  roadToRideRaw,
  validateRoadFor,
  validateRoadShape,
} from '../../src/ui/roadState';
import { defaultView } from '../../src/ui/viewState';

function design() {
  const c = validateCase({
    name: 'Road test wheel',
    wheel: { cover: { fraction: 1, placement: 'rim', sides: 2 } },
    conditions: { airspeed_mps: 12, yaw_deg: [0, 10], temperature_c: 25, pressure_pa: 95000 },
  });
  if (!c.ok) throw new Error(c.errors.join('; '));
  return c.value;
}

describe('road inputs -> ride file', () => {
  it('the defaults make a valid ride of the design against an uncovered wheel', () => {
    const d = design();
    const baseline = { ...d.wheel, cover: { fraction: 0, placement: 'rim' as const, sides: 2 as const } };
    const r = validateRoadFor(defaultRoad(), d, baseline);
    expect(r.ok, !r.ok ? r.errors.join('; ') : '').toBe(true);
    if (!r.ok) return;
    expect(r.value.design).toEqual(d.wheel);
    expect(r.value.baseline).toEqual(baseline);
    expect(r.value.ride).toEqual({ power_W: 250, distance_m: 40000, gradient: 0 });
    expect(r.value.rider.drivetrain_efficiency).toBe(RIDE_DEFAULTS.drivetrain_efficiency);
    // The design's air, steering and model; the ride's lattice solves skip the GCI study.
    expect(r.value.air).toEqual({ temperature_c: 25, pressure_pa: 95000, relative_humidity: 0 });
    expect(r.value.steering).toEqual(d.steering);
    expect(r.value.model.grid_convergence).toBe(false);
    expect(r.value.wind.direction_deg).toBe('uniform');
    expect(r.value.course).toBeUndefined();
  });

  it('builds a course, constant speed, a Weibull wind from one direction and its own weather', () => {
    const d = design();
    const road = defaultRoad();
    road.mode = 'speed';
    road.speed_mps = 11;
    road.use_course = true;
    road.wind = {
      ...road.wind,
      kind: 'weibull',
      shape: 2.2,
      scale_mps: 5,
      direction: 'fixed',
      direction_deg: 225,
    };
    road.air = 'own';
    road.temperature_c = 5;
    road.altitude_m = 800;
    road.relative_humidity = 0.7;
    const raw = roadToRideRaw(road, d, d.wheel);
    expect(raw.ride).toEqual({ speed_mps: 11 });
    expect(raw.wind).toEqual({
      direction_deg: 225,
      reference_height_m: RIDE_DEFAULTS.reference_height_m,
      roughness_length_m: RIDE_DEFAULTS.roughness_length_m,
      distribution: { type: 'weibull', shape: 2.2, scale_mps: 5 },
    });
    expect(raw.air).toEqual({ temperature_c: 5, altitude_m: 800, relative_humidity: 0.7 });
    const r = validateRoadFor(road, d, d.wheel);
    expect(r.ok, !r.ok ? r.errors.join('; ') : '').toBe(true);
    if (!r.ok) return;
    expect(r.value.course?.length).toBe(4);
    expect(r.value.ride.distance_m).toBe(40000);
  });

  it("passes a given density through as the design's air", () => {
    const c = validateCase({ conditions: { airspeed_mps: 10, yaw_deg: 0, air_density_kgpm3: 1.1 } });
    if (!c.ok) throw new Error(c.errors.join('; '));
    expect(caseAirKeys(c.value.conditions)).toEqual({ air_density_kgpm3: 1.1, temperature_c: 15 });
  });

  it('refuses out-of-range inputs by the ride rules and names the input each message is about', () => {
    const d = design();
    const road = defaultRoad();
    road.rider.mass_kg = 5;
    road.wind.speed_mps = 45;
    road.use_course = true;
    road.course[1] = { ...road.course[1]!, length_m: -3 };
    const r = validateRoadFor(road, d, d.wheel);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    const fields = r.errors.map((m) => rideMessageField(m, road));
    expect(r.errors).toContain(
      'rider.mass_kg: must be a number at least 20 and at most 300 kg (rider and bike), got 5',
    );
    expect(fields).toContain('rider.mass_kg');
    expect(fields).toContain('wind.speed_mps');
    expect(fields).toContain('course[1].length_m');
    // A wheel message is about no road input.
    expect(rideMessageField('design.rim_depth_m: must be ...', road)).toBeNull();
    expect(rideMessageField('ride: must give exactly one of power_W ...', road)).toBe('power_W');
  });

  it('fills missing keys with defaults and rejects unknown keys and wrong types', () => {
    expect(validateRoadShape({})).toEqual({ ok: true, value: defaultRoad() });
    const partial = validateRoadShape({ rider: { mass_kg: 70 } });
    expect(partial.ok && partial.value.rider).toEqual({ ...defaultRoad().rider, mass_kg: 70 });
    const bad = validateRoadShape({ rider: { mass: 70 }, mode: 'fast', power_W: '300' });
    expect(!bad.ok && bad.errors).toEqual([
      'road.rider: unknown key(s) mass',
      'road.mode: must be one of "power", "speed", got "fast"',
      'road.power_W: must be a finite number, got "300"',
    ]);
  });
});

describe('optional state sections', () => {
  function state(): AppState {
    const road = defaultRoad();
    road.power_W = 320;
    return {
      case: design(),
      view: defaultView(),
      baseline: null,
      road,
      calibration: {
        data: 'tunnel <b>run</b>.csv',
        points: 30,
        values: { porosity_scale: 1.2, suction_recovered: 0.4 },
        original: { porosity_scale: 1, suction_recovered: 0.5 },
      },
    };
  }

  it('round-trip through the link and the project file', () => {
    const s = state();
    expect(hashToState(stateToHash(s))).toEqual({ ok: true, value: s });
    expect(projectTextToState(stateToProjectText(s))).toEqual({ ok: true, value: s });
  });

  it('are optional: a state written before them reads as before', () => {
    const s = state();
    const old = { v: 1, case: s.case, view: s.view, baseline: null };
    const r = hashToState(`#s=${textToBase64Url(JSON.stringify(old))}`);
    expect(r).toEqual({ ok: true, value: { case: s.case, view: s.view, baseline: null } });
  });

  it('are validated: a road input out of range or a malformed mark is refused with its field', () => {
    const s = state();
    s.road!.rider.crr = 0.5;
    const r = projectTextToState(stateToProjectText(s), 'p.json');
    expect(!r.ok && r.errors).toEqual([
      'p.json: road: rider.crr: must be a number at least 0 and at most 0.05, got 0.5',
    ]);
    const t = state();
    const raw = JSON.parse(stateToProjectText(t));
    raw.calibration.values.porosity_scale = 'big';
    const r2 = projectTextToState(JSON.stringify(raw), 'p.json');
    expect(r2.ok).toBe(false);
    expect(!r2.ok && r2.errors[0]).toMatch(/^p\.json: calibration\.values\.porosity_scale: /);
  });
});
