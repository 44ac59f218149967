export { groundTrailM } from '../wheel/steeringAxis';
export { gustImpulse } from './gustImpulse';
export { leanAngleRad } from './leanAngleRad';
export { type SteeringFeatures, steeringFeatures } from './steeringFeatures';
