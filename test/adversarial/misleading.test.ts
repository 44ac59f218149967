/**
 * Numbers that mislead (issue 14, item 10): a ride at a tiny power is solved at its real (slow) speed
 * and flagged, never evaluated at the 40 m/s cap under a false message, and a negative wind-averaged
 * drag area is flagged. (Explicit covers with a fraction, duplicate keys and repeated --out: see
 * hostileFiles.test.ts.)
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { parseRideFile, solveRide } from '../../src/compute/ride/index';
import { family } from './tally';

const misleading = family(
  'CLI: numbers that mislead (ride at tiny powers)',
  'test/adversarial/misleading.test.ts',
);
afterAll(() => misleading.save());

const example = JSON.parse(readFileSync(join(__dirname, '../../public/examples/ride.json'), 'utf8'));

describe('ride at tiny powers', () => {
  it('1 W and 1e-9 W: the real slow speed, flagged as a near standstill; a negative drag area flagged', () => {
    for (const power of [1, 1e-3, 1e-9]) {
      const parsed = parseRideFile(
        JSON.stringify({ ...example, ride: { power_W: power, distance_m: 40000 } }),
      );
      if (!parsed.ok) throw new Error(parsed.errors.join('\n'));
      const doc = solveRide(parsed.value) as unknown as {
        constant_speed_mps: number;
        curve_speed_mps: number;
        flags: string[];
        wind_averaged_cda_m2: { design: number; baseline: number };
      };
      misleading.tried++;
      const flags = doc.flags.join('\n');
      // The still-air speed at 1 W is well under 1 m/s (rolling resistance alone: P / (Crr m g)).
      expect(doc.constant_speed_mps, `${power} W`).toBeLessThan(1);
      expect(doc.curve_speed_mps, `${power} W: curves not solved at the 40 m/s cap`).toBeLessThan(1);
      expect(flags, `${power} W`).not.toMatch(/no still-air steady speed below 40 m\/s/);
      expect(flags, `${power} W`).toMatch(/below the model's 2\.\.40 m\/s range \(a near standstill/);
      for (const wheel of ['design', 'baseline'] as const) {
        if (doc.wind_averaged_cda_m2[wheel] < 0) {
          expect(flags, `${power} W ${wheel}`).toMatch(
            new RegExp(`${wheel}: the wind-averaged drag area is negative`),
          );
        }
      }
    }
    // At an ordinary power nothing of the sort is flagged.
    const normal = parseRideFile(JSON.stringify(example));
    if (!normal.ok) throw new Error(normal.errors.join('\n'));
    const flags = (solveRide(normal.value) as unknown as { flags: string[] }).flags.join('\n');
    misleading.tried++;
    expect(flags).not.toMatch(/near standstill|drag area is negative/);
  }, 60_000);
});
