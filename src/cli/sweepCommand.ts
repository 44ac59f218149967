/** `coversweep sweep PLAN.json`: a plan's cases through the study runner to a CSV or JSON file. */
import { availableParallelism } from 'node:os';
import { resolve } from 'node:path';
import { solutionToDocument } from '../compute/caseFile';
import { InProcessRunner } from '../compute/engine/inProcessRunner';
import type { JobRunner } from '../compute/engine/jobRunner';
import type { SweepProgress } from '../compute/engine/runCases';
import { WorkerPool } from '../compute/engine/workerPool';
import { type ExpandedCase, type ExpandedPlan, parsePlanFile } from '../compute/planFile';
import { csvHeader, errorCsvLine } from '../compute/resultTable';
import { packedCsvBytes } from '../compute/resultTablePacked';
import { commandLineStudy } from '../compute/study/commandLineStudy';
import { type CaseLanded, runStudies } from '../compute/study/runStudies';
import { OUT_OPTIONS, onePositional, openOutput, parseCommandArgs, readJsonFile } from './commandArgs';
import { HELP, MAX_JOB_POINTS, MIN_CASES_FOR_POOL } from './commandHelp';
import { CliInputError, type CliIo, EXIT_INPUT, EXIT_OK } from './io';
import { nodeWorkerSpawner } from './nodeWorker';
import { checkOutputPath, OutputTakenError } from './outputFile';
import { type PrestartedSpawner, prestartedSpawner } from './prestartedSpawner';
import { progressReporter } from './progress';
import { refuseRepeatedOptions } from './refuseRepeatedOptions';
import { type SweepChunk, SweepSpool } from './sweepSpool';

/** Cases landed but not yet written (see writeSweep); `flush` writes them now. */
export interface PendingCases {
  flush: () => void;
}

export type { SweepChunk };

const chunkDecoder = new TextDecoder();

/** A chunk of writeSweep's output as text. */
export function chunkText(chunk: SweepChunk): string {
  return typeof chunk === 'string' ? chunk : chunkDecoder.decode(chunk);
}

/** Write a sweep's results as CSV or as a JSON list of documents to `sink`, streaming case by case in
 * plan order. A CSV case's rows come as UTF-8 bytes (no string is made of them), the rest as text. The plan runs as one study (commandLineStudy) on `runner`: a worker pool, or this thread.
 * Cases that finish before their turn are rendered at once and held in `spool`
 * (on disk, see SweepSpool) until then; an interrupted caller can drain the spool so every finished case
 * is written. Each sink call is one whole case (or the header/footer). Returns how many cases failed. */
