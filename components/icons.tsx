// Slackwater's own line icons and logo mark, drawn on a 24-unit grid with react-native-svg.
import Svg, { Circle, Path, Rect } from 'react-native-svg';
import { colors } from '@/constants/theme';

type IconProps = { size?: number; color?: string };

/** Logo: a still tide line under a single slow swell, inside a rounded square. */
export function LogoMark({ size = 32 }: { size?: number }) {
  return (
    <Svg width={size} height={size} viewBox="0 0 32 32">
      <Rect x={0} y={0} width={32} height={32} rx={8} fill={colors.primary} />
      <Path d="M6 14 C10 9, 14 9, 16 13 S22 17, 26 12" stroke={colors.onPrimary} strokeWidth={2.4} fill="none" strokeLinecap="round" />
      <Path d="M6 21 H26" stroke={colors.buoy} strokeWidth={2.4} strokeLinecap="round" />
    </Svg>
  );
}

/** Overview: four tiles of different weight, like a dashboard seen from afar. */
export function OverviewIcon({ size = 24, color = colors.ink }: IconProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" fill="none">
      <Rect x={3.5} y={3.5} width={7} height={9} rx={1.5} stroke={color} strokeWidth={1.8} />
      <Rect x={13.5} y={3.5} width={7} height={5} rx={1.5} stroke={color} strokeWidth={1.8} />
      <Rect x={13.5} y={11.5} width={7} height={9} rx={1.5} stroke={color} strokeWidth={1.8} />
      <Rect x={3.5} y={15.5} width={7} height={5} rx={1.5} stroke={color} strokeWidth={1.8} />
    </Svg>
  );
}

/** Sign out: a door frame with an arrow leaving it. */
export function SignOutIcon({ size = 20, color = colors.ink }: IconProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" fill="none">
      <Path d="M10 4 H5.5 A1.5 1.5 0 0 0 4 5.5 V18.5 A1.5 1.5 0 0 0 5.5 20 H10" stroke={color} strokeWidth={1.8} strokeLinecap="round" />
      <Path d="M10 12 H20 M16.5 8.5 L20 12 L16.5 15.5" stroke={color} strokeWidth={1.8} strokeLinecap="round" strokeLinejoin="round" />
    </Svg>
  );
}

/** Person: for the signed-in user's badge. */
export function PersonIcon({ size = 20, color = colors.ink }: IconProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" fill="none">
      <Circle cx={12} cy={8.5} r={3.8} stroke={color} strokeWidth={1.8} />
      <Path d="M4.5 20 C5.5 15.8, 8.5 14, 12 14 S18.5 15.8, 19.5 20" stroke={color} strokeWidth={1.8} strokeLinecap="round" />
    </Svg>
  );
}

/** Map: three sites joined by spans along a wavy coast. */
export function MapIcon({ size = 24, color = colors.ink }: IconProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" fill="none">
      <Path d="M3 19 C6 16.5, 8 20, 11 18 S17 15.5, 21 17.5" stroke={color} strokeWidth={1.4} strokeLinecap="round" opacity={0.55} />
      <Path d="M6 12 L12 5.5 L18 11" stroke={color} strokeWidth={1.8} strokeLinecap="round" strokeLinejoin="round" />
      <Path d="M12 3 L14.2 5.5 L12 8 L9.8 5.5 Z" stroke={color} strokeWidth={1.6} strokeLinejoin="round" />
      <Rect x={4} y={10} width={4} height={4} stroke={color} strokeWidth={1.6} />
      <Circle cx={18} cy={11} r={2} stroke={color} strokeWidth={1.6} />
    </Svg>
  );
}

/** Calendar: a month page with one window drawn as a bar across three days. */
export function CalendarIcon({ size = 24, color = colors.ink }: IconProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" fill="none">
      <Rect x={3.5} y={5} width={17} height={15.5} rx={2} stroke={color} strokeWidth={1.8} />
      <Path d="M3.5 9.5 H20.5 M8 3 V6.5 M16 3 V6.5" stroke={color} strokeWidth={1.8} strokeLinecap="round" />
      <Path d="M7 14 H15" stroke={color} strokeWidth={2.6} strokeLinecap="round" />
    </Svg>
  );
}

/** Freeze: a six-armed ice crystal. */
export function FreezeIcon({ size = 24, color = colors.ink }: IconProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" fill="none">
      <Path d="M12 3 V21 M4.2 7.5 L19.8 16.5 M4.2 16.5 L19.8 7.5" stroke={color} strokeWidth={1.8} strokeLinecap="round" />
      <Path d="M9.5 4.5 L12 7 L14.5 4.5 M9.5 19.5 L12 17 L14.5 19.5" stroke={color} strokeWidth={1.5} strokeLinecap="round" strokeLinejoin="round" />
    </Svg>
  );
}

/** Network: three sites joined by spans, one of them a hub. */
export function NetworkIcon({ size = 24, color = colors.ink }: IconProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" fill="none">
      <Path d="M6 7 L12 15 L18 6 M6 7 L18 6 M12 15 L17 19" stroke={color} strokeWidth={1.6} strokeLinecap="round" />
      <Circle cx={6} cy={7} r={2.4} fill={colors.surface} stroke={color} strokeWidth={1.8} />
      <Circle cx={18} cy={6} r={2.4} fill={colors.surface} stroke={color} strokeWidth={1.8} />
      <Rect x={9.6} y={12.6} width={4.8} height={4.8} rx={1} fill={colors.surface} stroke={color} strokeWidth={1.8} />
      <Circle cx={17.5} cy={19.5} r={1.6} fill={color} />
    </Svg>
  );
}

