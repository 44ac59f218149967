// Worker entry for the data panel's reading and comparing of large tables (src/ui/dataJobs.ts), over
// comlink. The parsed table stays in this worker (it reads a dropped File itself), which is why the
// data panel keeps a worker of its own; every other task of the page runs on the pool's task workers.
import { expose } from 'comlink';
import { dataJobsApi } from './dataJobs';

expose({ ...dataJobsApi, ping: () => 'ready' });
