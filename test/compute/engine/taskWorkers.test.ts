// The pool's task workers and a client's task channel (src/compute/engine/taskWorkers.ts,
// taskChannel.ts), held against what they promise: every task resolves once; a crash or a hang is
// retried once on a fresh worker; an aborted task stops its worker; a superseded answer always has a
// later one behind it; progress never arrives after the answer (the map's ride objectives once stayed
// at "66 of 66" when a progress message, which travels on its own port, came after the answer). Fake
// workers here (deadlines of a few ms); the real solver behind a MessageChannel at the end.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { mapObjectivesJob } from '../../../src/compute/engine/studyJobs';
import { TaskChannel } from '../../../src/compute/engine/taskChannel';
import type { TaskProgress, TaskRequest } from '../../../src/compute/engine/tasks';
import { TaskWorkers } from '../../../src/compute/engine/taskWorkers';
import { viewField } from '../../../src/compute/engine/viewField';
import type { WorkerHandle } from '../../../src/compute/engine/workerHandle';
import { WorkerPool } from '../../../src/compute/engine/workerPool';
import { parseRideFile } from '../../../src/compute/ride/index';
import { DEFAULT_MODEL_OPTIONS, DEFAULT_STEERING, DEMO_WHEEL } from '../../../src/model/wheel';
import { inProcessSpawner } from './inProcessSpawn';

type Behaviour = (task: TaskRequest, progress: TaskProgress | undefined, worker: number) => Promise<unknown>;

/** Fake task workers: `behave` answers each task; a worker's `failed` rejects when `crash(n)` is called. */
function fakes(behave: Behaviour) {
  let spawned = 0;
  let terminated = 0;
  const crashers: Array<(e: Error) => void> = [];
  const spawn = (): WorkerHandle => {
    const n = ++spawned;
    const failed = new Promise<never>((_, reject) => {
      crashers[n] = reject;
    });
    const api = {
      ping: () => Promise.resolve('ready'),
      solveJob: () => Promise.reject(new Error('not a sweep worker')),
      runTask: (task: TaskRequest, progress?: TaskProgress) => behave(task, progress, n),
    };
    return {
      api: api as unknown as WorkerHandle['api'],
      failed,
      terminate: () => {
        terminated++;
      },
    };
  };
  const crash = (n: number) => crashers[n]?.(new Error(`worker ${n} crashed`));
  return { spawn, crash, counts: () => ({ spawned, terminated }) };
}

const VALIDATE: TaskRequest = { kind: 'validate' };
const never = () => new Promise<never>(() => undefined);
const tick = (ms = 0) => new Promise((resolve) => setTimeout(resolve, ms));

