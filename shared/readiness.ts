// GET /api/ready's answer: whether this process can serve, and for each check what is wrong when it cannot.
import { z } from 'zod';

export const readinessCheckSchema = z.object({ ok: z.boolean(), detail: z.string() });

export const readinessSchema = z.object({
  ready: z.boolean(),
  checks: z.object({ database: readinessCheckSchema, jobQueue: readinessCheckSchema, migrations: readinessCheckSchema }),
  /** one line per failed check, for a person reading the probe's answer */
  problems: z.array(z.string()),
});
export type Readiness = z.infer<typeof readinessSchema>;
