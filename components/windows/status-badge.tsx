// A window's status as a small coloured pill, in the calendar's status tones.
import type { WindowStatus } from '@/shared/windows';
import { STATUS_LABELS } from '@/components/windows/lifecycle';
import { StatusPill } from '@/components/status-pill';
import { calendarColors } from '@/constants/theme';

export function StatusBadge({ status, testID }: { status: WindowStatus; testID?: string }) {
  return <StatusPill label={STATUS_LABELS[status]} tone={calendarColors.status[status]} testID={testID} />;
}
