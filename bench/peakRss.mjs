// Preloaded into a benchmarked command-line process (`node --import ./bench/peakRss.mjs ...`): when the
// process exits, writes one JSON line to stderr with its peak resident memory and CPU time, both for the
// whole process (every thread: getrusage(RUSAGE_SELF), through process.resourceUsage()).
process.on('exit', () => {
  const u = process.resourceUsage();
  process.stderr.write(
    `\n${JSON.stringify({ peakRssKB: u.maxRSS, cpuMs: Math.round((u.userCPUTime + u.systemCPUTime) / 1000) })}\n`,
  );
});
