/** The PNG button of a raster-only figure (the 3D view): its image with the caption block, named after the design. */
import { downloadBlob } from '../download';
import { captionLines } from './captionLines';
import { exportButton } from './exportButton';
import { currentExportMeta } from './exportContext';
import type { ExportMeta } from './exportMeta';

/** A raster-only figure (the 3D view): its PNG, given the caption lines. */
export function rasterExportButton(
  title: string,
  suffix: string,
  png: (caption: string[]) => Promise<Blob>,
  extra?: (meta: ExportMeta) => string[],
): HTMLButtonElement {
  return exportButton('PNG', `Save as PNG (high resolution, with caption): ${title}`, async () => {
    const meta = currentExportMeta();
    downloadBlob(
      `${meta.design.file_stem}-${suffix}.png`,
      await png(captionLines(meta, extra?.(meta) ?? [])),
    );
  });
}
