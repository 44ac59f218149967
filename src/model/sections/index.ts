export { bladedSpokeDrag } from './bladedSpokeDrag';
export { CYLINDER_RE_RANGE, cylinderDrag } from './cylinderDrag';
export { finiteCylinderDrag } from './finiteCylinderDrag';
export { planeWakeDeficit } from './planeWakeDeficit';
export {
  plateReattachment,
  REATTACHMENT_FULL_RATIO,
  REATTACHMENT_ONSET_RATIO,
} from './plateReattachment';
export { rowWakeTransportSpeed } from './rowWakeTransportSpeed';
export { SPLITTER_PLATE_MAX_RATIO, splitterPlateCylinderDrag } from './splitterPlateCylinderDrag';
export { spokeRowDrag, spokeRowDragAll, spokeRowDragAt } from './spokeRowDrag';
export { spokeSectionDrag } from './spokeSectionDrag';
export { streamlineSectionDrag } from './streamlineSectionDrag';
export { tandemDragRatio } from './tandemDragRatio';
