// Native builds have no mouse wheel; the web sibling (use-wheel-zoom.web.ts) zooms with it.
import type { RefObject } from 'react';
import type { View } from 'react-native';
import type { Point } from '@/components/map/projection';

export function useWheelZoom(_target: RefObject<View | null>, _onZoom: (factor: number, focus: Point) => void): void {
  // Intentionally empty: pinch and the +/− buttons serve touch screens.
}
