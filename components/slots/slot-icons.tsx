// Navigation icons for the slot finder and the campaigns, drawn like the others in components/icons.tsx.
import Svg, { Circle, Path, Rect } from 'react-native-svg';
import { colors } from '@/constants/theme';

type IconProps = { size?: number; color?: string };

/** Find a slot: a magnifier over a short bar, the slot being looked for. */
export function SlotIcon({ size = 24, color = colors.ink }: IconProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" fill="none">
      <Circle cx={10.5} cy={10.5} r={6.5} stroke={color} strokeWidth={1.8} />
      <Path d="M15.5 15.5 L20.5 20.5" stroke={color} strokeWidth={2.2} strokeLinecap="round" />
      <Path d="M7.5 10.5 H13.5" stroke={color} strokeWidth={2.6} strokeLinecap="round" />
    </Svg>
  );
}

/** Campaigns: three bars on staggered nights, one rollout across the calendar. */
export function CampaignIcon({ size = 24, color = colors.ink }: IconProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" fill="none">
      <Rect x={3.5} y={4} width={17} height={16.5} rx={2} stroke={color} strokeWidth={1.8} />
      <Path d="M6.5 8.5 H10.5 M10 12.5 H14 M13.5 16.5 H17.5" stroke={color} strokeWidth={2.4} strokeLinecap="round" />
    </Svg>
  );
}
