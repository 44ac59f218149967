/**
 * The ride objectives: every one is minimised. To add one, write a file exporting a RideObjective and
 * append it here (the study file, the command line's columns and the page's pickers read this list).
 */
import type { RideObjective } from '../types';
import { j1252AxialN } from './j1252AxialN';
import { leanGustDeg } from './leanGustDeg';
import { powerW } from './powerW';
import { sideGustN } from './sideGustN';
import { sideP90N } from './sideP90N';
import { steeringGustNm } from './steeringGustNm';
import { timeS } from './timeS';
import { windAxialN } from './windAxialN';

export const OBJECTIVES: readonly RideObjective[] = [
  timeS,
  powerW,
  windAxialN,
  j1252AxialN,
  sideP90N,
  sideGustN,
  steeringGustNm,
  leanGustDeg,
];

/** The objective of an id, or undefined. */
export function rideObjective(id: string): RideObjective | undefined {
  return OBJECTIVES.find((o) => o.id === id);
}
