/**
 * Default lattice resolution of the wheel's disc (strips across, panels along each strip).
 * Chosen from the measured convergence of the solid disc's side-force slope (see
 * test/model/lattice/solveLattice.test.ts): with the ground image, 24 x 12 (n = 288) is within
 * 0.2 % of the refined limit (about 2.564 per rad); without ground within 0.1 % of Kinner's exact
 * 1.790 per rad. 20 x 8 (n = 160) would already meet 0.5 %; the margin buys a centre of pressure
 * within about 1.5 % of R of its limit and a finer sampling of cover and rim annuli, at about
 * 7-10 ms per assembly + factorisation and 4-7 ms per build on the
 * development machine (bench/lattice.bench.ts).
 */
export const DEFAULT_SPAN_COUNT = 24;
export const DEFAULT_CHORD_COUNT = 12;
