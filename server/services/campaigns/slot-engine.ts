// The real slot finder and campaign scheduler behind the SlotEngine port (engine.ts).
import { campaignIssues, scheduleCampaign } from '../../../planner/campaign/schedule-campaign';
import { checkSlotGroups, checkSlotRequest, elementsClash, findSlots, findSlotsForGroups } from '../slots/find-slots';
import type { SlotEngine } from './engine';

export const slotEngine: SlotEngine = {
  checkSlotRequest, checkSlotGroups, findSlots, findSlotsForGroups, elementsClash,
  scheduleCampaign, campaignIssues,
};
