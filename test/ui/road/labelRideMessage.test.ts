// Road-form messages speak the form's labels, not the ride file's keys: the ride rules' own messages for
// out-of-range inputs are relabelled with the label of the field each belongs to (read from the form's
// field list, so a renamed label follows), and keep their rule. Messages about no form field keep their key.
import { describe, expect, it } from 'vitest';
import { validateCase } from '../../../src/compute/caseFile';
import { labelRideMessage } from '../../../src/ui/road/labelRideMessage';
import { RIDE_FIELD_GROUPS } from '../../../src/ui/road/rideFieldGroups';
import { WEATHER_FIELD_GROUPS } from '../../../src/ui/road/weatherFieldGroup';
import { defaultRoad, validateRoadFor } from '../../../src/ui/roadState';

const GROUPS = [...RIDE_FIELD_GROUPS, ...WEATHER_FIELD_GROUPS];
const labelOf = (key: string) => GROUPS.flatMap((g) => g.fields).find((f) => f.key === key)?.label;

describe('labelRideMessage', () => {
  it('replaces the file key of each refused road input by its label and keeps the rule', () => {
    const c = validateCase({ conditions: { airspeed_mps: 12, yaw_deg: [0, 10] } });
    if (!c.ok) throw new Error(c.errors.join('; '));
    const road = defaultRoad();
    road.mode = 'power';
    road.power_W = -10;
    road.rider.mass_kg = 5;
    road.wind.speed_mps = 45;
    const r = validateRoadFor(road, c.value, c.value.wheel);
    if (r.ok) throw new Error('expected the ride rules to refuse these inputs');
    const shown = r.errors.map((m) => labelRideMessage(m, road, GROUPS));
    for (const [key, fileKey] of [
      ['power_W', 'ride.power_W'],
      ['rider.mass_kg', 'rider.mass_kg'],
      ['wind.speed_mps', 'wind.speed_mps'],
    ] as const) {
      const original = r.errors.find((m) => m.startsWith(`${fileKey}:`));
      const label = labelOf(key);
      expect(original, `a message for ${fileKey} among ${JSON.stringify(r.errors)}`).toBeDefined();
      expect(label, `a form label for ${key}`).toBeDefined();
      const expected = `${label}: ${original!.slice(fileKey.length + 1).trimStart()}`;
      expect(shown, `shown messages; input ${original}`).toContain(expected);
    }
    expect(shown.join('\n')).not.toMatch(/ride\.power_W|rider\.mass_kg|wind\.speed_mps/);
  });

  it('keeps the key of a message about no form field', () => {
    const road = defaultRoad();
    const m = 'design.rim_depth_m: must be a number between 0 and 1 m, got 2';
    expect(labelRideMessage(m, road, GROUPS)).toBe(m);
  });
});
