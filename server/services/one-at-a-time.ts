// A process-local queue: runs the given tasks one after another, in call order, whatever each one's outcome.

/** Returns a runner; every task passed to it starts only after the previous one has settled. */
export function oneAtATime(): <T>(task: () => Promise<T>) => Promise<T> {
  let last: Promise<unknown> = Promise.resolve();
  return <T>(task: () => Promise<T>) => {
    const result = last.then(task, task);
    last = result.catch(() => undefined);
    return result;
  };
}
