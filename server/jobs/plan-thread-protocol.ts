// Messages between a plan run's worker thread and the process that supervises it.
import type { PlanProgress, PlanReview } from '../../shared/plans';
import type { PlanComputeInput } from './plan-compute';

/** computePlan's input (server/jobs/plan-compute.ts); sent to the thread as workerData. */
export type PlanThreadInput = PlanComputeInput;

export type ComputePlanFn = (input: PlanThreadInput, onProgress: (p: PlanProgress) => void) => Promise<PlanReview>;

/** Errors lose their class when they cross threads, so the thread says whether retrying could help. */
export type ThreadError = {
  /** a PlannerError or bad input: the same run would fail the same way again */
  deterministic: boolean;
  code: string | null;
  message: string;
};

export type ThreadMessage =
  | { type: 'progress'; progress: PlanProgress }
  | { type: 'done'; review: PlanReview }
  | { type: 'failed'; error: ThreadError };
