/**
 * Where exports read the page's state: the app registers its state once (`setExportSource`), and every
 * figure and table button, in any panel, asks `currentExportMeta` at the moment of the click, so a file
 * always describes the design as it is then. A failed export is reported through the page's messages.
 */
import { type ExportMeta, type ExportSource, exportMeta } from './exportMeta';

let source: (() => ExportSource) | null = null;
let report: (what: string, error: Error) => void = (what, error) => console.error(what, error);

export function setExportSource(
  read: () => ExportSource,
  onError?: (what: string, error: Error) => void,
): void {
  source = read;
  if (onError) report = onError;
}

export function currentExportMeta(date = new Date()): ExportMeta {
  if (!source) throw new Error('exports are not ready: the page has not finished starting');
  return exportMeta(source(), date);
}

export function reportExportError(what: string, error: unknown): void {
  report(what, error instanceof Error ? error : new Error(String(error)));
}
