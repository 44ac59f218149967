import { setFlagsFromString } from 'node:v8';
import { Worker } from 'node:worker_threads';
import { releaseProxy, wrap } from 'comlink';
import nodeEndpoint from 'comlink/dist/esm/node-adapter.mjs';
import type { SolverApi } from '../compute/engine/protocol';
import type { SpawnWorker, WorkerHandle } from '../compute/engine/workerPool';

const sourceEntry = new URL('../../workers/solver.node.ts', import.meta.url).href;

/**
 * A solver worker's young generation (MB): V8's default lets it grow to 48 MB per thread (three 16 MB
 * semi-spaces), though a job's live data is small (a few lattices and one job's packed rows); the
 * garbage is short-lived per-point records. 8 MB took about 14 MB off the peak of a 2-worker standard
 * sweep with no measurable change in CPU time (2026-12-02, 4 interleaved runs each; 4 MB took 30 MB
 * off but cost about 8 % more CPU).
 */
const WORKER_LIMITS = { maxYoungGenerationSizeMb: 8 };

/**
 * Solver threads optimise their code on their own thread (V8's --no-concurrent-recompilation, set
 * before the first worker's isolate is made; V8 reads it per isolate, so this thread keeps its own
 * setting). Node 20 can abort the whole process when a worker is torn down (terminate(), or
 * process.exit() after an interrupt) while a background TurboFan job of its isolate allocates (the
 * stack below); with no background compile jobs in solver isolates there is no such job to race. It
 * showed in test/adversarial/interrupts.test.ts: 2 aborts in 12 interrupted 2-worker sweeps, and 1 in
 * 64 of a standalone loop of the same interrupts (2026-12-02). CPU time of the standard sweep without
 * and with it: 4.88 and 4.62 s on 2 workers, 3.62 and 3.49 s on 1 (4 alternating runs each, load 8-9).
 */
let compileOnOwnThread = false;

/** How long an idle worker asked to end may take to end by itself before it is terminated. */
const RETIRE_GRACE_MS = 2000;

/**
 * A spawn function for solver worker threads. By default the TypeScript entry runs through tsx,
 * registered inside the thread (tsx's loader does not reach worker threads on Node 20): ~1 s to start,
 * always the current source. `compiledEntry` (a path to an .mjs built from workers/solver.node.ts: the
 * compiled command line's dist-cli/workers/solver.node.mjs, or the benchmark's own build) starts in
 * ~0.1 s.
 *
 * `terminate()` kills a busy worker at once. An idle one (no call in flight: a pool closing after its
 * runs) is asked to end by itself instead: its API is released, its port loses its last listener and
 * the thread leaves its event loop like a finished script (terminated after RETIRE_GRACE_MS if not).
 * Node 20 can abort the whole process when `worker.terminate()` tears a thread down while V8 is still
 * optimising its code on a background thread (a concurrent TurboFan job asks for the foreground task
 * runner of an isolate the platform has already unregistered: "Assertion failed: (data.first) !=
 * nullptr" in NodePlatform::ForIsolate, from IncrementalMarkingJob::ScheduleTask); a thread that has
 * just finished a job is the likely case (measured: 1 abort in 60 such terminations, none in 120 self
 * exits; see DEVELOPERS.md). Upstream, the isolate is now unregistered after it is disposed
 * (v8/node#208, 2025).
 */
export function nodeWorkerSpawner(compiledEntry?: string): SpawnWorker {
  if (!compileOnOwnThread) {
    setFlagsFromString('--no-concurrent-recompilation');
    compileOnOwnThread = true;
  }
  return (): WorkerHandle => {
    let worker: Worker;
    if (compiledEntry) {
      worker = new Worker(compiledEntry, { resourceLimits: WORKER_LIMITS });
    } else {
      const tsxApi = import.meta.resolve('tsx/esm/api');
      const bootstrap = `import(${JSON.stringify(tsxApi)}).then((m) => { m.register(); return import(${JSON.stringify(sourceEntry)}); });`;
      worker = new Worker(bootstrap, { eval: true, resourceLimits: WORKER_LIMITS });
    }
    const failed = new Promise<never>((_, reject) => {
      worker.once('error', (err) => reject(err instanceof Error ? err : new Error(String(err))));
      worker.once('exit', (code) => reject(new Error(`solver worker exited (code ${code})`)));
    });
    const remote = wrap<SolverApi>(nodeEndpoint(worker));
    let inFlight = 0;
    const settle = () => {
      inFlight--;
    };
    // Counts the calls in flight (solveJob, ping, viewField), so terminate() knows an idle worker.
    const api = new Proxy(remote, {
      get(target, prop, receiver) {
        const member: unknown = Reflect.get(target, prop, receiver);
        if (typeof prop !== 'string' || typeof member !== 'function') return member;
        return (...args: unknown[]) => {
          const pending = (member as (...a: unknown[]) => Promise<unknown>)(...args);
          inFlight++;
          pending.then(settle, settle);
          return pending;
        };
      },
    });
    let ended = false;
    worker.once('exit', () => {
      ended = true;
    });
    return {
      api,
      failed,
      terminate: () => {
        if (ended) return;
        if (inFlight > 0) {
          void worker.terminate();
          return;
        }
        const timer = setTimeout(() => void worker.terminate(), RETIRE_GRACE_MS);
        worker.once('exit', () => clearTimeout(timer));
        ended = true;
        remote[releaseProxy]();
      },
    };
  };
}