describe('TaskWorkers', () => {
  it('answers a task, and a model error fails it without replacing the worker', async () => {
    const f = fakes(async (_t, _p, n) => (n === 1 ? `answer ${n}` : never()));
    const w = new TaskWorkers(f.spawn, 1);
    expect(await w.runTask(VALIDATE)).toEqual({ status: 'done', value: 'answer 1' });
    const g = fakes(() => Promise.reject(new RangeError('speed must be > 0, got -1')));
    const wg = new TaskWorkers(g.spawn, 1);
    expect(await wg.runTask(VALIDATE)).toEqual({ status: 'failed', error: 'speed must be > 0, got -1' });
    expect(g.counts()).toEqual({ spawned: 1, terminated: 0 });
  });

  it('retries a crashed task once on a fresh worker and reports a second crash', async () => {
    let f = fakes(() => never());
    f = fakes(async (_t, _p, n) => {
      if (n === 1) {
        setTimeout(() => f.crash(1), 2);
        return never();
      }
      return `answer ${n}`;
    });
    const w = new TaskWorkers(f.spawn, 1);
    expect(await w.runTask(VALIDATE)).toEqual({ status: 'done', value: 'answer 2' });
    expect(f.counts()).toEqual({ spawned: 2, terminated: 1 });
    let g = fakes(() => never());
    g = fakes((_t, _p, n) => {
      setTimeout(() => g.crash(n), 2);
      return never();
    });
    const wg = new TaskWorkers(g.spawn, 1);
    expect(await wg.runTask(VALIDATE)).toEqual({ status: 'failed', error: 'worker 2 crashed' });
  });

  it('replaces a worker that dies while idle before its next task (which it would otherwise fail)', async () => {
    const f = fakes(async (_t, _p, n) => `answer ${n}`);
    const w = new TaskWorkers(f.spawn, 2);
    await Promise.all([w.runTask(VALIDATE), w.runTask(VALIDATE)]);
    f.crash(1);
    f.crash(2);
    await tick();
    expect(f.counts()).toEqual({ spawned: 2, terminated: 2 });
    expect(await w.runTask(VALIDATE)).toEqual({ status: 'done', value: 'answer 3' });
  });

  it('takes a worker past the deadline as hung: stopped, retried once, then reported', async () => {
    const f = fakes(async (_t, _p, n) => (n === 1 ? never() : `answer ${n}`));
    const w = new TaskWorkers(f.spawn, 1);
    expect(await w.runTask(VALIDATE, { deadlineMs: 20 })).toEqual({ status: 'done', value: 'answer 2' });
    expect(w.hangs).toBe(1);
    const g = fakes(() => never());
    const wg = new TaskWorkers(g.spawn, 1);
    const out = await wg.runTask(VALIDATE, { deadlineMs: 10 });
    expect(out.status).toBe('failed');
    expect(out.status === 'failed' && out.error).toMatch(/stopped answering .*twice/);
    expect(g.counts()).toEqual({ spawned: 2, terminated: 2 });
  });

  it('cancels a queued task without running it, and a running one by stopping its worker', async () => {
    const started: number[] = [];
    const f = fakes((_t, _p, n) => {
      started.push(n);
      return never();
    });
    const w = new TaskWorkers(f.spawn, 1);
    const a = new AbortController();
    const b = new AbortController();
    const first = w.runTask(VALIDATE, { signal: a.signal });
    const second = w.runTask(VALIDATE, { signal: b.signal });
    b.abort();
    expect(await second).toEqual({ status: 'cancelled' });
    await tick();
    a.abort();
    expect(await first).toEqual({ status: 'cancelled' });
    await tick();
    expect(started).toEqual([1]);
    expect(f.counts().terminated).toBe(1);
  });

  it('deals tasks to free workers first come, first served', async () => {
    const f = fakes(async (t, _p, n) => {
      await tick(5);
      return `${t.kind} on ${n}`;
    });
    const w = new TaskWorkers(f.spawn, 2);
    const out = await Promise.all([w.runTask(VALIDATE), w.runTask(VALIDATE), w.runTask(VALIDATE)]);
    expect(out.map((o) => (o.status === 'done' ? o.value : o.status))).toEqual([
      'validate on 1',
      'validate on 2',
      'validate on 1',
    ]);
    expect(f.counts().spawned).toBe(2);
  });

  it('sends a task back to the worker that finished one of the same affinity, when free; else to any free one', async () => {
    // Worker n answers "n"; a task whose ref id is 'hold' waits until released (keeps its worker busy).
    let release: () => void = () => undefined;
    const f = fakes(async (t, _p, n) => {
      if (t.kind === 'dataText' && t.ref.label === 'hold') await new Promise<void>((r) => (release = r));
      return n;
    });
    const w = new TaskWorkers(f.spawn, 2);
    const data = (label: string): TaskRequest => ({
      kind: 'dataText',
      ref: { id: 1, source: { kind: 'text', text: 'a\n1\n' }, label },
    });
    // Two at once: workers 1 and 2; the second finishes with affinity 'table', so worker 2 is its home.
    const first = w.runTask(VALIDATE);
    const second = w.runTask(data('x'), { affinity: 'table' });
    expect([await first, await second]).toEqual([
      { status: 'done', value: 1 },
      { status: 'done', value: 2 },
    ]);
    // Without affinity the first free worker (1) would take it; with it, its home (2) does, every time.
    for (let i = 0; i < 3; i++)
      expect(await w.runTask(data('x'), { affinity: 'table' })).toEqual({ status: 'done', value: 2 });
    // Home busy (worker 2 holds a task of the same affinity), another free: the free one takes it (it
    // rebuilds the state from the task); the home is then the worker that finished last.
    const held = w.runTask(data('hold'), { affinity: 'table' });
    await tick();
    expect(await w.runTask(data('x'), { affinity: 'table' })).toEqual({ status: 'done', value: 1 });
    expect(await w.runTask(data('x'), { affinity: 'table' })).toEqual({ status: 'done', value: 1 });
    release();
    expect(await held).toEqual({ status: 'done', value: 2 });
    expect(await w.runTask(data('x'), { affinity: 'table' })).toEqual({ status: 'done', value: 2 });
    // A home that crashes is forgotten: the retry and later tasks go to whichever worker is free.
    let g = fakes(() => never());
    g = fakes(async (_t, _p, n) => {
      if (n === 1 && crashNext) {
        crashNext = false;
        setTimeout(() => g.crash(1), 2);
        return never();
      }
      return n;
    });
    let crashNext = false;
    const wg = new TaskWorkers(g.spawn, 1);
    expect(await wg.runTask(data('x'), { affinity: 'table' })).toEqual({ status: 'done', value: 1 });
    crashNext = true;
    expect(await wg.runTask(data('x'), { affinity: 'table' })).toEqual({ status: 'done', value: 2 });
    expect(g.counts()).toEqual({ spawned: 2, terminated: 1 });
  });

  it('never passes progress on after the answer (a late message on the progress port)', async () => {
    let late: TaskProgress | undefined;
    const f = fakes(async (_t, progress) => {
      progress?.(1, 2);
      late = progress;
      return 'done';
    });
    const seen: string[] = [];
    const w = new TaskWorkers(f.spawn, 1);
    const out = await w.runTask(VALIDATE, { onProgress: (d, n) => seen.push(`${d}/${n}`) });
    expect(out.status).toBe('done');
    late?.(2, 2);
    await tick();
    expect(seen).toEqual(['1/2']);
  });
});

