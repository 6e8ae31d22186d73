"use client";
import { useCallback, useEffect, useRef, useState, type PointerEvent as ReactPointerEvent } from "react";

export const MIN_SCALE = 1;
export const MAX_SCALE = 8;
const TAP_SLOP_PX = 8;
const TAP_MS = 600;

export interface View { s: number; x: number; y: number }
const FIT: View = { s: 1, x: 0, y: 0 };
const clamp = (s: number) => Math.min(MAX_SCALE, Math.max(MIN_SCALE, s));

/**
 * Zoom and pan for one picture with pointer events alone: one finger (or the mouse) pans, two fingers
 * pinch, the wheel zooms at the cursor; a short still touch is a tap. The content is transformed with
 * origin at its top-left, so a point under the fingers stays under them.
 */
export function useZoomPan(onTap?: (clientX: number, clientY: number) => void) {
  const stageRef = useRef<HTMLDivElement>(null);
  const contentRef = useRef<HTMLDivElement>(null);
  const [view, setViewState] = useState<View>(FIT);
  const viewRef = useRef<View>(FIT);
  const pointers = useRef(new Map<number, { x: number; y: number }>());
  const gesture = useRef<{ view: View; x: number; y: number; dist: number; tap: boolean; at: number } | null>(null);

  const setView = useCallback((v: View) => {
    const next = v.s <= MIN_SCALE + 0.001 ? FIT : v;
    viewRef.current = next;
    setViewState(next);
  }, []);

  /** The content's untransformed top-left, in client coordinates. */
  const origin = useCallback(() => {
    const stage = stageRef.current, content = contentRef.current;
    if (!stage || !content) return { x: 0, y: 0 };
    const r = stage.getBoundingClientRect();
    return { x: r.left + content.offsetLeft, y: r.top + content.offsetTop };
  }, []);

  /** Scale `from` to `s`, keeping the client point (cx, cy) of `from` at client point (px, py). */
  const zoomAround = useCallback((from: View, s: number, cx: number, cy: number, px = cx, py = cy): View => {
    const o = origin();
    const lx = (cx - o.x - from.x) / from.s, ly = (cy - o.y - from.y) / from.s;
    const ns = clamp(s);
    return { s: ns, x: px - o.x - ns * lx, y: py - o.y - ns * ly };
  }, [origin]);

  const zoomBy = useCallback((factor: number, cx?: number, cy?: number) => {
    const r = stageRef.current?.getBoundingClientRect();
    const x = cx ?? (r ? r.left + r.width / 2 : 0), y = cy ?? (r ? r.top + r.height / 2 : 0);
    setView(zoomAround(viewRef.current, viewRef.current.s * factor, x, y));
  }, [setView, zoomAround]);

  const fit = useCallback(() => setView(FIT), [setView]);

  useEffect(() => {
    const stage = stageRef.current;
    if (!stage) return;
    const onWheel = (e: WheelEvent) => {
      e.preventDefault();
      zoomBy(e.deltaY < 0 ? 1.15 : 1 / 1.15, e.clientX, e.clientY);
    };
    stage.addEventListener("wheel", onWheel, { passive: false });
    return () => stage.removeEventListener("wheel", onWheel);
  }, [zoomBy]);

  const start = () => {
    const pts = [...pointers.current.values()];
    const [a, b] = pts;
    const mid = b ? { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 } : a;
    gesture.current = { view: viewRef.current, x: mid.x, y: mid.y, dist: b ? Math.hypot(a.x - b.x, a.y - b.y) : 0, tap: gesture.current?.tap ?? true, at: gesture.current?.at ?? Date.now() };
  };

  const onPointerDown = (e: ReactPointerEvent<HTMLDivElement>) => {
    if (e.pointerType === "mouse" && e.button !== 0) return;
    // Pins and other controls drawn over the picture keep their own clicks.
    if ((e.target as Element).closest("button, a, input, textarea, select")) return;
    e.currentTarget.setPointerCapture(e.pointerId);
    if (pointers.current.size === 0) gesture.current = null;
    pointers.current.set(e.pointerId, { x: e.clientX, y: e.clientY });
    start();
    if (pointers.current.size > 1 && gesture.current) gesture.current.tap = false;
  };

  const onPointerMove = (e: ReactPointerEvent<HTMLDivElement>) => {
    if (!pointers.current.has(e.pointerId) || !gesture.current) return;
    pointers.current.set(e.pointerId, { x: e.clientX, y: e.clientY });
    const g = gesture.current;
    const [a, b] = [...pointers.current.values()];
    if (b && g.dist > 0) {
      const mid = { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 };
      setView(zoomAround(g.view, g.view.s * (Math.hypot(a.x - b.x, a.y - b.y) / g.dist), g.x, g.y, mid.x, mid.y));
      return;
    }
    const dx = a.x - g.x, dy = a.y - g.y;
    if (Math.hypot(dx, dy) > TAP_SLOP_PX) g.tap = false;
    if (g.view.s > MIN_SCALE && !g.tap) setView({ ...g.view, x: g.view.x + dx, y: g.view.y + dy });
  };

  const onPointerEnd = (e: ReactPointerEvent<HTMLDivElement>) => {
    if (!pointers.current.has(e.pointerId)) return;
    pointers.current.delete(e.pointerId);
    const g = gesture.current;
    if (pointers.current.size === 0) {
      if (e.type === "pointerup" && g?.tap && Date.now() - g.at < TAP_MS) onTap?.(e.clientX, e.clientY);
      gesture.current = null;
    } else {
      start(); // one finger left after a pinch: carry on panning from here
    }
  };

  return {
    stageRef, contentRef, view, zoomBy, fit,
    handlers: { onPointerDown, onPointerMove, onPointerUp: onPointerEnd, onPointerCancel: onPointerEnd },
  };
}
