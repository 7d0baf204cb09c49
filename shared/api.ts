// API contract shared by the server and the app: request and response schemas.
import { z } from 'zod';

export const ROLE_NAMES = ['admin', 'engineer', 'planner', 'approver', 'tenant'] as const;
export const roleSchema = z.enum(ROLE_NAMES);
export type RoleName = z.infer<typeof roleSchema>;

export const apiErrorSchema = z.object({
  error: z.object({ code: z.string(), message: z.string() }),
});
export type ApiErrorBody = z.infer<typeof apiErrorSchema>;

/** GET /api/health (liveness): the process answers. Readiness is shared/readiness.ts. */
export const healthSchema = z.object({ ok: z.literal(true) });

export const signInRequestSchema = z.object({
  email: z.email('Enter a valid e-mail address').max(254),
  password: z.string().min(1, 'Enter your password').max(1024),
});
export type SignInRequest = z.infer<typeof signInRequestSchema>;

export const meSchema = z.object({
  id: z.string(),
  email: z.string(),
  name: z.string(),
  roles: z.array(roleSchema),
  tenantId: z.string().nullable(),
  /** the IANA zone this user reads times in: their own choice, else the network's zone (shared/time-zone.ts) */
  timeZone: z.string().optional(),
  /** whether `timeZone` is the user's own choice rather than the network's default */
  timeZoneChosen: z.boolean().optional(),
});
export type Me = z.infer<typeof meSchema>;

export const signInResponseSchema = z.object({ user: meSchema });

/** Figures on the overview screen; for a tenant user every count covers its own data only. */
export const overviewSchema = z.object({
  sites: z.number().int(),
  spans: z.number().int(),
  tenants: z.number().int(),
  slices: z.number().int(),
  criticalSlices: z.number().int(),
  windowsNext30Days: z.number().int(),
  nextWindows: z.array(
    z.object({ id: z.string(), title: z.string(), startsAt: z.string(), endsAt: z.string(), status: z.string() }),
  ),
});
export type Overview = z.infer<typeof overviewSchema>;

/** One problem found in a scenario, located by a JSON path such as `$.slices[3].ties[0].to`. */
export const scenarioIssueSchema = z.object({ path: z.string(), message: z.string() });

/** POST /api/scenarios/validate (admin, planner): always 200; `ok` is false when there are errors. */
export const scenarioValidationSchema = z.object({
  ok: z.boolean(),
  errors: z.array(scenarioIssueSchema),
  warnings: z.array(scenarioIssueSchema),
});
export type ScenarioValidation = z.infer<typeof scenarioValidationSchema>;
