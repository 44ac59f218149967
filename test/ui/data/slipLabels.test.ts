// The data panel's slip messages name its controls, not the map file's keys: a comparison run the way
// the panel runs it (runComparison with DATA_SLIP_LABELS, the labels its DOM is built from) on data
// made from the model with a flipped side-force sign and newtons logged as grams-force names the
// "Side force sign" control with what -1 means on it, and the "Unit" column, and never the file keys.
import { describe, expect, it } from 'vitest';
import { type MapFile, parseCsvText, runComparison } from '../../../src/compute/compare/index';
import { DATA_SLIP_LABELS, MAPPING_LABELS, UNIT_TEXT } from '../../../src/ui/data/dataLabels';
import { gridPoints, testCase, truthAt } from '../../compute/compare/helpers';

describe('slip messages on the data panel', () => {
  it('speak the panel’s control labels', () => {
    const caseFile = testCase();
    const points = gridPoints([8.33, 13.9]);
    const truth = truthAt(caseFile, points);
    let csv = 'yaw,speed,drag,side\n';
    points.forEach((p, i) => {
      const t = truth[i]!;
      // Drag logged in grams-force but mapped as N; side force of the mirrored sign.
      csv += `${(p.yawRad * 180) / Math.PI},${p.airspeedMps},${(t.axialN / 9.80665) * 1000},${-t.sideN}\n`;
    });
    const table = parseCsvText(csv);
    if (!table.ok) throw new Error(table.errors.join());
    const map: MapFile = {
      format: 'coversweep-map',
      version: 1,
      columns: {
        yaw: { quantity: 'yaw_deg', unit: 'deg' },
        speed: { quantity: 'speed', unit: 'mps' },
        drag: { quantity: 'axial_force', unit: 'N' },
        side: { quantity: 'side_force', unit: 'N' },
      },
      side_force_sign: 1,
      air_density_kgpm3: 1.2,
    };
    const r = runComparison({
      caseFile,
      table: table.value,
      map,
      dataLabel: 't.csv',
      slipLabels: DATA_SLIP_LABELS,
    });
    if (!r.ok) throw new Error(r.errors.join('; '));
    const messages = r.value.flags.map((f) => f.message);
    const all = messages.join('\n');
    const sign = messages.find((m) => m.includes('side force falls as yaw rises'));
    expect(sign, all).toContain(
      `set “${MAPPING_LABELS.sideForceSign}” (1 = “${MAPPING_LABELS.sideForceLeft}”, -1 = “${MAPPING_LABELS.sideForceRight}”) to -1`,
    );
    const unit = messages.find((m) => m.includes('grams-force'));
    expect(unit, all).toContain(
      `“${MAPPING_LABELS.unit}” (in “What each column holds”) to "${UNIT_TEXT.gf}"`,
    );
    // The factor is the one of grams-force read as newtons: 1000 / 9.80665 = 101.97 (not 9.81, kgf's).
    expect(unit, all).toMatch(/factor 102\b/);
    expect(all).not.toMatch(/side_force_sign|set its unit |"gf"/);
  });
});
