// Worker entry for the page's ride and comparison jobs (src/compute/engine/pageJobs.ts) and the data
// panel's reading and comparing of large tables (src/ui/dataJobs.ts), over comlink.
import { expose } from 'comlink';
import { pageJobsApi } from '../compute/engine/pageJobs';
import { dataJobsApi } from './dataJobs';

expose({ ...pageJobsApi, ...dataJobsApi });
