// Browser worker entry: the solver API over postMessage (comlink). The browser tests' build (mode e2e)
// adds a hook that makes the worker hang; the production build leaves it out.
import { expose } from 'comlink';
import { solverApi } from '../src/compute/worker/solverApi';
import { withHangHook } from './testHang';

expose(import.meta.env.MODE === 'e2e' ? withHangHook(solverApi) : solverApi);
