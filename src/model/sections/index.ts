export { bladedSpokeDrag } from './bladedSpokeDrag';
export { CYLINDER_RE_RANGE, cylinderDrag } from './cylinderDrag';
export {
  PLANE_WAKE_DEFICIT_CONSTANT,
  PLANE_WAKE_WIDTH_CONSTANT,
  planeWakeDeficit,
} from './planeWakeDeficit';
export { planeWakeHalfWidthM } from './planeWakeHalfWidthM';
export { planeWakeProfile } from './planeWakeProfile';
export { spokeRowDrag } from './spokeRowDrag';
export { spokeSectionDrag } from './spokeSectionDrag';
export { streamlineSectionDrag } from './streamlineSectionDrag';
export { tandemDragRatio } from './tandemDragRatio';
