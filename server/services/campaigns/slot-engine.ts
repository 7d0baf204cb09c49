// The real slot finder and campaign scheduler behind the SlotEngine port (engine.ts). The scheduling runs on the
// calling thread here; the slot jobs run it in a thread of its own (server/jobs/campaign-thread.ts).
import { campaignIssues } from '../../../planner/campaign/schedule-campaign';
import { checkSlotGroups, checkSlotRequest, elementsClash, findSlots, findSlotsForGroups } from '../slots/find-slots';
import type { SlotEngine } from './engine';
import { scheduleInProcess } from './run-schedule';

export const slotEngine: SlotEngine = {
  checkSlotRequest, checkSlotGroups, findSlots, findSlotsForGroups, elementsClash,
  scheduleCampaign: scheduleInProcess, campaignIssues,
};
