/**
 * LAPACK's LU (dgetrf via python3, numpy and scipy) timed in the bench run, on one BLAS thread, for
 * side-by-side figures with `luFactor`. The machine's environment may set OPENBLAS_CORETYPE and
 * OPENBLAS_L2_SIZE, which slow OpenBLAS down; they are removed for this one command only.
 * Returns the figures per n, or the reason they could not be measured.
 */
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

export interface LapackLu {
  figures: Record<
    string,
    { medianMs: number; gflops: number; medianCpuMs: number; cpuGflops: number | null }
  >;
  info: Record<string, string>;
}

export function lapackLu(sizes: { n: number; repeats: number }[]): LapackLu | { skipped: string } {
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    OPENBLAS_NUM_THREADS: '1',
    OMP_NUM_THREADS: '1',
    MKL_NUM_THREADS: '1',
  };
  delete env.OPENBLAS_CORETYPE;
  delete env.OPENBLAS_L2_SIZE;
  const script = fileURLToPath(new URL('lapackLu.py', import.meta.url));
  const args = [script, ...sizes.map((s) => `${s.n}:${s.repeats}`)];
  const child = spawnSync('python3', args, { env, encoding: 'utf8', timeout: 300_000 });
  if (child.error) return { skipped: `python3 could not be run (${child.error.message})` };
  if (child.status !== 0)
    return { skipped: `python3 exited ${child.status}: ${child.stderr.trim().slice(-300)}` };
  const parsed = JSON.parse(child.stdout.trim().split('\n').pop() ?? '{}') as Record<string, unknown>;
  if (typeof parsed.skipped === 'string') return { skipped: parsed.skipped };
  const figures: LapackLu['figures'] = {};
  const info: Record<string, string> = {};
  for (const [key, value] of Object.entries(parsed)) {
    if (typeof value === 'string') info[key] = value;
    else figures[key] = value as LapackLu['figures'][string];
  }
  return { figures, info };
}
