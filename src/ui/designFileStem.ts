/**
 * The stem of an exported file's name, following the current design: the design's own name, except
 * that the demo's name is kept only while the design is the demo; a demo edited without renaming is
 * named by what it is now (rim depth and covered fraction), so its exports are not filed as the demo.
 */
import type { CaseFile } from '../compute/caseFile';
import { defaultCase } from './defaultCase';
import { safeFileStem } from './download';

export function designFileStem(c: CaseFile): string {
  const demo = defaultCase();
  if (c.name !== demo.name) return safeFileStem(c.name, 'coversweep');
  if (JSON.stringify(c) === JSON.stringify(demo)) return safeFileStem(demo.name, 'coversweep');
  const depthMm = Number((c.wheel.rim_depth_m * 1000).toPrecision(6));
  const coverPct = Number((c.wheel.cover.fraction * 100).toPrecision(6));
  return safeFileStem(`design-rim-${depthMm}mm-cover-${coverPct}pct`, 'coversweep');
}