describe('TaskChannel (latest wins)', () => {
  it('supersedes the waiting task at once and the running one when it ends; the last is answered', async () => {
    const ran: number[] = [];
    const f = fakes(async (t) => {
      const id = (t as { kind: 'study'; raw: number }).raw;
      ran.push(id);
      await tick(5);
      return id;
    });
    const channel = new TaskChannel(new TaskWorkers(f.spawn, 2));
    const runs = [1, 2, 3].map((raw) => channel.run({ kind: 'study', raw }));
    const out = await Promise.all(runs);
    expect(out).toEqual([{ status: 'superseded' }, { status: 'superseded' }, { status: 'done', value: 3 }]);
    expect(ran).toEqual([1, 3]);
    expect(channel.busy).toBe(false);
  });

  it('passes progress on only for its newest run', async () => {
    const progressOf: TaskProgress[] = [];
    const release: Array<() => void> = [];
    const f = fakes(
      (_t, progress) =>
        new Promise((resolve) => {
          progressOf.push(progress!);
          release.push(() => resolve('ok'));
        }),
    );
    const seen: string[] = [];
    const channel = new TaskChannel(new TaskWorkers(f.spawn, 1));
    const first = channel.run(VALIDATE, { onProgress: (d) => seen.push(`first ${d}`) });
    await tick();
    progressOf[0]!(1, 3);
    const second = channel.run(VALIDATE, { onProgress: (d) => seen.push(`second ${d}`) });
    progressOf[0]!(2, 3); // a newer run waits: the first's progress no longer shows
    release[0]!();
    expect(await first).toEqual({ status: 'superseded' });
    await tick();
    progressOf[1]!(1, 3);
    release[1]!();
    expect(await second).toEqual({ status: 'done', value: 'ok' });
    progressOf[1]!(3, 3); // late
    expect(seen).toEqual(['first 1', 'second 1']);
  });

  it('cancel stops the running task (its worker) and drops the waiting one', async () => {
    const f = fakes(() => never());
    const channel = new TaskChannel(new TaskWorkers(f.spawn, 1));
    const a = channel.run(VALIDATE);
    const b = channel.run(VALIDATE);
    await tick();
    channel.cancel();
    expect(await a).toEqual({ status: 'cancelled' });
    expect(await b).toEqual({ status: 'cancelled' });
    await tick();
    expect(f.counts()).toEqual({ spawned: 1, terminated: 1 });
    expect(channel.busy).toBe(false);
  });
});

describe('WorkerPool tasks over the real solver protocol', () => {
  it("draws the 3D view's field on a task worker, the same bits as in this thread", async () => {
    const spawner = inProcessSpawner();
    const pool = new WorkerPool(spawner.spawn, 1, { taskWorkers: 1 });
    const input = {
      wheel: { ...DEMO_WHEEL, coverFraction: 0.5 },
      options: { ...DEFAULT_MODEL_OPTIONS, latticeSpanCount: 16, latticeChordCount: 8 },
      steering: { ...DEFAULT_STEERING },
      points: [
        { airspeedMps: 12, yawRad: (10 * Math.PI) / 180, groundSpeedMps: 12, rhoKgPerM3: 1.2, muPaS: 1.8e-5 },
      ],
    };
    const out = await pool.runTask({ kind: 'viewField', request: { input } });
    if (out.status !== 'done') throw new Error(JSON.stringify(out));
    const direct = viewField({ input });
    expect(Array.from(out.value.pressureJump)).toEqual(Array.from(direct.pressureJump));
    expect(out.value.sideN).toBe(direct.sideN);
    pool.close();
  });

  it("evaluates the map's ride objectives as a task with progress, the same bits as in this thread", async () => {
    const parsed = parseRideFile(readFileSync(join(__dirname, '../../../public/examples/ride.json'), 'utf8'));
    if (!parsed.ok) throw new Error(parsed.errors.join('; '));
    const request = {
      ride: parsed.value,
      cells: [
        { coverFraction: 0, rimDepthM: 0.03 },
        { coverFraction: 1, rimDepthM: 0.06 },
      ],
      lattice: { span: 12, chord: 6 },
    };
    const pool = new WorkerPool(inProcessSpawner().spawn, 1);
    const seen: string[] = [];
    const out = await pool.runTask(
      { kind: 'mapObjectives', request },
      { onProgress: (d, n) => seen.push(`${d}/${n}`) },
    );
    if (out.status !== 'done') throw new Error(JSON.stringify(out));
    expect(out.value).toEqual(mapObjectivesJob(request));
    expect(Object.keys(out.value[1]!)).toContain('time_s');
    // Progress travels on its own port: what arrived before the answer, in order.
    expect(seen).toEqual(['1/2', '2/2'].slice(0, seen.length));
    pool.close();
  });
});
