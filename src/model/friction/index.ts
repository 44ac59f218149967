export { flatPlateFriction } from './flatPlateFriction';
export { flatPlateTransitionConstant } from './flatPlateTransitionConstant';
export { laminarFlatPlateFriction } from './laminarFlatPlateFriction';
export { prandtlSchlichtingFriction } from './prandtlSchlichtingFriction';
export { rotatingDiscMomentCoefficient } from './rotatingDiscMomentCoefficient';
export type { RotatingDiscInput, RotatingDiscTorque } from './rotatingDiscTorque';
export { rotatingDiscTorque } from './rotatingDiscTorque';
export { turbulentFlatPlateFriction } from './turbulentFlatPlateFriction';
