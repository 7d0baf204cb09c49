// Counts event-loop turns (setImmediate callbacks) while a job runs: work on a worker thread leaves the loop free
// to turn, work on the calling thread does not. A count, never a wall-clock bound.

/** Runs `job`, which may read the turns so far through `turnsNow`, and returns its value and the turns counted. */
export async function turnsWhile<T>(job: (turnsNow: () => number) => Promise<T>): Promise<{ turns: number; value: T }> {
  let turns = 0;
  let spinning = true;
  const spin = () => {
    if (!spinning) return;
    turns += 1;
    setImmediate(spin);
  };
  setImmediate(spin);
  try {
    const value = await job(() => turns);
    return { turns, value };
  } finally {
    spinning = false;
  }
}
