/**
 * `coversweep optimise STUDY.json`: the best design wheel for a ride within handling limits. Writes the
 * study result (JSON, format "coversweep-study-result") and the table of designs (CSV) atomically to
 * --json and --csv, or the JSON on stdout; progress on stderr. Exit codes: 0 success, 1 internal error,
 * 2 invalid input or usage (messages naming the field and the rule; nothing on stdout, no file written).
 */
import { resolve } from 'node:path';
import { parseArgs } from 'node:util';
import { optimiseStudy, parseStudyFile, studyCsv, studyDocument } from '../compute/design/index';
import { checkJsonFileSize, MAX_JSON_FILE_BYTES } from '../compute/fileVersion';
import { exampleStudy } from './examples';
import { CliInputError, type CliIo, EXIT_OK, readErrorReason } from './io';
import { AtomicFile, checkOutputPath } from './outputFile';
import { InputFileError, readInputFile } from './readInputFile';
import { refuseRepeatedOptions } from './refuseRepeatedOptions';

export const OPTIMISE_HELP = `Usage: coversweep optimise STUDY.json [--json RESULT.json] [--csv DESIGNS.csv] [--force]
       coversweep optimise --example

Find the design wheel that minimises a ride objective (time over the ride, pedal power, wind-averaged
axial drag, side force, steering moment or lean in the design gust) over the design variables the study
frees (cover fraction, rim depth, tyre width; cover sides and placement, spoke count and section),
within the handling limits it states. Reports the optimum with its lattice uncertainty and savings
against the ride's baseline, and the trade-off front of the objective against a handling figure.

Study file (JSON): {"format": "coversweep-study", "version": 1, "ride": {a ride file's object},
  "variables": {"cover_fraction": {"min": 0, "max": 1}, "rim_depth_m": {"min": 0.03, "max": 0.09},
                "cover_sides": [1, 2]},
  "objective": "time_s", "limits": {"steering_gust_Nm": 2.5},
  "search": {"grid_points": 5, "starts": 3, "max_evaluations": 200, "tolerance": 0.002,
             "lattice_span": 12, "lattice_chord": 6},
  "front": {"handling": "steering_gust_Nm", "limit_steps": 3}}
  search.method "grid" evaluates the grid alone (brute force; grid_points may be per variable,
  {"cover_fraction": 6, "rim_depth_m": 4}); "nelder-mead" (the default) searches on from it.
An example: coversweep optimise --example (also public/examples/study.json).

Options:
  --json FILE   write the result document to FILE (without --json or --csv it goes to stdout)
  --csv FILE    write the table of evaluated designs to FILE
  --force       allow --json and --csv to replace existing files
  --example     print the example study file
  --help        show this help

Handling limits have no defaults. Results are estimates from a reduced-order model: allow margin for
gusts and lighter riders, and rely on qualified testing and the competition's rules before riding a
design.
`;

/** Evaluations of the budget on stderr: a redrawn bar on a terminal, else a line at each 10 % step. */
function optimiseProgress(io: CliIo): (done: number, budget: number) => void {
  const start = Date.now();
  let lastStep = -1;
  return (done, budget) => {
    const fraction = Math.min(1, done / budget);
    const text = `${done} designs evaluated (budget ${budget}), ${((Date.now() - start) / 1000).toFixed(1)} s`;
    if (io.stderrIsTTY) {
      const filled = Math.round(fraction * 30);
      io.stderr(`\roptimise [${'#'.repeat(filled)}${'.'.repeat(30 - filled)}] ${text}\x1b[K`);
      return;
    }
    const step = Math.floor(fraction * 10);
    if (step > lastStep) {
      lastStep = step;
      io.stderr(`optimise: ${text}\n`);
    }
  };
}

function readStudy(path: string, io: CliIo): string {
  try {
    return readInputFile(resolve(io.cwd, path), MAX_JSON_FILE_BYTES, (bytes) =>
      checkJsonFileSize(bytes, 'study file'),
    );
  } catch (error) {
    if (error instanceof InputFileError && error.whole) throw new CliInputError(error.message);
    throw new CliInputError(`cannot read the study file ${path}: ${readErrorReason(error)}`);
  }
}

/** Run `optimise` on its arguments (after the command name). Returns the exit code. */
export function runOptimise(argv: string[], io: CliIo): number {
  refuseRepeatedOptions('optimise', argv, ['json', 'csv']);
  let parsedArgs: ReturnType<typeof parse>;
  function parse() {
    return parseArgs({
      args: argv,
      options: {
        json: { type: 'string' },
        csv: { type: 'string' },
        force: { type: 'boolean' },
        example: { type: 'boolean' },
        help: { type: 'boolean', short: 'h' },
      },
      allowPositionals: true,
    });
  }
  try {
    parsedArgs = parse();
  } catch (error) {
    throw new CliInputError(`optimise: ${error instanceof Error ? error.message : String(error)}`, [
      'see: coversweep optimise --help',
    ]);
  }
  const { values, positionals } = parsedArgs;
  if (values.help) {
    io.stdout(OPTIMISE_HELP);
    return EXIT_OK;
  }
  if (values.example) {
    if (positionals.length > 0)
      throw new CliInputError(`optimise: --example takes no study file, got ${positionals[0]}`);
    io.stdout(`${JSON.stringify(exampleStudy(), null, 2)}\n`);
    return EXIT_OK;
  }
  if (positionals.length !== 1) {
    throw new CliInputError(
      positionals.length === 0
        ? 'optimise: missing the study file argument'
        : `optimise: expected one study file, got ${positionals.length}: ${positionals.join(' ')}`,
      ['see: coversweep optimise --help'],
    );
  }
  const force = values.force === true;
  const jsonPath = values.json === undefined ? undefined : resolve(io.cwd, values.json);
  const csvPath = values.csv === undefined ? undefined : resolve(io.cwd, values.csv);
  if (jsonPath !== undefined && jsonPath === csvPath)
    throw new CliInputError(`--json and --csv name the same file ${jsonPath}`);
  for (const p of [jsonPath, csvPath]) if (p !== undefined) checkOutputPath(p, force);
  const path = positionals[0]!;
  const study = parseStudyFile(readStudy(path, io));
  if (!study.ok) throw new CliInputError(`invalid study file ${path}:`, study.errors);
  const outcome = optimiseStudy(study.value, optimiseProgress(io));
  if (io.stderrIsTTY) io.stderr('\n');
  const json = `${JSON.stringify(studyDocument(outcome), null, 2)}\n`;
  if (jsonPath === undefined && csvPath === undefined) {
    io.stdout(json);
    return EXIT_OK;
  }
  // Both files are finished in temporary files before either is moved into place.
  const outputs = [
    ...(jsonPath !== undefined ? [{ path: jsonPath, text: json }] : []),
    ...(csvPath !== undefined ? [{ path: csvPath, text: studyCsv(outcome) }] : []),
  ].map((o) => ({ file: new AtomicFile(o.path, force), text: o.text }));
  try {
    for (const o of outputs) o.file.write(o.text);
    for (const o of outputs) o.file.commit();
  } finally {
    for (const o of outputs) o.file.abort();
  }
  for (const o of outputs) io.stderr(`wrote ${o.file.path}\n`);
  const opt = outcome.points[outcome.optimum]!;
  const id = study.value.objective;
  io.stderr(
    `optimise: ${outcome.feasible ? 'optimum' : 'no design met every limit; least violating design'}: ${id} = ${opt.objectives[id]} (baseline ${outcome.baseline.objectives[id]}), ${outcome.evaluations} designs evaluated\n`,
  );
  return EXIT_OK;
}
