/**
 * The `coversweep` command line: arguments -> case or plan -> model -> stdout or an atomic file.
 * Exit codes: 0 success, 1 unexpected internal error, 2 invalid input or usage (messages on stderr,
 * nothing on stdout, no file written).
 */
import { readFileSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { resolve } from 'node:path';
import { parseArgs } from 'node:util';
import { parseCaseFile, type ResultDocument, solutionToDocument, solveCase } from '../compute/caseFile';
import { InProcessRunner } from '../compute/engine/inProcessRunner';
import type { JobRunner } from '../compute/engine/jobRunner';
import type { SweepProgress } from '../compute/engine/runCases';
import { WorkerPool } from '../compute/engine/workerPool';
import { checkJsonFileSize, MAX_JSON_FILE_BYTES } from '../compute/fileVersion';
import { type ExpandedCase, type ExpandedPlan, parsePlanFile } from '../compute/planFile';
import { csvHeader, documentCsvLines, errorCsvLine } from '../compute/resultTable';
import { commandLineStudy } from '../compute/study/commandLineStudy';
import { runStudies } from '../compute/study/runStudies';
import { runCompare } from './compareCommand';
import { exampleCase, examplePlan } from './examples';
import {
  CliInputError,
  type CliIo,
  EXIT_INPUT,
  EXIT_INTERNAL,
  EXIT_OK,
  processIo,
  readErrorReason,
} from './io';
import { nodeWorkerSpawner } from './nodeWorker';
import { AtomicFile, checkOutputPath, OutputTakenError } from './outputFile';
import { progressReporter } from './progress';
import { InputFileError, readInputFile } from './readInputFile';
import { refuseRepeatedOptions } from './refuseRepeatedOptions';
import { runRide } from './rideCommand';
import { SweepSpool } from './sweepSpool';
import { runValidate } from './validateCommand';

/** Points per pooled job to aim for at most (memory per job in flight; see writeSweep). */
const MAX_JOB_POINTS = 20_000;

/** Below this many cases a sweep runs in-process by default: worker start-up (~1 s) would dominate. */
const MIN_CASES_FOR_POOL = 8;

export const HELP: Record<string, string> = {
  main: `coversweep: reduced-order aerodynamics of covered and deep-rim bicycle wheels

Usage:
  coversweep example [--plan]              print an example case (or plan) file
  coversweep solve CASE.json [--out F]     solve one case; the result document (JSON) on stdout or in F
  coversweep sweep PLAN.json [--out F]     solve every case of a plan; CSV (or JSON if F ends in .json)
  coversweep ride RIDE.json                a design against a baseline on the road: watts, seconds,
                                           wind-averaged drag, crosswind handling (JSON on stdout)
  coversweep compare CASE.json DATA.csv    hold measured or simulated data against the model:
                                           unit and axis slips, residuals, --calibrate
  coversweep validate [--json]             the model against the built-in reference cases (published
                                           and exact values, with sources and bands): PASS or FAIL
  coversweep <command> --help              help on one command

Options:
  --help, -h      show help
  --version       print the version

Exit codes: 0 success, 1 internal error (validate: a reference case failed), 2 invalid input or usage
(nothing on stdout, no file written).
Results are estimates from a reduced-order model: allow margin for gusts and lighter riders, and rely on
qualified testing and the competition's rules before riding a design.
`,
  example: `Usage: coversweep example [--plan]

Print an example case file (an invented wheel, "Demo 50 mm half-cover") on stdout, or with --plan an
example plan file that varies rim depth and cover fraction. Save it, edit it, then run
  coversweep solve case.json      or      coversweep sweep plan.json --out results.csv
`,
  solve: `Usage: coversweep solve CASE.json [--out RESULT.json] [--force]

Solve one case file: every airspeed x yaw angle it lists. Prints the result document (JSON,
format "coversweep-result") on stdout, or writes it to --out atomically.

Options:
  --out FILE   write the document to FILE instead of stdout (refuses to overwrite without --force)
  --force      allow --out to replace an existing file
  --help       show this help
`,
  sweep: `Usage: coversweep sweep PLAN.json [--out results.csv|results.json] [--workers N] [--force]

Expand a plan file (a case file whose leaves may be lists or {"from","to","step"} ranges) into the
Cartesian product of its cases, solve them all, and write a table: one row per case and operating
point, the varied parameters first (named by key path), then the result columns. Without --out the
CSV goes to stdout. Progress is shown on stderr.

Options:
  --out FILE     write to FILE (.csv: the table; .json: every case's result document), atomically
  --workers N    solver worker threads (default: the machine's core count; plans of fewer than
                 ${MIN_CASES_FOR_POOL} cases run in this process unless N is given; 0 = in this process)
  --force        allow --out to replace an existing file
  --help         show this help

A case the model rejects becomes a row with its message in the "error" column; the sweep goes on and
reports how many failed (exit code 0 when some cases ran, 2 when every case failed).
`,
};

function version(): string {
  try {
    const pkg = JSON.parse(readFileSync(new URL('../../package.json', import.meta.url), 'utf8')) as {
      version?: string;
    };
    return pkg.version ?? 'unknown';
  } catch {
    return 'unknown';
  }
}

/** Run an argument parser, turning its complaints into usage errors (exit 2). */
function parseCommandArgs<T>(command: string, parse: () => T): T {
  try {
    return parse();
  } catch (error) {
    throw new CliInputError(`${command}: ${error instanceof Error ? error.message : String(error)}`, [
      `see: coversweep ${command} --help`,
    ]);
  }
}

const HELP_OPTION = { help: { type: 'boolean', short: 'h' } } as const;
const OUT_OPTIONS = { out: { type: 'string' }, force: { type: 'boolean' }, ...HELP_OPTION } as const;

/** Read one of our JSON files: a regular file within the size limit, as strict UTF-8 (readInputFile). */
function readJsonFile(path: string, cwd: string, what: string): string {
  try {
    return readInputFile(resolve(cwd, path), MAX_JSON_FILE_BYTES, (bytes) => checkJsonFileSize(bytes, what));
  } catch (error) {
    if (error instanceof InputFileError && error.whole) throw new CliInputError(error.message);
    throw new CliInputError(`cannot read the ${what} ${path}: ${readErrorReason(error)}`);
  }
}

function onePositional(command: string, positionals: string[], what: string): string {
  if (positionals.length === 0)
    throw new CliInputError(`${command}: missing the ${what} argument`, [HELP[command]!]);
  if (positionals.length > 1) {
    throw new CliInputError(
      `${command}: expected one ${what}, got ${positionals.length}: ${positionals.join(' ')}`,
    );
  }
  return positionals[0]!;
}

function commandExample(args: string[], io: CliIo): number {
  const { values, positionals } = parseCommandArgs('example', () =>
    parseArgs({ args, options: { plan: { type: 'boolean' }, ...HELP_OPTION }, allowPositionals: true }),
  );
  if (values.help) {
    io.stdout(HELP.example!);
    return EXIT_OK;
  }
  if (positionals.length > 0) throw new CliInputError(`example: unexpected argument ${positionals[0]}`);
  io.stdout(`${JSON.stringify(values.plan ? examplePlan() : exampleCase(), null, 2)}\n`);
  return EXIT_OK;
}

function commandSolve(args: string[], io: CliIo): number {
  refuseRepeatedOptions('solve', args, ['out']);
  const { values, positionals } = parseCommandArgs('solve', () =>
    parseArgs({ args, options: OUT_OPTIONS, allowPositionals: true }),
  );
  if (values.help) {
    io.stdout(HELP.solve!);
    return EXIT_OK;
  }
  const path = onePositional('solve', positionals, 'case file');
  const outPath = values.out === undefined ? undefined : resolve(io.cwd, values.out);
  if (outPath !== undefined) checkOutputPath(outPath, values.force === true);
  const parsed = parseCaseFile(readJsonFile(path, io.cwd, 'case file'));
  if (!parsed.ok) throw new CliInputError(`invalid case file ${path}:`, parsed.errors);
  let document: ResultDocument;
  try {
    document = solveCase(parsed.value);
  } catch (error) {
    // The model refuses a case the file rules let through: an input problem, not a crash.
    if (!(error instanceof RangeError)) throw error;
    throw new CliInputError(`the model cannot solve the case in ${path}:`, [error.message]);
  }
  const text = `${JSON.stringify(document, null, 2)}\n`;
  if (outPath === undefined) {
    io.stdout(text);
  } else {
    const file = openOutput(outPath, values.force === true, io);
    try {
      file.write(text);
      file.commit();
    } catch (error) {
      file.abort();
      throw error;
    }
    io.stderr(`wrote ${values.out}\n`);
  }
  return EXIT_OK;
}

/** Write a sweep's results as CSV or as a JSON list of documents to `sink`, streaming case by case in
 * plan order. The plan runs as one study (commandLineStudy) on `runner`: a worker pool, or this thread.
 * Cases that finish before their turn are rendered at once and held in `spool`
 * (on disk, see SweepSpool) until then; an interrupted caller can drain the spool so every finished case
 * is written. Each sink call is one whole case (or the header/footer). Returns how many cases failed. */
export async function writeSweep(
  plan: ExpandedPlan,
  format: 'csv' | 'json',
  sink: (text: string) => void,
  onProgress?: (progress: SweepProgress) => void,
  runner: JobRunner = new InProcessRunner(),
  spool: SweepSpool = new SweepSpool(),
): Promise<number> {
  const keys = plan.variedKeys;
  if (format === 'csv') {
    sink(csvHeader(keys));
  } else {
    sink(
      `{\n  "format": "coversweep-sweep",\n  "version": 1,\n  "varied_keys": ${JSON.stringify(keys)},\n  "point_count": ${plan.pointCount},\n  "runs": [`,
    );
  }
  const render = (
    position: number,
    expanded: ExpandedCase,
    document: ResultDocument | null,
    error: string | null,
  ): string => {
    if (format === 'csv') {
      return document
        ? documentCsvLines(document, keys, expanded.varied)
        : errorCsvLine(keys, expanded.varied, error ?? '');
    }
    const run = document
      ? { index: expanded.index, varied: expanded.varied, result: document }
      : { index: expanded.index, varied: expanded.varied, error };
    return `${position === 0 ? '\n' : ',\n'}${JSON.stringify(run)}`;
  };
  let next = 0;
  // A sink that fails (a full disk, a closed pipe) stops the run: the runner is cancelled, so no
  // worker goes on solving, and the error is thrown once it has stopped.
  const stop = new AbortController();
  let failure: { error: unknown } | null = null;
  const outcome = await runStudies(runner, [commandLineStudy(plan)], {
    keep: false,
    signal: stop.signal,
    // Jobs of at most ~MAX_JOB_POINTS points: a job's results are held whole in its worker and in the
    // main thread until written, so big plans are cut finer than 8 jobs per worker.
    jobsPerWorker: Math.max(8, Math.ceil(plan.pointCount / (runner.size * MAX_JOB_POINTS))),
    ...(onProgress ? { onProgress } : {}),
    // In this thread the bar starts at 0 %; a pool's first line comes with its first finished job.
    reportStart: runner.inOrder === true,
    onCase: ({ caseIndex: i, cube, surface, error }) => {
      if (failure !== null) return;
      try {
        const expanded = plan.cases[i]!;
        const document =
          cube && surface ? solutionToDocument(expanded.caseFile, { surface, points: cube.points() }) : null;
        const text = render(i, expanded, document, error);
        if (i !== next) {
          spool.put(i, text);
          return;
        }
        sink(text);
        next++;
        for (let held = spool.take(next); held !== null; held = spool.take(next)) {
          sink(held);
          next++;
        }
      } catch (sinkError) {
        failure = { error: sinkError };
        stop.abort();
      }
    },
  });
  if (failure !== null) throw (failure as { error: unknown }).error;
  if (spool.size > 0) throw new Error(`sweep: ${spool.size} case(s) finished but were never written`);
  spool.close();
  if (format === 'json') sink('\n  ]\n}\n');
  return outcome.failedCount;
}

/** Open an atomic output file, naming any stale temporary files of a killed run it cleaned up. */
function openOutput(path: string, force: boolean, io: CliIo): AtomicFile {
  const file = new AtomicFile(path, force);
  for (const stale of file.removedStale) {
    io.stderr(`coversweep: removed ${stale}, a temporary file left by an earlier run that was killed\n`);
  }
  return file;
}

async function commandSweep(args: string[], io: CliIo): Promise<number> {
  refuseRepeatedOptions('sweep', args, ['out', 'workers']);
  const { values, positionals } = parseCommandArgs('sweep', () =>
    parseArgs({ args, options: { ...OUT_OPTIONS, workers: { type: 'string' } }, allowPositionals: true }),
  );
  if (values.help) {
    io.stdout(HELP.sweep!);
    return EXIT_OK;
  }
  const path = onePositional('sweep', positionals, 'plan file');
  const force = values.force === true;
  const outPath = values.out === undefined ? undefined : resolve(io.cwd, values.out);
  let format: 'csv' | 'json' = 'csv';
  if (outPath !== undefined) {
    const lower = outPath.toLowerCase();
    if (lower.endsWith('.json')) format = 'json';
    else if (!lower.endsWith('.csv')) {
      throw new CliInputError(`--out ${values.out}: must end in .csv (a table) or .json (result documents)`);
    }
    checkOutputPath(outPath, force);
  }
  let workers: number | undefined;
  if (values.workers !== undefined) {
    workers = Number(values.workers);
    if (!/^\d+$/.test(values.workers) || workers > 64) {
      throw new CliInputError(`--workers ${values.workers}: must be a whole number from 0 to 64`);
    }
  }
  const parsed = parsePlanFile(readJsonFile(path, io.cwd, 'plan file'));
  if (!parsed.ok) throw new CliInputError(`invalid plan file ${path}:`, parsed.errors);
  const plan = parsed.value;
  const progress = progressReporter(io.stderr, io.stderrIsTTY);
  workers ??= plan.cases.length < MIN_CASES_FOR_POOL ? 0 : availableParallelism();
  workers = Math.min(workers, plan.cases.length);
  io.stderr(
    `sweep: ${plan.cases.length} case(s), ${plan.pointCount} operating point(s), ${workers > 0 ? `${workers} worker thread(s)` : 'in this process'}\n`,
  );
  const pool = workers > 0 ? new WorkerPool(nodeWorkerSpawner(io.workerEntry), workers) : undefined;
  const finish = (failed: number): number => {
    if (failed > 0)
      io.stderr(`sweep: ${failed} of ${plan.cases.length} case(s) failed; see the error column\n`);
    return failed > 0 && failed === plan.cases.length ? EXIT_INPUT : EXIT_OK;
  };
  if (outPath === undefined) {
    try {
      return finish(await writeSweep(plan, format, io.stdout, progress, pool));
    } finally {
      pool?.close();
    }
  }
  const file = openOutput(outPath, force, io);
  const spool = new SweepSpool();
  // Finished rows are never lost: an interrupted or failed sweep leaves every finished case beside the
  // output, in OUT.partial (never under the output's own name, never over an existing file): first the
  // cases in plan order up to the first unfinished one, then the others that finished, in plan order.
  const keepPartial = (): string => {
    let drained = '';
    try {
      const held = spool.drainTo((text) => file.write(text));
      if (held > 0) drained = ` (${held} case(s) finished out of turn follow the gap)`;
    } catch {
      drained = ' (some cases finished out of turn could not be added)';
    }
    try {
      const kept = file.keepPartial();
      return kept === null ? 'no rows had finished' : `the finished rows are in ${kept}${drained}`;
    } catch (error) {
      return `the finished rows could not be kept: ${error instanceof Error ? error.message : String(error)}`;
    }
  };
  const onSignal = () => {
    io.stderr(`\nsweep: interrupted; ${values.out} not written; ${keepPartial()}\n`);
    process.exit(130);
  };
  process.once('SIGINT', onSignal);
  process.once('SIGTERM', onSignal);
  let failed = 0;
  try {
    failed = await writeSweep(plan, format, (text) => file.write(text), progress, pool, spool);
    file.commit();
  } catch (error) {
    if (error instanceof OutputTakenError) throw error;
    const kept = keepPartial();
    if (error instanceof CliInputError) {
      throw new CliInputError(`${error.message}; ${values.out} not written; ${kept}`, error.messages);
    }
    io.stderr(`sweep: failed; ${values.out} not written; ${kept}\n`);
    throw error;
  } finally {
    spool.close();
    pool?.close();
    process.off('SIGINT', onSignal);
    process.off('SIGTERM', onSignal);
  }
  io.stderr(`wrote ${values.out}\n`);
  return finish(failed);
}

/** Run the command line on `argv` (without node and the script). Returns the exit code. */
export async function main(argv: readonly string[], ioOverrides: Partial<CliIo> = {}): Promise<number> {
  const io: CliIo = { ...processIo(), ...ioOverrides };
  const [command, ...rest] = argv;
  try {
    switch (command) {
      case undefined:
        io.stderr(HELP.main!);
        return EXIT_INPUT;
      case '--help':
      case '-h':
        io.stdout(HELP.main!);
        return EXIT_OK;
      case 'help': {
        const topic = rest[0];
        io.stdout((topic !== undefined && topic !== 'main' && HELP[topic]) || HELP.main!);
        return EXIT_OK;
      }
      case '--version':
        io.stdout(`${version()}\n`);
        return EXIT_OK;
      case 'example':
        return commandExample([...rest], io);
      case 'solve':
        return commandSolve([...rest], io);
      case 'sweep':
        return await commandSweep([...rest], io);
      case 'ride':
        return runRide([...rest], {
          stdout: io.stdout,
          stderr: io.stderr,
          readFile: (path) =>
            readInputFile(resolve(io.cwd, path), MAX_JSON_FILE_BYTES, (bytes) =>
              checkJsonFileSize(bytes, 'ride file'),
            ),
        });
      case 'compare':
        return runCompare([...rest], {
          stdout: io.stdout,
          stderr: io.stderr,
          readFile: (path, maxBytes) => readInputFile(resolve(io.cwd, path), maxBytes),
          fileSize: () => 0, // readFile checks the size of what it reads, whatever stat says
        });
      case 'validate':
        return runValidate([...rest], io);
      default:
        throw new CliInputError(`unknown command "${command}"`, [
          'commands: example, solve, sweep, ride, compare, validate (see coversweep --help)',
        ]);
    }
  } catch (error) {
    if (error instanceof CliInputError) {
      io.stderr(`coversweep: error: ${error.message}\n`);
      for (const m of error.messages) io.stderr(`  ${m.trimEnd().replace(/\n/g, '\n  ')}\n`);
      return EXIT_INPUT;
    }
    const detail = error instanceof Error ? (error.stack ?? error.message) : String(error);
    io.stderr(`coversweep: internal error (please report it): ${detail}\n`);
    return EXIT_INTERNAL;
  }
}
