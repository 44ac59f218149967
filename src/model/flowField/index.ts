export { convectWake } from './convectWake';
export { packLatticeVortices } from './packLatticeVortices';
export { panelCorners } from './panelCorners';
export { panelPressureJump } from './panelPressureJump';
export { planarVortexVelocity } from './planarVortexVelocity';
export { traceStreamline } from './traceStreamline';
export { trailingVortices } from './trailingVortices';
export type { PlanarVortexSet } from './types';
