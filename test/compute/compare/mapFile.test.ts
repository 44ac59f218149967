import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCsvText } from '../../../src/compute/compare/csv';
import { guessMap, splitHeader } from '../../../src/compute/compare/guessMap';
import { parseMapFile } from '../../../src/compute/compare/mapFile';

const base = {
  format: 'coversweep-map',
  version: 1,
  columns: { yaw: { quantity: 'yaw_deg', unit: 'deg' }, drag: { quantity: 'axial_force', unit: 'gf' } },
  side_force_sign: 1,
  airspeed_mps: 13.9,
};

describe('parseMapFile', () => {
  it('accepts the demo map and a minimal one', () => {
    const demo = parseMapFile(readFileSync('public/demo/demo-map.json', 'utf8'));
    expect(demo.ok, JSON.stringify(demo)).toBe(true);
    expect(parseMapFile(JSON.stringify(base)).ok).toBe(true);
  });

  it('names the key path, the value and the rule', () => {
    const bad = (patch: object) => {
      const r = parseMapFile(JSON.stringify({ ...base, ...patch }));
      expect(r.ok).toBe(false);
      return r.ok ? [] : r.errors;
    };
    expect(bad({ version: 2 })[0]).toMatch(/^version: unsupported map-file version 2/);
    expect(bad({ side_force_sign: 2 })[0]).toMatch(/^side_force_sign: must be 1 or -1, got 2/);
    expect(bad({ colour: 'red' })[0]).toMatch(/^colour: unknown key \(allowed here/);
    expect(bad({ side_force_sing: -1 })[0]).toMatch(
      /^side_force_sing: unknown key \(did you mean side_force_sign\?\)/,
    );
    expect(bad({ columns: { yaw: { quantity: 'yaw_deg', unit: 'deg', unti: 'x' } } })[0]).toMatch(
      /^columns\.yaw\.unti: unknown key \(did you mean columns\.yaw\.unit\?\)/,
    );
    expect(
      bad({
        columns: { yaw: { quantity: 'yaw_deg', unit: 'deg' }, drag: { quantity: 'axial_force', unit: 'm2' } },
      })[0],
    ).toMatch(
      /^columns\.drag\.unit: must be one of "N", "gf", "kgf", "lbf" for quantity "axial_force", got "m2"/,
    );
    expect(
      bad({
        columns: {
          yaw: { quantity: 'yaw_deg', unit: 'deg' },
          cd: { quantity: 'drag_coefficient', unit: '1' },
        },
      })[0],
    ).toMatch(/^columns\.cd\.reference_area_m2: is required/);
    expect(bad({ columns: { yaw: { quantity: 'spin', unit: 'deg' } } })[0]).toMatch(
      /^columns\.yaw\.quantity: must be one of/,
    );
    expect(bad({ airspeed_mps: undefined }).join()).toMatch(/airspeed_mps: is required when no column/);
    expect(parseMapFile('{"format": ').ok).toBe(false);
  });
});

describe('guessMap', () => {
  it('reads units from headers', () => {
    expect(splitHeader('Drag [g]')).toEqual({ name: 'Drag', unit: 'gf' });
    expect(splitHeader('side (lbf)')).toEqual({ name: 'side', unit: 'lbf' });
    expect(splitHeader('CdA_cm2')).toEqual({ name: 'CdA', unit: 'cm2' });
    expect(splitHeader('speed in km/h')).toEqual({ name: 'speed', unit: 'kmh' });
  });

  it('guesses the demo file exactly as its map, with notes to confirm', () => {
    const t = parseCsvText(readFileSync('public/demo/demo-tunnel.csv', 'utf8'));
    if (!t.ok) throw new Error(t.errors.join());
    const g = guessMap(t.value.headers, t.value, { referenceAreaM2: 0.35 });
    const demo = JSON.parse(readFileSync('public/demo/demo-map.json', 'utf8'));
    expect(g.map.columns).toEqual(demo.columns);
    expect(g.notes.some((n) => /side_force_sign 1 assumed/.test(n))).toBe(true);
  });

  it('falls back on value size when the header has no unit, and says so', () => {
    const t = parseCsvText('beta,drag,Cs,Cd\n0,250,0.05,0.03\n10,230,0.04,0.02\n');
    if (!t.ok) throw new Error(t.errors.join());
    const g = guessMap(t.value.headers, t.value, { referenceAreaM2: 0.35, airspeedMps: 13.9 });
    expect(g.map.columns.drag).toEqual({ quantity: 'axial_force', unit: 'gf' });
    expect(g.notes.join('\n')).toMatch(/"drag": axial_force; no unit in the header, assumed gf/);
    expect(g.map.columns.Cs!.quantity).toBe('side_coefficient');
    expect(g.map.columns.Cs!.reference_area_m2).toBe(0.35);
    // A second drag column is not used twice: the later one is ignored, and the note says so.
    expect(g.map.columns.Cd!.quantity).toBe('ignore');
    expect(g.notes.join('\n')).toMatch(/"Cd": looks like the same quantity as "drag"/);
  });
});
