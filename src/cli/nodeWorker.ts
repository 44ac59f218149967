import { Worker } from 'node:worker_threads';
import { wrap } from 'comlink';
import nodeEndpoint from 'comlink/dist/esm/node-adapter.mjs';
import type { SolverApi } from '../compute/engine/protocol';
import type { SpawnWorker, WorkerHandle } from '../compute/engine/workerPool';

const sourceEntry = new URL('../../workers/solver.node.ts', import.meta.url).href;

/**
 * A spawn function for solver worker threads. By default the TypeScript entry runs through tsx,
 * registered inside the thread (tsx's loader does not reach worker threads on Node 20): ~1 s to start,
 * always the current source. `compiledEntry` (a path to an .mjs built from workers/solver.node.ts: the
 * compiled command line's dist-cli/workers/solver.node.mjs, or the benchmark's own build) starts in
 * ~0.1 s.
 */
export function nodeWorkerSpawner(compiledEntry?: string): SpawnWorker {
  return (): WorkerHandle => {
    let worker: Worker;
    if (compiledEntry) {
      worker = new Worker(compiledEntry);
    } else {
      const tsxApi = import.meta.resolve('tsx/esm/api');
      const bootstrap = `import(${JSON.stringify(tsxApi)}).then((m) => { m.register(); return import(${JSON.stringify(sourceEntry)}); });`;
      worker = new Worker(bootstrap, { eval: true });
    }
    const failed = new Promise<never>((_, reject) => {
      worker.once('error', (err) => reject(err instanceof Error ? err : new Error(String(err))));
      worker.once('exit', (code) => reject(new Error(`solver worker exited (code ${code})`)));
    });
    return {
      api: wrap<SolverApi>(nodeEndpoint(worker)),
      failed,
      terminate: () => {
        void worker.terminate();
      },
    };
  };
}
