export { bladedSpokeDrag } from './bladedSpokeDrag';
export { CYLINDER_RE_RANGE, cylinderDrag } from './cylinderDrag';
export { streamlineSectionDrag } from './streamlineSectionDrag';
