/** The 3D view's public types and what every layer builder is handed. */
import type { Group } from 'three';
import type { ViewField } from '../../compute/engine/protocol';

export interface ViewLayers {
  wheel: boolean;
  loading: boolean;
  wake: boolean;
  streamlines: boolean;
  ground: boolean;
  forces: boolean;
  steeringAxis: boolean;
}

export interface WheelView {
  /** The WebGL canvas (preserveDrawingBuffer: its pixels can be read back after a render). */
  readonly canvas: HTMLCanvasElement;
  /** Draw a new field (replaces the previous one); the camera keeps its place. */
  update(field: ViewField): void;
  setLayers(partial: Partial<ViewLayers>): void;
  layers(): ViewLayers;
  /** Put the camera back to its starting place, framing the current wheel. */
  resetCamera(): void;
  /** Render now (synchronously); normally renders happen on demand by themselves. */
  render(): void;
  /** The view as a PNG: the 3D image with the colour legend and the force values drawn onto it. */
  toPngBlob(minWidthPx?: number): Promise<Blob>;
  dispose(): void;
}

export const DEFAULT_LAYERS: Readonly<ViewLayers> = Object.freeze({
  wheel: true,
  loading: true,
  wake: true,
  streamlines: true,
  ground: true,
  forces: true,
  steeringAxis: true,
});

export const LAYER_LABELS: Record<keyof ViewLayers, string> = {
  wheel: 'Wheel',
  loading: 'Loading (ΔCp)',
  wake: 'Wake',
  streamlines: 'Streamlines',
  ground: 'Ground',
  forces: 'Forces',
  steeringAxis: 'Steering axis',
};

/** What the legend shows, filled in by the layers as they are built. */
export interface LegendInfo {
  limit: number;
  saturatedLow: boolean;
  saturatedHigh: boolean;
  /** Newtons per metre of force arrow. */
  nPerM: number;
  side: number;
  axial: number;
}

/** What a layer builder draws into: one group per layer, the always-shown cues, labels, the legend. */
export interface LayerScene {
  groups: Record<keyof ViewLayers, Group>;
  /** Travel and wind arrows: always shown. */
  cues: Group;
  addLabel(text: string, at: [number, number, number], layer: keyof ViewLayers | null, colour?: string): void;
  legend: LegendInfo;
}

/** Builds one layer of a field into the scene. */
export type LayerBuilder = (f: ViewField, s: LayerScene) => void;
