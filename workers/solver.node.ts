// Node worker_threads entry: the same solver API over a MessagePort (comlink's node adapter).
import { parentPort } from 'node:worker_threads';
import { expose } from 'comlink';
import nodeEndpoint from 'comlink/dist/esm/node-adapter.mjs';
import { solverApi } from '../src/compute/worker/solverApi';

if (!parentPort) throw new Error('solver.node.ts must run as a worker thread');
expose(solverApi, nodeEndpoint(parentPort));
