// Preloaded into a benchmarked command-line process (`node --import ./bench/phaseMarks.mjs ...`): writes
// one JSON line to stderr at exit with the times (ms since the process started) of its phases: each
// worker thread created, online (its JavaScript runs), ready (its entry module has loaded and listens:
// comlink's expose adds the port's message listener), its first solve job sent, its first and last
// job's answer and how many it gave, the output file moved into place (link or rename) and the exit.
// Worker threads inherit the preload (Node passes execArgv on): there it reports its marks to the
// main thread through a BroadcastChannel. Every time is read from one clock (Date.now: a worker's
// performance.timeOrigin was seen 20 ms off the main thread's).
import fs from 'node:fs';
import { syncBuiltinESMExports } from 'node:module';
import threads, { BroadcastChannel, isMainThread, parentPort, threadId } from 'node:worker_threads';

const CHANNEL = 'coversweep-bench-phase-marks';
const clock = () => Date.now();

if (isMainThread) {
  const origin = Date.now() - performance.now();
  const at = (t) => Math.round(t - origin);
  const workers = new Map();
  const marks = { moved: null };
  const channel = new BroadcastChannel(CHANNEL);
  channel.onmessage = (event) => {
    const w = workers.get(event.data.threadId);
    if (w) w.ready = event.data.ready;
  };
  channel.unref();
  // Each Worker is created through this subclass (the 'worker' event and 'online' come later, when
  // the main thread's synchronous work lets them).
  const BaseWorker = threads.Worker;
  threads.Worker = class extends BaseWorker {
    constructor(...args) {
      const created = clock();
      super(...args);
      const w = {
        created,
        online: null,
        ready: null,
        firstJob: null,
        firstResult: null,
        lastResult: null,
        results: 0,
      };
      workers.set(this.threadId, w);
      this.once('online', () => {
        w.online = clock();
      });
      const post = this.postMessage;
      this.postMessage = (data, transfer) => {
        // A solve job sent (comlink's call of solveJob), the first one marked.
        if (w.firstJob === null && Array.isArray(data?.path) && data.path[0] === 'solveJob')
          w.firstJob = clock();
        return post.call(this, data, transfer);
      };
      this.on('message', (data) => {
        // A solve job's answer (comlink's wire value of a JobResult); not the pool's closing messages.
        if (!(data?.value && typeof data.value === 'object' && 'outcomes' in data.value)) return;
        const t = clock();
        w.firstResult ??= t;
        w.lastResult = t;
        w.results++;
      });
    }
  };
  for (const name of ['linkSync', 'renameSync']) {
    const original = fs[name];
    fs[name] = (...args) => {
      const result = original(...args);
      marks.moved = clock();
      return result;
    };
  }
  syncBuiltinESMExports();
  process.on('exit', () => {
    const list = [...workers.values()].map((w) => ({
      created: at(w.created),
      online: w.online === null ? null : at(w.online),
      ready: w.ready === null ? null : at(w.ready),
      firstJob: w.firstJob === null ? null : at(w.firstJob),
      firstResult: w.firstResult === null ? null : at(w.firstResult),
      lastResult: w.lastResult === null ? null : at(w.lastResult),
      results: w.results,
    }));
    const moved = marks.moved === null ? null : at(marks.moved);
    process.stderr.write(`\n${JSON.stringify({ phases: { workers: list, moved, exit: at(clock()) } })}\n`);
  });
} else if (parentPort) {
  const port = parentPort;
  const on = port.on;
  let sent = false;
  port.on = function (event, listener) {
    if (event === 'message' && !sent) {
      sent = true;
      const channel = new BroadcastChannel(CHANNEL);
      channel.postMessage({ threadId, ready: clock() });
      channel.close();
    }
    return on.call(this, event, listener);
  };
}
