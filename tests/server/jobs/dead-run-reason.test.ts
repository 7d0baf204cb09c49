// The reason a planner reads when a run's retries are used up, from what pg-boss stored as the last error.
import { deadRunReason } from '../../../server/jobs/plan-dead-letter';

describe('deadRunReason', () => {
  test('an expiry by the queue reads as a worker that stopped responding', () => {
    expect(deadRunReason({ value: { message: 'job failed by timeout in active state' } }, 3))
      .toBe('The worker stopped responding 3 times; the run was given up.');
    expect(deadRunReason(null, 1)).toBe('The worker stopped responding once; the run was given up.');
  });

  test('a thrown error is quoted as the last error', () => {
    expect(deadRunReason({ name: 'Error', message: 'connection reset', stack: '…' }, 3))
      .toBe('The run was tried 3 times and given up; last error: connection reset');
    expect(deadRunReason({ value: 'pg-boss shut down while active' }, 2))
      .toBe('The run was tried 2 times and given up; last error: pg-boss shut down while active');
  });
});
