/** The data panel's input-uncertainty ranges: read from their inputs, and their defaults for a design. */
import type { UncertainRange } from '../../compute/compare/index';
import type { DataPanelDom } from './dataPanelTypes';

/** The ranges typed (rows left empty are skipped), or the rules they break. */
export function readUncertaintyRanges(dom: DataPanelDom): { ranges: UncertainRange[]; errors: string[] } {
  const ranges: UncertainRange[] = [];
  const errors: string[] = [];
  for (const [name, { min, max }] of dom.rangeInputs) {
    const a = min.value.trim();
    const b = max.value.trim();
    if (a === '' && b === '') continue;
    const lo = Number(a);
    const hi = Number(b);
    if (a === '' || b === '' || !Number.isFinite(lo) || !Number.isFinite(hi) || lo > hi) {
      errors.push(`${name}: give two numbers, lowest first`);
      continue;
    }
    ranges.push({ name, min: lo, max: hi });
  }
  if (ranges.length === 0) errors.push('give at least one range');
  return { ranges, errors };
}

/** The ranges' defaults for the design (density +- 2 %, suction recovery 0.3..0.7), where still empty. */
export function setDefaultRanges(dom: DataPanelDom, rhoKgPerM3: number): void {
  const d = dom.rangeInputs.get('air_density_kgpm3');
  if (d && d.min.value === '' && d.max.value === '') {
    d.min.value = (rhoKgPerM3 * 0.98).toFixed(4);
    d.max.value = (rhoKgPerM3 * 1.02).toFixed(4);
  }
  const s = dom.rangeInputs.get('suction_recovered');
  if (s && s.min.value === '' && s.max.value === '') {
    s.min.value = '0.3';
    s.max.value = '0.7';
  }
}
