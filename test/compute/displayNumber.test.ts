// Round inputs read back round after a unit conversion. Unit factors exact by definition (NIST SP 811
// B.8): 1 km/h = 1/3.6 m/s, 1 mph = 0.44704 m/s, 1 deg = pi/180 rad.
import { describe, expect, it } from 'vitest';
import { convertedRows } from '../../src/compute/compare/compare';
import { convertTable, pointYawDeg } from '../../src/compute/compare/convertData';
import { parseCsvText } from '../../src/compute/compare/csv';
import { DISPLAY_DIGITS, displayNumber } from '../../src/compute/displayNumber';
import { kmhToMps, mphToMps, mpsToKmh, mpsToMph } from '../../src/compute/units';

describe('displayNumber', () => {
  it('reads a converted round input back round (the raw round trip does not)', () => {
    expect(mpsToKmh(kmhToMps(30))).not.toBe(30); // 30.000000000000004: the slip this fixes
    let rawMisses = 0;
    for (let kmh = 1; kmh <= 200; kmh += 0.5) {
      const back = mpsToKmh(kmhToMps(kmh));
      if (back !== kmh) rawMisses++;
      expect(displayNumber(back), `km/h ${kmh} -> ${back}`).toBe(kmh);
      expect(String(displayNumber(back))).toBe(String(kmh));
      const mph = kmh / 2;
      expect(displayNumber(mpsToMph(mphToMps(mph))), `mph ${mph}`).toBe(mph);
      const yaw = Number(((kmh - 100) / 10).toFixed(2)); // as typed: -9.9 .. 10
      expect(displayNumber((((yaw * Math.PI) / 180) * 180) / Math.PI), `yaw ${yaw}`).toBe(yaw);
    }
    expect(rawMisses).toBeGreaterThan(0);
  });
  it('keeps a value typed with up to 12 significant digits, and zero, NaN and infinities', () => {
    expect(DISPLAY_DIGITS).toBe(12);
    for (const x of [0.1, 1.23456789012, -987654.321098, 6.02214076e23, 1e-300])
      expect(displayNumber(x)).toBe(x);
    expect(displayNumber(0)).toBe(0);
    expect(displayNumber(Number.NaN)).toBeNaN();
    expect(displayNumber(Number.POSITIVE_INFINITY)).toBe(Number.POSITIVE_INFINITY);
    expect(displayNumber(1 / 3, 3)).toBe(0.333);
    expect(() => displayNumber(1, 0)).toThrow(RangeError);
  });
});

describe('compare echoes the yaw as typed', () => {
  it('a yaw given in degrees comes back exactly; one given in radians comes back rounded', () => {
    const table = parseCsvText('yaw,yawrad,drag\n15,0.2617993877991494,1\n7.5,0.1308996938995747,1\n');
    if (!table.ok) throw new Error(table.errors.join());
    const map = (col: string, unit: 'deg' | 'rad') => ({
      format: 'coversweep-map' as const,
      version: 1 as const,
      columns: {
        [col]: { quantity: 'yaw_deg' as const, unit },
        drag: { quantity: 'axial_force' as const, unit: 'N' as const },
      },
      side_force_sign: 1 as const,
      airspeed_mps: 10,
    });
    const deg = convertTable(table.value, map('yaw', 'deg'), 1.2);
    if (!deg.ok) throw new Error(deg.errors.join());
    expect(((15 * Math.PI) / 180) * (180 / Math.PI)).not.toBe(15);
    expect(convertedRows(deg.value).map((r) => r.yaw_deg)).toEqual([15, 7.5]);
    const rad = convertTable(table.value, map('yawrad', 'rad'), 1.2);
    if (!rad.ok) throw new Error(rad.errors.join());
    expect(rad.value.points.map(pointYawDeg)).toEqual([15, 7.5]);
  });
});