export async function writeSweep(
  plan: ExpandedPlan,
  format: 'csv' | 'json',
  sink: (chunk: SweepChunk) => void,
  onProgress?: (progress: SweepProgress) => void,
  runner: JobRunner = new InProcessRunner(),
  spool: SweepSpool = new SweepSpool(),
  pending: PendingCases = { flush: () => undefined },
): Promise<number> {
  const keys = plan.variedKeys;
  if (format === 'csv') {
    sink(csvHeader(keys));
  } else {
    sink(
      `{\n  "format": "coversweep-sweep",\n  "version": 1,\n  "varied_keys": ${JSON.stringify(keys)},\n  "point_count": ${plan.pointCount},\n  "runs": [`,
    );
  }
  const render = (position: number, expanded: ExpandedCase, landed: CaseLanded): SweepChunk => {
    const { cube, surface, error } = landed;
    if (format === 'csv') {
      // Straight from the packed rows: no point or document objects (the same text, resultTablePacked.ts).
      return cube && surface
        ? packedCsvBytes(cube.data, cube.size, expanded.caseFile, keys, expanded.varied)
        : errorCsvLine(keys, expanded.varied, error ?? '');
    }
    const document =
      cube && surface ? solutionToDocument(expanded.caseFile, { surface, points: cube.points() }) : null;
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
  const writeCase = (landed: CaseLanded): void => {
    try {
      const i = landed.caseIndex;
      const text = render(i, plan.cases[i]!, landed);
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
  };
  // A pool's cases are written after the job's result has been handled (setImmediate), not inside it:
  // the pool hands the worker its next job first, so the workers compute while this thread renders
  // and writes (rendering inside the handler left both workers idle while it ran).
  // An interrupted run writes them through `pending.flush` before it keeps its partial output.
  const queued: CaseLanded[] = [];
  let drainScheduled = false;
  const drain = (): void => {
    drainScheduled = false;
    while (queued.length > 0 && failure === null) writeCase(queued.shift()!);
    queued.length = 0;
  };
  pending.flush = drain;
  const outcome = await runStudies(runner, [commandLineStudy(plan)], {
    keep: false,
    signal: stop.signal,
    // Jobs of at most ~MAX_JOB_POINTS points: a job's results are held whole in its worker and in the
    // main thread until written, so big plans are cut finer than 8 jobs per worker.
    jobsPerWorker: Math.max(8, Math.ceil(plan.pointCount / (runner.size * MAX_JOB_POINTS))),
    ...(onProgress ? { onProgress } : {}),
    // In this thread the bar starts at 0 %; a pool's first line comes with its first finished job.
    reportStart: runner.inOrder === true,
    onCase: (landed) => {
      if (failure !== null) return;
      if (runner.inOrder === true) {
        writeCase(landed);
        return;
      }
      queued.push(landed);
      if (!drainScheduled) {
        drainScheduled = true;
        setImmediate(drain);
      }
    },
  });
  drain();
  if (failure !== null) throw (failure as { error: unknown }).error;
  if (spool.size > 0) throw new Error(`sweep: ${spool.size} case(s) finished but were never written`);
  spool.close();
  if (format === 'json') sink('\n  ]\n}\n');
  return outcome.failedCount;
}

interface SweepOptions {
  path: string;
  force: boolean;
  outPath: string | undefined;
  format: 'csv' | 'json';
  workers: number | undefined;
  values: { out?: string | undefined };
}

/** The sweep's options, checked (a usage error names the option and the rule), or 'help'. */
function sweepOptions(args: string[], io: CliIo): SweepOptions | 'help' {
  refuseRepeatedOptions('sweep', args, ['out', 'workers']);
  const { values, positionals } = parseCommandArgs('sweep', {
    args,
    options: { ...OUT_OPTIONS, workers: { type: 'string' } },
    allowPositionals: true,
  });
  if (values.help) return 'help';
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
  return { path, force, outPath, format, workers, values };
}

/** `early`: workers started ahead for a `--workers N` (sweepPrestart), released here if not used. */
export async function commandSweep(
  args: string[],
  io: CliIo,
  prestarted?: PrestartedSpawner,
): Promise<number> {
  let early = prestarted;
  let plan: ExpandedPlan;
  let options: SweepOptions | 'help';
  try {
    options = sweepOptions(args, io);
    if (options === 'help') {
      prestarted?.release();
      io.stdout(HELP.sweep!);
      return EXIT_OK;
    }
    // Workers asked for start now (if they were not already) and boot while this thread reads the plan;
    // those the plan does not need (fewer cases than workers) are ended once it is read.
    early ??= prestartedSpawner(nodeWorkerSpawner(io.workerEntry), options.workers ?? 0);
    const parsed = parsePlanFile(readJsonFile(options.path, io.cwd, 'plan file'));
    if (!parsed.ok) throw new CliInputError(`invalid plan file ${options.path}:`, parsed.errors);
    plan = parsed.value;
  } catch (error) {
    early?.release();
    throw error;
  }
  const { force, outPath, format, values } = options;
  let workers = options.workers;
  const progress = progressReporter(io.stderr, io.stderrIsTTY);
  workers ??= plan.cases.length < MIN_CASES_FOR_POOL ? 0 : availableParallelism();
  workers = Math.min(workers, plan.cases.length);
  io.stderr(
    `sweep: ${plan.cases.length} case(s), ${plan.pointCount} operating point(s), ${workers > 0 ? `${workers} worker thread(s)` : 'in this process'}\n`,
  );
  early.release(workers);
  const pool = workers > 0 ? new WorkerPool(early.spawn, workers) : undefined;
  const close = () => {
    pool?.close();
    early.release();
  };
  const finish = (failed: number): number => {
    if (failed > 0)
      io.stderr(`sweep: ${failed} of ${plan.cases.length} case(s) failed; see the error column\n`);
    return failed > 0 && failed === plan.cases.length ? EXIT_INPUT : EXIT_OK;
  };
  if (outPath === undefined) {
    try {
      return finish(await writeSweep(plan, format, (chunk) => io.stdout(chunkText(chunk)), progress, pool));
    } finally {
      close();
    }
  }
  let file: ReturnType<typeof openOutput>;
  try {
    // A sweep's output can be large: flushed in the background as it grows (see AtomicFile).
    file = openOutput(outPath, force, io, true);
  } catch (error) {
    close();
    throw error;
  }
  const spool = new SweepSpool();
  // Finished rows are never lost: an interrupted or failed sweep leaves every finished case beside the
  // output, in OUT.partial (never under the output's own name, never over an existing file): first the
  // cases in plan order up to the first unfinished one, then the others that finished, in plan order.
  const pending: PendingCases = { flush: () => undefined };
  const keepPartial = (): string => {
    pending.flush();
    let drained = '';
    try {
      const held = spool.drainTo((chunk) => file.write(chunk));
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
    failed = await writeSweep(plan, format, (chunk) => file.write(chunk), progress, pool, spool, pending);
    await file.settled();
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
    close();
    process.off('SIGINT', onSignal);
    process.off('SIGTERM', onSignal);
  }
  io.stderr(`wrote ${values.out}\n`);
  return finish(failed);
}
