"""LAPACK's LU (dgetrf through scipy.linalg.lu_factor) on the matrices of `npm run bench`'s LU figure.

Prints one JSON line: {"n": {"medianMs": .., "gflops": .., "medianCpuMs": .., "cpuGflops": ..}, ...,
"numpy": .., "scipy": .., "blas": ..} (wall time and this process's CPU time, medians)
or {"skipped": "<reason>"} when numpy or scipy is missing. Run by bench/lapackLu.ts with one BLAS thread.
"""

import json
import sys
import time

try:
    import numpy as np
    import scipy
    import scipy.linalg as sl
except ImportError as e:
    print(json.dumps({"skipped": f"python3 has no numpy/scipy ({e})"}))
    sys.exit(0)

try:
    from threadpoolctl import threadpool_limits

    limits = threadpool_limits(limits=1)
    pinned = "OPENBLAS_NUM_THREADS=1 and threadpoolctl"
except ImportError:
    pinned = "OPENBLAS_NUM_THREADS=1 (threadpoolctl not installed)"

blas = "unknown"
try:
    cfg = np.show_config(mode="dicts")
    blas = cfg["Build Dependencies"]["lapack"]["name"] + " " + cfg["Build Dependencies"]["lapack"]["version"]
except Exception:  # older numpy: no mode="dicts"
    pass

out = {"numpy": np.__version__, "scipy": scipy.__version__, "lapack": blas, "threads": pinned}
for arg in sys.argv[1:]:
    n, repeats = (int(v) for v in arg.split(":"))
    # The same matrix as bench/run.ts: the LCG's uniform values in [-0.5, 0.5), n added to the diagonal.
    seed = 12345
    values = np.empty(n * n)
    for i in range(n * n):
        seed = (seed * 1103515245 + 12345) % 2147483648
        values[i] = seed / 2147483648 - 0.5
    source = values.reshape(n, n) + n * np.eye(n)
    times = []
    cpu = []
    checksum = 0.0
    work = np.array(source, order="F")
    sl.lu_factor(work, overwrite_a=True, check_finite=False)  # warm-up, as for ours
    for _ in range(repeats):
        work = np.array(source, order="F")
        c0 = time.process_time()
        t0 = time.perf_counter()
        lu, piv = sl.lu_factor(work, overwrite_a=True, check_finite=False)
        times.append(time.perf_counter() - t0)
        cpu.append(time.process_time() - c0)
        checksum += float(lu[n - 1, n - 1])
    times.sort()
    cpu.sort()
    ms = times[len(times) // 2] * 1e3
    cpu_ms = cpu[len(cpu) // 2] * 1e3
    flops = (2 / 3) * n**3
    out[str(n)] = {
        "medianMs": round(ms, 2),
        "gflops": round(flops / (ms * 1e-3) / 1e9, 2),
        "medianCpuMs": round(cpu_ms, 2),
        "cpuGflops": round(flops / (cpu_ms * 1e-3) / 1e9, 2) if cpu_ms > 0 else None,
        "checksum": checksum,
    }
print(json.dumps(out))
