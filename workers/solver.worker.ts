// Browser worker entry: the solver API over postMessage (comlink).
import { expose } from 'comlink';
import { solverApi } from '../src/compute/engine/solverApi';

expose(solverApi);
