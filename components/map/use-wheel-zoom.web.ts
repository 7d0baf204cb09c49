// Web: the mouse wheel (or a trackpad's two-finger scroll) zooms about the pointer.
// WARNING: the listener is added by hand as non-passive; React's onWheel is passive and cannot stop the page scrolling.
import { useEffect, useRef, type RefObject } from 'react';
import type { View } from 'react-native';
import type { Point } from '@/components/map/projection';

/** Zoom factor per pixel of wheel travel: one notch (~100 px) zooms by about 1.16. */
const ZOOM_PER_WHEEL_PX = 0.0015;

export function useWheelZoom(target: RefObject<View | null>, onZoom: (factor: number, focus: Point) => void): void {
  const handler = useRef(onZoom);
  handler.current = onZoom;
  useEffect(() => {
    // On the web a View's ref is its DOM element.
    const element = target.current as unknown as HTMLElement | null;
    if (!element) return undefined;
    const onWheel = (event: WheelEvent) => {
      event.preventDefault();
      const box = element.getBoundingClientRect();
      // Lines (deltaMode 1) are roughly 16 px each.
      const deltaPx = event.deltaMode === 1 ? event.deltaY * 16 : event.deltaY;
      handler.current(Math.exp(-deltaPx * ZOOM_PER_WHEEL_PX), { x: event.clientX - box.left, y: event.clientY - box.top });
    };
    element.addEventListener('wheel', onWheel, { passive: false });
    return () => element.removeEventListener('wheel', onWheel);
  }, [target]);
}
