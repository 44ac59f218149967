/**
 * The caption block drawn under every exported figure (and written as the header of table files): the
 * design, the conditions, the model options, CALIBRATED when a calibrated model is in use, lines the
 * figure adds (e.g. the ride or the map's yaw), then the tool's version and the date.
 */
import type { ExportMeta } from './exportMeta';

export function captionLines(meta: ExportMeta, extra: readonly string[] = []): string[] {
  const lines = [
    `Design: ${meta.design.name} — ${meta.design.summary}`,
    `Conditions: ${meta.conditions.summary}`,
    `Model: ${meta.model.summary}`,
  ];
  if (meta.calibrated) lines.push(`CALIBRATED: ${meta.calibration ?? 'model options fitted to data'}`);
  for (const line of extra) if (line.trim() !== '') lines.push(line);
  lines.push(
    `${meta.tool} ${meta.version} · exported ${meta.date.slice(0, 10)} ${meta.date.slice(11, 16)} UTC · reduced-order model estimates`,
  );
  return lines;
}
