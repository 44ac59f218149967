import { MessageChannel } from 'node:worker_threads';
import { expose, wrap } from 'comlink';
import nodeEndpoint from 'comlink/dist/esm/node-adapter.mjs';
import type { SolverApi } from '../../../src/compute/engine/protocol';
import type { SpawnWorker, WorkerHandle } from '../../../src/compute/engine/workerPool';
import { solverApi } from '../../../src/compute/worker/solverApi';

/**
 * A test spawn function: the real solver API behind a MessageChannel in this thread (same protocol,
 * same structured cloning and transfers as a worker, no start-up cost). `sabotage(n, jobId)` says
 * whether the n-th job dealt to this spawn's workers should make its worker die instead of answering.
 */
export function inProcessSpawner(sabotage: (jobNumber: number, jobId: number) => boolean = () => false): {
  spawn: SpawnWorker;
  spawned: () => number;
} {
  let spawned = 0;
  let jobs = 0;
  const spawn: SpawnWorker = (): WorkerHandle => {
    spawned++;
    const { port1, port2 } = new MessageChannel();
    expose(solverApi, nodeEndpoint(port1));
    const remote = wrap<SolverApi>(nodeEndpoint(port2));
    let die: (err: Error) => void = () => undefined;
    const failed = new Promise<never>((_, reject) => {
      die = reject;
    });
    const api = {
      ping: () => remote.ping(),
      runTask: (...args: Parameters<SolverApi['runTask']>) => remote.runTask(...args),
      solveJob: (job: Parameters<SolverApi['solveJob']>[0]) => {
        jobs++;
        if (sabotage(jobs, job.jobId)) {
          setTimeout(() => die(new Error('worker killed by the test')), 5);
          return new Promise<never>(() => undefined);
        }
        return remote.solveJob(job);
      },
    } as unknown as WorkerHandle['api'];
    return {
      api,
      failed,
      terminate: () => {
        port1.close();
        port2.close();
      },
    };
  };
  return { spawn, spawned: () => spawned };
}
