// Diagonal hatching over a frozen day, so a freeze reads as "closed" even without colour; and the lighter hatching
// inside a draft campaign's bar.
import { StyleSheet } from 'react-native';
import Svg, { Defs, Line, Pattern, Rect } from 'react-native-svg';
import { calendarColors } from '@/constants/theme';

const HATCH_SPACING_PX = 7;

export function FreezeHatch() {
  return (
    <Svg style={StyleSheet.absoluteFill} width="100%" height="100%" pointerEvents="none">
      <Defs>
        <Pattern
          id="slackwater-freeze-hatch"
          patternUnits="userSpaceOnUse"
          width={HATCH_SPACING_PX}
          height={HATCH_SPACING_PX}
          patternTransform="rotate(45)"
        >
          <Line x1={0} y1={0} x2={0} y2={HATCH_SPACING_PX} stroke={calendarColors.freezeHatch} strokeWidth={1.5} />
        </Pattern>
      </Defs>
      <Rect x={0} y={0} width="100%" height="100%" fill={calendarColors.freezeWash} />
      <Rect x={0} y={0} width="100%" height="100%" fill="url(#slackwater-freeze-hatch)" opacity={0.55} />
    </Svg>
  );
}

const DRAFT_HATCH_SPACING_PX = 5;

/** Light hatching inside a draft campaign's bar: not booked yet, like a pencilled-in slot. */
export function DraftHatch() {
  return (
    <Svg style={StyleSheet.absoluteFill} width="100%" height="100%" pointerEvents="none">
      <Defs>
        <Pattern id="slackwater-draft-hatch" patternUnits="userSpaceOnUse" width={DRAFT_HATCH_SPACING_PX} height={DRAFT_HATCH_SPACING_PX} patternTransform="rotate(-45)">
          <Line x1={0} y1={0} x2={0} y2={DRAFT_HATCH_SPACING_PX} stroke={calendarColors.status.draft} strokeWidth={1} />
        </Pattern>
      </Defs>
      <Rect x={0} y={0} width="100%" height="100%" fill="url(#slackwater-draft-hatch)" opacity={0.35} />
    </Svg>
  );
}
