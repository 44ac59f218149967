/**
 * Type-level checks of the worker protocol (tsc holds them; `npm test` runs tsc): what crosses a worker
 * boundary is plain data (no functions, which structured cloning cannot carry), the remote API answers
 * with promises of exactly those types, and every job runner (the pool, this thread) has one shape.
 */
import type { Remote } from 'comlink';
import { describe, expectTypeOf, it } from 'vitest';
import type { PackedResult, ReadOutcome, TextOutcome } from '../../../src/compute/engine/dataTaskTypes';
import type { InProcessRunner } from '../../../src/compute/engine/inProcessRunner';
import type { JobRunner } from '../../../src/compute/engine/jobRunner';
import type { RideRequest, RideResponse } from '../../../src/compute/engine/pageJobs';
import type {
  CaseOutcome,
  JobResult,
  SolveJob,
  SolverApi,
  TaskRequest,
  TaskResult,
  ViewField,
  ViewFieldRequest,
} from '../../../src/compute/engine/protocol';
import type { ChannelOutcome, TaskChannel } from '../../../src/compute/engine/taskChannel';
import type { TaskOutcome } from '../../../src/compute/engine/taskWorkers';
import type { WorkerPool } from '../../../src/compute/engine/workerPool';
import type { ResultCube, StudyPlan } from '../../../src/compute/study';

/** True when no function hides anywhere in T (typed arrays, plain objects, and a Blob or File: a
 * handle that structured cloning carries without its bytes, how the data panel hands over a dropped file). */
type PlainData<T> = T extends (...args: never[]) => unknown
  ? false
  : T extends ArrayBufferView | ArrayBuffer | Blob | string | number | boolean | null | undefined
    ? true
    : T extends readonly (infer E)[]
      ? PlainData<E>
      : T extends object
        ? false extends { [K in keyof T]-?: PlainData<T[K]> }[keyof T]
          ? false
          : true
        : true;

describe('the worker protocol (types)', () => {
  it('carries plain data only', () => {
    expectTypeOf<PlainData<SolveJob>>().toEqualTypeOf<true>();
    expectTypeOf<PlainData<JobResult>>().toEqualTypeOf<true>();
    expectTypeOf<PlainData<CaseOutcome>>().toEqualTypeOf<true>();
    expectTypeOf<PlainData<ViewFieldRequest>>().toEqualTypeOf<true>();
    expectTypeOf<PlainData<ViewField>>().toEqualTypeOf<true>();
    expectTypeOf<PlainData<RideRequest>>().toEqualTypeOf<true>();
    expectTypeOf<PlainData<StudyPlan>>().toEqualTypeOf<true>();
    expectTypeOf<PlainData<TaskRequest>>().toEqualTypeOf<true>();
    expectTypeOf<PlainData<RideResponse>>().toEqualTypeOf<true>();
    expectTypeOf<PlainData<ReadOutcome>>().toEqualTypeOf<true>();
    expectTypeOf<PlainData<TextOutcome>>().toEqualTypeOf<true>();
    expectTypeOf<PlainData<PackedResult>>().toEqualTypeOf<true>();
    // The check can fail: a cube (methods) must never be sent.
    expectTypeOf<PlainData<ResultCube>>().toEqualTypeOf<false>();
  });
  it('answers remote calls with promises of the same types', () => {
    expectTypeOf<Remote<SolverApi>['solveJob']>().parameters.toEqualTypeOf<[SolveJob]>();
    expectTypeOf<ReturnType<Remote<SolverApi>['solveJob']>>().toEqualTypeOf<Promise<JobResult>>();
    expectTypeOf<Awaited<ReturnType<Remote<SolverApi>['runTask']>>>().toEqualTypeOf<TaskResult>();
    expectTypeOf<ReturnType<Remote<SolverApi>['ping']>>().toEqualTypeOf<Promise<string>>();
  });
  it('types each task answer by its kind, on the pool and on a channel', () => {
    const pool = null as unknown as WorkerPool;
    const channel = null as unknown as TaskChannel;
    type PoolViewField = Awaited<ReturnType<typeof pool.runTask<'viewField'>>>;
    expectTypeOf<PoolViewField>().toEqualTypeOf<TaskOutcome<ViewField>>();
    type ChannelRide = Awaited<ReturnType<typeof channel.run<'ride'>>>;
    expectTypeOf<ChannelRide>().toEqualTypeOf<ChannelOutcome<RideResponse>>();
    type ChannelCompare = Awaited<ReturnType<typeof channel.run<'dataCompare'>>>;
    expectTypeOf<ChannelCompare>().toEqualTypeOf<ChannelOutcome<PackedResult>>();
  });
  it('gives the pool and the in-thread runner one shape', () => {
    expectTypeOf<WorkerPool>().toExtend<JobRunner>();
    expectTypeOf<InProcessRunner>().toExtend<JobRunner>();
    expectTypeOf<Parameters<JobRunner['run']>[0]>().toEqualTypeOf<readonly SolveJob[]>();
  });
});
