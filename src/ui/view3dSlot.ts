/**
 * Where the 3D view (src/ui/view3d, written separately) plugs in. The module is looked up at build
 * time with import.meta.glob, so the page builds and runs (with a note in place of the view) before it
 * exists, and loads it lazily, off the critical path of the first results, once it does.
 */
import type { ViewField } from '../compute/engine/protocol';

export type ViewLayers = Record<string, boolean>;

export interface WheelView {
  update(field: ViewField): void;
  setLayers(layers: Partial<ViewLayers>): void;
  layers(): ViewLayers;
  toPngBlob(minWidthPx?: number): Promise<Blob>;
  dispose(): void;
}

interface View3dModule {
  createWheelView(container: HTMLElement): WheelView;
}

const modules = import.meta.glob<View3dModule>('./view3d/index.ts');

/** The 3D view module's loader, or null when it is not part of this build. */
export function view3dLoader(): (() => Promise<View3dModule>) | null {
  const loader = modules['./view3d/index.ts'];
  return loader ?? null;
}