/** Slices: three thin layers stacked over one another, like slices riding the same network. */
export function SlicesIcon({ size = 24, color = colors.ink }: IconProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" fill="none">
      <Path d="M12 4 L20 8 L12 12 L4 8 Z" stroke={color} strokeWidth={1.8} strokeLinejoin="round" />
      <Path d="M4 12 L12 16 L20 12" stroke={color} strokeWidth={1.8} strokeLinecap="round" strokeLinejoin="round" />
      <Path d="M4 16 L12 20 L20 16" stroke={color} strokeWidth={1.8} strokeLinecap="round" strokeLinejoin="round" />
    </Svg>
  );
}

/** Imports: a sheet dropping into an open tray. */
export function ImportIcon({ size = 24, color = colors.ink }: IconProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" fill="none">
      <Path d="M12 3.5 V13 M8.5 9.5 L12 13 L15.5 9.5" stroke={color} strokeWidth={1.8} strokeLinecap="round" strokeLinejoin="round" />
      <Path d="M4 14 V18.5 A1.5 1.5 0 0 0 5.5 20 H18.5 A1.5 1.5 0 0 0 20 18.5 V14" stroke={color} strokeWidth={1.8} strokeLinecap="round" />
    </Svg>
  );
}

/** More: three buoys in a row, for the areas kept behind the phone's More tab. */
export function MoreIcon({ size = 24, color = colors.ink }: IconProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" fill="none">
      <Circle cx={5.5} cy={12} r={1.9} stroke={color} strokeWidth={1.8} />
      <Circle cx={12} cy={12} r={1.9} stroke={color} strokeWidth={1.8} />
      <Circle cx={18.5} cy={12} r={1.9} stroke={color} strokeWidth={1.8} />
    </Svg>
  );
}

/** Outbox: an envelope with its flap open and a letter leaving it. */
export function OutboxIcon({ size = 24, color = colors.ink }: IconProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" fill="none">
      <Path d="M4 10 V18.5 A1.5 1.5 0 0 0 5.5 20 H18.5 A1.5 1.5 0 0 0 20 18.5 V10" stroke={color} strokeWidth={1.8} strokeLinejoin="round" />
      <Path d="M4 10 L12 15 L20 10" stroke={color} strokeWidth={1.8} strokeLinecap="round" strokeLinejoin="round" />
      <Path d="M12 11 V3.5 M9 6.5 L12 3.5 L15 6.5" stroke={color} strokeWidth={1.8} strokeLinecap="round" strokeLinejoin="round" />
    </Svg>
  );
}

/** Sign-off: a seal with a tick, the change board's mark on a plan. */
export function SignoffIcon({ size = 24, color = colors.ink }: IconProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" fill="none">
      <Circle cx={12} cy={10} r={6.5} stroke={color} strokeWidth={1.8} />
      <Path d="M9 10 L11.2 12.2 L15 8.2" stroke={color} strokeWidth={1.8} strokeLinecap="round" strokeLinejoin="round" />
      <Path d="M8.5 15.5 L7 21 L12 19 L17 21 L15.5 15.5" stroke={color} strokeWidth={1.8} strokeLinejoin="round" />
    </Svg>
  );
}

/** Notices: a folded letter with a bell-shaped mark, what a tenant is told about planned work. */
export function NoticeIcon({ size = 24, color = colors.ink }: IconProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" fill="none">
      <Rect x={3.5} y={5} width={17} height={14} rx={1.8} stroke={color} strokeWidth={1.8} />
      <Path d="M12 8.5 C10 8.5, 9.2 10, 9.2 11.5 V13.5 L8 15 H16 L14.8 13.5 V11.5 C14.8 10, 14 8.5, 12 8.5 Z" stroke={color} strokeWidth={1.6} strokeLinejoin="round" />
      <Path d="M11 16.6 H13" stroke={color} strokeWidth={1.6} strokeLinecap="round" />
    </Svg>
  );
}

/** Audit trail: a ruled ledger page with a magnifying lens over its lines. */
export function AuditIcon({ size = 24, color = colors.ink }: IconProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" fill="none">
      <Path d="M14 20 H5.5 A1.5 1.5 0 0 1 4 18.5 V4.5 A1.5 1.5 0 0 1 5.5 3 H15.5 A1.5 1.5 0 0 1 17 4.5 V9" stroke={color} strokeWidth={1.8} strokeLinejoin="round" />
      <Path d="M7.5 7.5 H13.5 M7.5 11 H11.5 M7.5 14.5 H10" stroke={color} strokeWidth={1.8} strokeLinecap="round" />
      <Circle cx={16} cy={15} r={3.5} stroke={color} strokeWidth={1.8} />
      <Path d="M18.5 17.5 L21 20" stroke={color} strokeWidth={1.8} strokeLinecap="round" />
    </Svg>
  );
}
