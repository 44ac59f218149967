/**
 * `coversweep ride RIDE.json`: a wheel design against a baseline on the road. Prints the ride result
 * (JSON) on stdout. Exit codes as for `solve`: 0 success, 1 internal error, 2 invalid input or usage
 * (messages naming the field and the rule on stderr, nothing on stdout).
 */
import { parseRideFile } from '../compute/ride/index';
import { solveRideStudy } from '../compute/study/rideStudy';
import { formatRideTable } from './formatRide';
import { type OutputFormat, outputFormat } from './formatTable';
import { readErrorReason } from './io';
import { parseOptions } from './parseOptions';

export const RIDE_HELP = `Usage: coversweep ride RIDE.json [--format json|table]

Compare a wheel design with a baseline on the road: power at constant speed, time at constant power
over a distance or a course, wind-averaged drag and side force, the yaw angles met, and handling (the
steering moment of a front wheel, the lean and impulse of a gust). Prints the result (JSON, format
"coversweep-ride-result") on stdout. An example: public/examples/ride.json.

Results are estimates from a reduced-order model: allow margin for gusts and lighter riders, and rely on
qualified testing and the competition's rules before riding a design.

Options:
  --format F   json (default): the result document; table: a readable summary (design, baseline,
               difference) with the cautions
  --help       show this help
`;

export interface RideIo {
  stdout: (s: string) => void;
  stderr: (s: string) => void;
  readFile: (p: string) => string;
}

function fail(io: RideIo, headline: string, messages: string[] = []): number {
  io.stderr(`coversweep: error: ${headline}\n`);
  for (const m of messages) io.stderr(`  ${m.trimEnd().replace(/\n/g, '\n  ')}\n`);
  return 2;
}

/** Run `ride` on its arguments (after the command name). Returns the exit code. */
export function runRide(argv: string[], io: RideIo): number {
  let values: { help?: boolean; format?: string };
  let positionals: string[];
  try {
    ({ values, positionals } = parseOptions('ride', {
      args: argv,
      options: { help: { type: 'boolean', short: 'h' }, format: { type: 'string' } },
      allowPositionals: true,
    }));
  } catch (error) {
    return fail(io, error instanceof Error ? error.message : String(error), ['see: coversweep ride --help']);
  }
  if (values.help) {
    io.stdout(RIDE_HELP);
    return 0;
  }
  if (positionals.length === 0) return fail(io, 'ride: missing the ride file argument', [RIDE_HELP]);
  if (positionals.length > 1) {
    return fail(io, `ride: expected one ride file, got ${positionals.length}: ${positionals.join(' ')}`);
  }
  const path = positionals[0]!;
  let format: OutputFormat;
  try {
    format = outputFormat(values.format);
  } catch (error) {
    return fail(io, `ride: ${error instanceof Error ? error.message : String(error)}`);
  }
  let text: string;
  try {
    text = io.readFile(path);
  } catch (error) {
    return fail(io, `cannot read the ride file ${path}: ${readErrorReason(error)}`);
  }
  const parsed = parseRideFile(text);
  if (!parsed.ok) return fail(io, `invalid ride file ${path}:`, parsed.errors);
  let out: string;
  try {
    const result = solveRideStudy(parsed.value);
    out = format === 'table' ? formatRideTable(result) : `${JSON.stringify(result, null, 2)}\n`;
  } catch (error) {
    const detail = error instanceof Error ? (error.stack ?? error.message) : String(error);
    io.stderr(`coversweep: internal error (please report it): ${detail}\n`);
    return 1;
  }
  io.stdout(out);
  return 0;
}
