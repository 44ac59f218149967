/**
 * The cautions shown wherever ride and handling figures are (page, command line, README). One list so
 * every face says the same thing.
 */
export const RIDE_CAUTIONS: readonly string[] = [
  "These are estimates from a reduced-order model, not measurements: the wheel forces, the wind model and the rider model each carry errors of several percent or more, and crosswind loads beyond about 30 deg of yaw are outside the model's trusted range.",
  'Allow a margin for gusts, which can be stronger and more sudden than the gust factor used here, and for lighter riders, whom the same side force leans and pushes further.',
  'Follow the rules of your competition on wheel covers and deep or disc front wheels, and have any design tested by qualified people (wind tunnel, controlled riding) before anyone rides it on the road.',
];
