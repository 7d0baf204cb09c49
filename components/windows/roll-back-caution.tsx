// The critical-slice caution inside the roll-back confirmation: rolling back moves slices again, so when the
// window's impact names critical slices (emergency, health, utilities) the usual caution comes first, naming them.
import { CriticalCaution } from '@/components/critical-caution';
import { useWindowImpactQuery } from '@/hooks/queries/windows';

export function RollBackCaution({ windowId }: { windowId: string }) {
  const impact = useWindowImpactQuery(windowId);
  const critical = (impact.data?.affected ?? []).filter((s) => s.critical).map((s) => s.name);
  if (critical.length === 0) return null;
  return (
    <CriticalCaution
      title="Critical slices move again"
      lead={`Rolling back moves these critical slices back as well: ${critical.join(', ')}.`}
      testID="window-roll-back-critical"
    />
  );
}
