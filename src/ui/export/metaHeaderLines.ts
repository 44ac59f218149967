/**
 * A table file's header block as `key: value` pairs (CSV comment lines read them as `# key: value`; the
 * JSON metadata holds the same values): what the table is, the design, conditions, model, calibration,
 * units, version and date. Line breaks inside values become spaces, so each pair stays one line.
 */
import type { ExportMeta } from './exportMeta';

export function metaHeaderLines(
  meta: ExportMeta,
  title: string,
  extra: readonly string[] = [],
): Array<[string, string]> {
  const one = (text: string) => text.replace(/[\r\n]+/g, ' ');
  const pairs: Array<[string, string]> = [
    ['table', title],
    ['design', `${meta.design.name} — ${meta.design.summary}`],
    ['conditions', meta.conditions.summary],
    ['model', meta.model.summary],
    [
      'calibrated',
      meta.calibrated ? `CALIBRATED — ${meta.calibration ?? 'model options fitted to data'}` : 'no',
    ],
    ...extra.filter((line) => line.trim() !== '').map((line): [string, string] => ['note', line]),
    ['units', meta.units],
    ['tool', `${meta.tool} ${meta.version}`],
    ['date', meta.date],
  ];
  return pairs.map(([k, v]) => [k, one(v)]);
}
