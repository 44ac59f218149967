import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { AfterRest } from '../../src/ui/afterRest';

describe('AfterRest (the 3D view waits for the inputs to rest)', () => {
  beforeEach(() => {
    vi.useFakeTimers();
  });
  afterEach(() => {
    vi.useRealTimers();
  });

  it('runs once the rest has passed, not before', () => {
    const rest = new AfterRest(250);
    const fn = vi.fn();
    rest.arm(fn);
    vi.advanceTimersByTime(249);
    expect(fn).not.toHaveBeenCalled();
    expect(rest.armed).toBe(true);
    vi.advanceTimersByTime(1);
    expect(fn).toHaveBeenCalledTimes(1);
    expect(rest.armed).toBe(false);
  });

  it('an edit (disarm) drops the waiting call; arming again restarts the wait', () => {
    const rest = new AfterRest(250);
    const first = vi.fn();
    const second = vi.fn();
    rest.arm(first);
    vi.advanceTimersByTime(200);
    rest.disarm();
    vi.advanceTimersByTime(1000);
    expect(first).not.toHaveBeenCalled();
    rest.arm(first);
    vi.advanceTimersByTime(200);
    rest.arm(second);
    vi.advanceTimersByTime(200);
    expect(first).not.toHaveBeenCalled();
    expect(second).not.toHaveBeenCalled();
    vi.advanceTimersByTime(50);
    expect(first).not.toHaveBeenCalled();
    expect(second).toHaveBeenCalledTimes(1);
  });

  it('with firstAtOnce, runs the first call at once and waits for the rest from the second on', () => {
    const rest = new AfterRest(250, true);
    const fn = vi.fn();
    rest.arm(fn);
    expect(fn).toHaveBeenCalledTimes(1);
    rest.arm(fn);
    vi.advanceTimersByTime(249);
    expect(fn).toHaveBeenCalledTimes(1);
    vi.advanceTimersByTime(1);
    expect(fn).toHaveBeenCalledTimes(2);
  });

  it('refuses a rest that is negative or not finite', () => {
    expect(() => new AfterRest(-1)).toThrow(/restMs=-1/);
    expect(() => new AfterRest(Number.NaN)).toThrow(RangeError);
  });
});
