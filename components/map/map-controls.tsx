// Zoom in, zoom out and "whole network" buttons: 44 px targets that work with touch, mouse and keyboard alike.
import { Pressable, StyleSheet, View } from 'react-native';
import Svg, { Path } from 'react-native-svg';
import { colors, radii, space } from '@/constants/theme';

type Props = {
  onZoomIn: () => void;
  onZoomOut: () => void;
  onReset: () => void;
  canZoomOut: boolean;
  /** A row along the top (narrow maps, where a column would cover the network) instead of a column. */
  row?: boolean;
};

/** Height the row of buttons takes at the top of a narrow map, so the fitted network can stay clear of it. */
export const CONTROLS_ROW_HEIGHT_PX = 44 + 8 + 4;

const ICONS = {
  in: 'M12 6 V18 M6 12 H18',
  out: 'M6 12 H18',
  // Four corners pulling outwards: "fit everything".
  reset: 'M5 9 V5 H9 M15 5 H19 V9 M19 15 V19 H15 M9 19 H5 V15',
} as const;

function ControlButton({ icon, label, testID, onPress, disabled = false }: {
  icon: keyof typeof ICONS; label: string; testID: string; onPress: () => void; disabled?: boolean;
}) {
  return (
    <Pressable
      testID={testID}
      role="button"
      accessibilityLabel={label}
      aria-label={label}
      aria-disabled={disabled}
      disabled={disabled}
      onPress={onPress}
      style={({ pressed }) => [styles.button, pressed && styles.pressed, disabled && styles.disabled]}
    >
      <Svg width={22} height={22} viewBox="0 0 24 24" fill="none">
        <Path d={ICONS[icon]} stroke={colors.ink} strokeWidth={2} strokeLinecap="round" strokeLinejoin="round" />
      </Svg>
    </Pressable>
  );
}

export function MapControls({ onZoomIn, onZoomOut, onReset, canZoomOut, row = false }: Props) {
  const ruleStyle = row ? styles.ruleRow : styles.rule;
  return (
    <View style={[styles.stack, row && styles.stackRow]}>
      <ControlButton icon="in" label="Zoom in" testID="map-zoom-in" onPress={onZoomIn} />
      <View style={ruleStyle} />
      <ControlButton icon="out" label="Zoom out" testID="map-zoom-out" onPress={onZoomOut} disabled={!canZoomOut} />
      <View style={ruleStyle} />
      <ControlButton icon="reset" label="Show the whole network" testID="map-reset" onPress={onReset} disabled={!canZoomOut} />
    </View>
  );
}

const styles = StyleSheet.create({
  stack: {
    position: 'absolute',
    top: space.sm,
    right: space.sm,
    backgroundColor: colors.surface,
    borderRadius: radii.md,
    borderWidth: 1,
    borderColor: colors.border,
    overflow: 'hidden',
  },
  button: { width: 44, height: 44, alignItems: 'center', justifyContent: 'center' },
  pressed: { backgroundColor: colors.primarySoft },
  disabled: { opacity: 0.35 },
  stackRow: { flexDirection: 'row' },
  rule: { height: 1, backgroundColor: colors.border },
  ruleRow: { width: 1, backgroundColor: colors.border },
});
