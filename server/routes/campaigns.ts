// /api/campaigns: planners plan a campaign of windows (a job), change its draft, book all its windows at once or
// discard it; planners, admins and engineers read campaigns (the calendar overlays drafts). Tenants see nothing
// (404, as if the route did not exist); other staff without the role get 403.
import express, { type Request, type Router } from 'express';
import { z } from 'zod';
import { CAMPAIGN_PLANNER_ROLES, CAMPAIGN_READER_ROLES } from '../../shared/permissions';
import {
  CAMPAIGN_STATUSES, campaignBookedSchema, campaignBookSchema, campaignCreateSchema, campaignListSchema, campaignPatchSchema,
  campaignSchema, createdIdSchema, type CampaignStatus,
} from '../../shared/slots';
import { currentUser, staffOnlyRoute } from '../auth/guards';
import { bookCampaign } from '../services/campaigns/book-campaign';
import { getCampaign, listCampaigns } from '../services/campaigns/campaign-reads';
import { discardCampaign, patchCampaign } from '../services/campaigns/change-campaign';
import { createCampaign } from '../services/campaigns/create-campaign';
import type { SlotEngine } from '../services/campaigns/engine';
import { slotEngine } from '../services/campaigns/slot-engine';
import type { RouteDeps } from './deps';

const planners = staffOnlyRoute(...CAMPAIGN_PLANNER_ROLES);
const readers = staffOnlyRoute(...CAMPAIGN_READER_ROLES);
const idOf = (req: Request) => String(req.params.id);

/** Every status but discarded when none is asked for. */
const LISTED_BY_DEFAULT: CampaignStatus[] = CAMPAIGN_STATUSES.filter((s) => s !== 'discarded');

const listQuerySchema = z.object({
  /** one status, or several separated by commas */
  status: z.string().optional().transform((v, ctx) => {
    if (v === undefined || v === '') return null;
    const asked = v.split(',').map((s) => s.trim());
    const unknown = asked.filter((s) => !(CAMPAIGN_STATUSES as readonly string[]).includes(s));
    if (unknown.length > 0) {
      ctx.addIssue({ code: 'custom', message: `must be one of ${CAMPAIGN_STATUSES.join(', ')} (or several, separated by commas)` });
      return z.NEVER;
    }
    return asked as CampaignStatus[];
  }),
  from: z.iso.datetime({ offset: true, message: 'must be an ISO 8601 date-time with a time-zone offset' }).optional(),
  to: z.iso.datetime({ offset: true, message: 'must be an ISO 8601 date-time with a time-zone offset' }).optional(),
});
const discardSchema = z.object({ version: z.number().int().min(1).optional() });

export function campaignsRouter({ db, now, jobs, config, engine = slotEngine }: RouteDeps & { engine?: SlotEngine }): Router {
  const router = express.Router();
  router.post('/', ...planners, async (req, res) => {
    const input = campaignCreateSchema.parse(req.body ?? {});
    const id = await createCampaign({ db, jobs, engine, limits: config.waitingJobLimits, now: now() }, input, currentUser(req));
    res.status(201).json(createdIdSchema.parse({ id }));
  });
  router.get('/', ...readers, async (req, res) => {
    const q = listQuerySchema.parse(req.query);
    const campaigns = await listCampaigns(db, {
      statuses: q.status ?? LISTED_BY_DEFAULT, fromMs: q.from ? Date.parse(q.from) : null, toMs: q.to ? Date.parse(q.to) : null,
    });
    res.json(campaignListSchema.parse({ campaigns }));
  });
  router.get('/:id', ...readers, async (req, res) => {
    res.json(campaignSchema.parse(await getCampaign(db, idOf(req))));
  });
  router.patch('/:id', ...planners, async (req, res) => {
    const patch = campaignPatchSchema.parse(req.body ?? {});
    await patchCampaign({ db, engine, now: now() }, idOf(req), patch, currentUser(req));
    res.json(campaignSchema.parse(await getCampaign(db, idOf(req))));
  });
  router.post('/:id/book', ...planners, async (req, res) => {
    const { version } = campaignBookSchema.parse(req.body ?? {});
    const windowIds = await bookCampaign({ db, now: now() }, idOf(req), version, currentUser(req));
    res.status(201).json(campaignBookedSchema.parse({ campaign: await getCampaign(db, idOf(req)), windowIds }));
  });
  router.delete('/:id', ...planners, async (req, res) => {
    const { version } = discardSchema.parse(req.body ?? {});
    await discardCampaign({ db, now: now() }, idOf(req), version ?? null, currentUser(req));
    res.json(campaignSchema.parse(await getCampaign(db, idOf(req))));
  });
  return router;
}
