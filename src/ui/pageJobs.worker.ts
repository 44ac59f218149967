// Worker entry for the page's ride and comparison jobs (src/compute/engine/pageJobs.ts) over comlink.
import { expose } from 'comlink';
import { pageJobsApi } from '../compute/engine/pageJobs';

expose(pageJobsApi);
