// Drag to pan and pinch to zoom, via the responder system (touch on phones, mouse on the web).
// A press that turned into a drag must not also select the element it started on: `wasDragged` tells the map.
import { useMemo, useRef } from 'react';
import { PanResponder, type GestureResponderEvent } from 'react-native';
import { panBy, zoomAround, type MapView } from '@/components/map/map-view';

type Size = { widthPx: number; heightPx: number };
type Options = { view: MapView; size: Size; setView: (view: MapView) => void };

/** Movement (px) before a press counts as a drag; below it, the press stays a tap on a site or span. */
const DRAG_THRESHOLD_PX = 6;

function touchDistance(event: GestureResponderEvent): number | null {
  const touches = event.nativeEvent.touches;
  if (!touches || touches.length < 2) return null;
  return Math.hypot(touches[0].pageX - touches[1].pageX, touches[0].pageY - touches[1].pageY);
}

export function useMapGestures({ view, size, setView }: Options) {
  // The responder is created once; refs carry the latest view and size into its callbacks.
  const latest = useRef({ view, size, setView });
  latest.current = { view, size, setView };
  const gesture = useRef({ startView: view, startDistance: null as number | null, dragged: false });

  const responder = useMemo(
    () =>
      PanResponder.create({
        // Every new press starts as a tap; never claims the press itself, so sites and spans still get it.
        onStartShouldSetPanResponderCapture: () => {
          gesture.current.dragged = false;
          return false;
        },
        onMoveShouldSetPanResponderCapture: (_e, g) =>
          g.numberActiveTouches > 1 || Math.abs(g.dx) + Math.abs(g.dy) > DRAG_THRESHOLD_PX,
        onPanResponderGrant: (e) => {
          gesture.current = { startView: latest.current.view, startDistance: touchDistance(e), dragged: true };
        },
        onPanResponderMove: (e, g) => {
          const { size: s, setView: set } = latest.current;
          const distance = touchDistance(e);
          const start = gesture.current;
          if (distance !== null && start.startDistance === null) start.startDistance = distance;
          if (distance !== null && start.startDistance) {
            // Pinch: zoom about the middle of the map; fingers rarely agree on a better point.
            set(zoomAround(start.startView, distance / start.startDistance, { x: s.widthPx / 2, y: s.heightPx / 2 }));
            return;
          }
          set(panBy(start.startView, g.dx, g.dy, s));
        },
        onPanResponderTerminationRequest: () => false,
      }),
    [],
  );

  return {
    panHandlers: responder.panHandlers,
    /** True once, after a drag ended: swallows the click the browser sends at the end of it. */
    takeDragged: () => {
      const dragged = gesture.current.dragged;
      gesture.current.dragged = false;
      return dragged;
    },
  };
}
