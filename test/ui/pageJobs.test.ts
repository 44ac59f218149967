// The page's ride task (src/compute/study/rideJob.ts, on the pool's task workers) and comparison job:
// a ride evaluated from cached yaw curves equals the same ride solved afresh and the command line's
// solveRide (exactly: the same code on the same numbers), and a comparison never throws.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseCaseFile } from '../../src/compute/caseFile';
import { parseCsvText } from '../../src/compute/compare/csv';
import { parseMapFile } from '../../src/compute/compare/mapFile';
import { compareJob } from '../../src/compute/engine/pageJobs';
import { parseRideFile, solveRide } from '../../src/compute/ride/index';
import { rideCurvesKey, solveRideJob } from '../../src/compute/study/rideJob';

const ROOT = join(__dirname, '../..');

describe('page jobs', () => {
  it('reuses the yaw curves when only the wind changes, with the same result as solving afresh', () => {
    const parsed = parseRideFile(readFileSync(join(ROOT, 'public/examples/ride.json'), 'utf8'));
    if (!parsed.ok) throw new Error(parsed.errors.join('; '));
    const ride = parsed.value;
    const first = solveRideJob({ ride });
    expect(first.curvesReused).toBe(false);
    expect(first.document).toEqual(solveRide(ride));
    const windier = { ...ride, wind: { ...ride.wind, speed_mps: 7 } };
    expect(rideCurvesKey(windier)).toBe(rideCurvesKey(ride));
    const second = solveRideJob({ ride: windier });
    expect(second.curvesReused).toBe(true);
    expect(second.document).toEqual(solveRide(windier));
    // A different design needs new curves.
    const deeper = { ...ride, design: { ...ride.design, rim_depth_m: 0.08 } };
    expect(rideCurvesKey(deeper)).not.toBe(rideCurvesKey(ride));
  });

  it('turns a comparison that cannot be made into messages, never an exception', () => {
    const c = parseCaseFile(readFileSync(join(ROOT, 'public/demo/demo-case.json'), 'utf8'));
    const m = parseMapFile(readFileSync(join(ROOT, 'public/demo/demo-map.json'), 'utf8'));
    const t = parseCsvText('Yaw [deg],Drag [g]\n0,12\n');
    if (!c.ok || !m.ok || !t.ok) throw new Error('demo files unreadable');
    const r = compareJob({ caseFile: c.value, table: t.value, map: m.value, dataLabel: 'x.csv' });
    expect(r.ok).toBe(false);
    expect(!r.ok && r.errors[0]).toMatch(/no column "Speed \[km\/h\]" in the data file/);
  });
});
