// A planner changes a draft campaign: a new title, or windows moved to other usable starts of their groups (each
// checked against the stored slots, then the whole assignment against the campaign's rules); or discards it.
// Optimistic locking: the version sent must be the row's.
import type { Db, Tx } from '../../../db/client';
import type { Me } from '../../../shared/api';
import type { CampaignPatch } from '../../../shared/slots';
import { insertAuditEntry } from '../../queries/audit/audit-log';
import { lockCampaign, updateCampaign, type CampaignRow } from '../../queries/slots/campaign-rows';
import { scheduleOf } from './campaign-view';
import type { SlotEngine } from './engine';
import { CampaignNotDraftError, CampaignNotFoundError, CampaignRulesError, CampaignStaleError } from './errors';
import { problemOf, type CampaignRequest, type StoredSchedule } from './stored-schedule';

/** The locked row, when it is a draft of the version the planner read. */
export async function lockDraft(tx: Tx, id: string, version: number): Promise<CampaignRow & { schedule: StoredSchedule }> {
  const row = await lockCampaign(tx, id);
  if (!row) throw new CampaignNotFoundError(id);
  if (row.version !== version) throw new CampaignStaleError();
  const schedule = scheduleOf(row);
  if (row.status !== 'draft' || !schedule) throw new CampaignNotDraftError(row.status);
  return { ...row, schedule };
}

/** The moves applied to the assignment, or every problem with them and with the rules afterwards. */
export function movedAssignment(
  engine: Pick<SlotEngine, 'campaignIssues'>, s: StoredSchedule, request: CampaignRequest, moves: NonNullable<CampaignPatch['windows']>,
): (number | null)[] {
  const assignment = [...s.assignment];
  const issues: string[] = [];
  for (const move of moves) {
    const group = s.groups[move.group];
    if (!group) {
      issues.push(`The campaign has no group ${move.group + 1}.`);
      continue;
    }
    const at = Date.parse(move.start);
    const index = group.slots.findIndex((slot) => slot.startMs === at);
    if (index < 0) issues.push(`Group "${group.label}" cannot start then: pick one of its usable starts.`);
    else assignment[move.group] = index;
  }
  if (issues.length === 0) issues.push(...engine.campaignIssues(problemOf(s, request), assignment));
  if (issues.length > 0) throw new CampaignRulesError(issues);
  return assignment;
}

export async function patchCampaign(
  deps: { db: Db; engine: Pick<SlotEngine, 'campaignIssues'>; now: Date }, id: string, patch: CampaignPatch, user: Me,
): Promise<void> {
  await deps.db.transaction(async (tx) => {
    const row = await lockDraft(tx, id, patch.version);
    const request = row.request as CampaignRequest;
    const schedule = patch.windows
      ? { ...row.schedule, assignment: movedAssignment(deps.engine, row.schedule, request, patch.windows) }
      : undefined;
    const version = await updateCampaign(tx, id, { title: patch.title, schedule, now: deps.now });
    const moved = (patch.windows ?? []).map((w) => row.schedule.groups[w.group].label);
    await insertAuditEntry(tx, {
      actorId: user.id, action: 'campaign.update', entity: 'campaign', entityId: id, at: deps.now,
      before: { title: row.title, version: row.version },
      after: { title: patch.title ?? row.title, version, ...(moved.length > 0 ? { movedWindows: moved.join(', ') } : {}) },
    });
  });
}

export async function discardCampaign(deps: { db: Db; now: Date }, id: string, version: number | null, user: Me): Promise<void> {
  await deps.db.transaction(async (tx) => {
    const current = await lockCampaign(tx, id);
    if (!current) throw new CampaignNotFoundError(id);
    const row = await lockDraft(tx, id, version ?? current.version);
    await updateCampaign(tx, id, { status: 'discarded', now: deps.now });
    await insertAuditEntry(tx, {
      actorId: user.id, action: 'campaign.discard', entity: 'campaign', entityId: id, at: deps.now,
      before: { status: 'draft', title: row.title }, after: { status: 'discarded', title: row.title },
    });
  });
}
