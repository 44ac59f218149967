export { mulberry32 } from './mulberry32';
export { uniformInRange } from './uniformInRange';
