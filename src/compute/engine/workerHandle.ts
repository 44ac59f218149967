import type { Remote } from 'comlink';
import type { SolverApi } from './protocol';

/** A live worker as the pool sees it; made by the environment's spawn function. */
export interface WorkerHandle {
  api: Remote<SolverApi>;
  /** Resolves... never; rejects when the worker dies or reports an uncaught error. */
  failed: Promise<never>;
  terminate(): void;
}

/** Environment-specific: the page spawns a Web Worker, the command line a worker thread. */
export type SpawnWorker = () => WorkerHandle;
