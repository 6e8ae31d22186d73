"use client";

import { useEffect, useRef, type Dispatch, type PointerEvent, type SetStateAction } from "react";
import { tilt, turn, zoomBy, type Orbit } from "./orbit";

/**
 * Drag to turn (and, with a mouse or pen, tilt); wheel or pinch to zoom. Every one of these has a
 * button too. Vertical touch drags are left to the page so it still scrolls on a phone.
 */
export function useOrbitDrag(setOrbit: Dispatch<SetStateAction<Orbit>>) {
  const ref = useRef<HTMLDivElement>(null);
  const pointers = useRef(new Map<number, { x: number; y: number }>());
  const pinch = useRef<number | null>(null);

  useEffect(() => {
    const el = ref.current;
    if (!el) return;
    const onWheel = (e: WheelEvent) => {
      e.preventDefault();
      setOrbit((o) => zoomBy(o, Math.exp(-e.deltaY * 0.0015)));
    };
    el.addEventListener("wheel", onWheel, { passive: false });
    return () => el.removeEventListener("wheel", onWheel);
  }, [setOrbit]);

  const onPointerDown = (e: PointerEvent<HTMLDivElement>) => {
    pointers.current.set(e.pointerId, { x: e.clientX, y: e.clientY });
    if (pointers.current.size === 2) pinch.current = spread(pointers.current);
  };

  const onPointerMove = (e: PointerEvent<HTMLDivElement>) => {
    const last = pointers.current.get(e.pointerId);
    if (!last) return;
    const dx = e.clientX - last.x;
    const dy = e.clientY - last.y;
    pointers.current.set(e.pointerId, { x: e.clientX, y: e.clientY });
    if (pointers.current.size === 2 && pinch.current) {
      const now = spread(pointers.current);
      const factor = now / pinch.current;
      pinch.current = now;
      setOrbit((o) => zoomBy(o, factor));
      return;
    }
    if (pointers.current.size !== 1) return;
    const vertical = e.pointerType === "touch" ? 0 : dy * 0.3;
    setOrbit((o) => tilt(turn(o, -dx * 0.5), vertical));
  };

  const onPointerEnd = (e: PointerEvent<HTMLDivElement>) => {
    pointers.current.delete(e.pointerId);
    if (pointers.current.size < 2) pinch.current = null;
  };

  return {
    ref,
    handlers: {
      onPointerDown,
      onPointerMove,
      onPointerUp: onPointerEnd,
      onPointerCancel: onPointerEnd,
      onPointerLeave: onPointerEnd,
    },
  };
}

function spread(m: Map<number, { x: number; y: number }>): number {
  const [a, b] = [...m.values()];
  return Math.max(1, Math.hypot(a.x - b.x, a.y - b.y));
}
