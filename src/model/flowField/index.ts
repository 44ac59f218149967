export { convectWake } from './convectWake';
export { panelCorners } from './panelCorners';
export { panelPressureJump } from './panelPressureJump';
export { traceStreamline } from './traceStreamline';
export { trailingVortices } from './trailingVortices';
