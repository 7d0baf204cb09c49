// API contract for freezes: periods in which no window may be booked (admins write, staff read).
import { z } from 'zod';

const isoInstant = z.iso.datetime({ offset: true, message: 'must be an ISO 8601 date-time with a time-zone offset' });

const freezeFields = {
  title: z.string().trim().min(1, 'Give the freeze a title').max(200),
  startsAt: isoInstant,
  endsAt: isoInstant,
  reason: z.string().trim().max(2000).nullish(),
};
const endsAfterStart = (f: { startsAt?: string; endsAt?: string }) =>
  f.startsAt === undefined || f.endsAt === undefined || Date.parse(f.endsAt) > Date.parse(f.startsAt);
const endsAfterStartIssue = { message: 'The freeze must end after it starts.', path: ['endsAt'] };

export const freezeCreateSchema = z.object(freezeFields).refine(endsAfterStart, endsAfterStartIssue);
export type FreezeCreate = z.infer<typeof freezeCreateSchema>;

export const freezePatchSchema = z.object(freezeFields).partial().refine(endsAfterStart, endsAfterStartIssue);
export type FreezePatch = z.infer<typeof freezePatchSchema>;

export const freezeSchema = z.object({
  id: z.string(),
  title: z.string(),
  startsAt: z.string(),
  endsAt: z.string(),
  reason: z.string().nullable(),
  createdBy: z.string().nullable(),
  createdAt: z.string(),
});
export type Freeze = z.infer<typeof freezeSchema>;

export const freezeListSchema = z.object({ freezes: z.array(freezeSchema) });
