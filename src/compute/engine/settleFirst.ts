/**
 * Promise.race for a short-lived promise against long-lived ones, without the leak. Promise.race
 * attaches a reaction to every input that holds the race's resolve function (and through it the
 * settled race promise and its value) until that input settles. A worker's `failed` promise or a run's
 * cancel promise may never settle, so racing each job against them kept every job's result (with its
 * packed buffers) alive until the run ended: a 994k-point pooled sweep grew by its whole output. Here
 * the reactions reach the resolve functions only through a box that is emptied on the first
 * settlement (and the reaction closures are made in a scope that holds nothing else), so a settled
 * race leaves two empty closures behind.
 */
interface Box<V> {
  resolve: ((value: V) => void) | null;
  reject: ((error: unknown) => void) | null;
}

function settlers<V>(box: Box<V>): [(value: V) => void, (error: unknown) => void] {
  const empty = () => {
    const { resolve, reject } = box;
    box.resolve = null;
    box.reject = null;
    return { resolve, reject };
  };
  return [(value) => empty().resolve?.(value), (error) => empty().reject?.(error)];
}

export function settleFirst<T, U>(first: Promise<T>, others: readonly Promise<U>[]): Promise<T | U> {
  const box: Box<T | U> = { resolve: null, reject: null };
  const settled = new Promise<T | U>((resolve, reject) => {
    box.resolve = resolve;
    box.reject = reject;
  });
  const [win, lose] = settlers(box);
  first.then(win, lose);
  for (const other of others) other.then(win, lose);
  return settled;
}
