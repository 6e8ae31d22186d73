"use client";
import { useRef, useState, type CSSProperties, type PointerEvent } from "react";
import { boxCentre, dragBox, dragTarget, isTap, parsePercentSelector, type AttachmentTarget, type CommentTarget, type PercentBox, type ThreadDto } from "@/models/comments";

export interface ImagePinsProps {
  attachmentId: number;
  threads: ThreadDto[];
  /** Opens a thread when its pin is tapped. */
  onOpen: (commentId: number) => void;
  /** The place picked for the comment being written, shown as a dashed pin. */
  pending?: CommentTarget | null;
  /**
   * If given, the overlay takes the pointer itself: a tap or a drag across the picture marks a place
   * (a pin or an area) and hands it over. Leave it out to keep taps for the gallery's own onImageClick.
   */
  onPickRegion?: (target: AttachmentTarget) => void;
}

// Pins keep their on-screen size when the viewer zooms (it sets --viewer-scale on the picture's box).
const unscaled: CSSProperties = { transform: "translate(-50%, -50%) scale(calc(1 / var(--viewer-scale, 1)))" };
const at = (b: PercentBox): CSSProperties => { const c = boxCentre(b); return { left: `${c.x}%`, top: `${c.y}%`, ...unscaled }; };
const area = (b: PercentBox): CSSProperties => ({ left: `${b.x}%`, top: `${b.y}%`, width: `${b.w}%`, height: `${b.h}%` });

function boxOf(t: CommentTarget | null | undefined, attachmentId: number): PercentBox | null {
  return t?.kind === "attachment" && t.attachmentId === attachmentId ? parsePercentSelector(t.selector) : null;
}

/** Numbered pins (and marked areas) for the comments on one picture, positioned in per cents of it. */
export function ImagePins({ attachmentId, threads, onOpen, pending, onPickRegion }: ImagePinsProps) {
  const layer = useRef<HTMLDivElement>(null);
  const [drag, setDrag] = useState<{ x1: number; y1: number; x2: number; y2: number } | null>(null);
  const pins = threads.flatMap((t) => { const b = boxOf(t.target, attachmentId); return b ? [{ t, b }] : []; });
  const draft = boxOf(pending, attachmentId);

  const pct = (e: PointerEvent) => {
    const r = layer.current!.getBoundingClientRect();
    return { x: ((e.clientX - r.left) / r.width) * 100, y: ((e.clientY - r.top) / r.height) * 100 };
  };
  const picking = onPickRegion ? {
    onPointerDown: (e: PointerEvent) => { if (e.target !== layer.current) return; e.stopPropagation(); e.currentTarget.setPointerCapture(e.pointerId); const p = pct(e); setDrag({ x1: p.x, y1: p.y, x2: p.x, y2: p.y }); },
    onPointerMove: (e: PointerEvent) => { if (drag) { const p = pct(e); setDrag({ ...drag, x2: p.x, y2: p.y }); } },
    onPointerUp: (e: PointerEvent) => { e.stopPropagation(); if (drag) { onPickRegion(dragTarget(attachmentId, drag.x1, drag.y1, drag.x2, drag.y2)); setDrag(null); } },
    onPointerCancel: () => setDrag(null),
  } : {};
  const dragging = drag ? dragBox(drag.x1, drag.y1, drag.x2, drag.y2) : null;

  return (
    <div ref={layer} className={`absolute inset-0 ${onPickRegion ? "pointer-events-auto cursor-crosshair touch-none" : "pointer-events-none"}`} data-testid="image-pins" {...picking}>
      {pins.map(({ t, b }) => !isTap(b) && (
        <div key={`area-${t.id}`} aria-hidden className={`pointer-events-none absolute border-2 ${t.resolved ? "border-ok/60" : "border-action bg-action/10"}`} style={area(b)} />
      ))}
      {dragging && !isTap(dragging) && <div aria-hidden className="pointer-events-none absolute border-2 border-dashed border-action bg-action/10" style={area(dragging)} />}
      {draft && !isTap(draft) && <div aria-hidden className="pointer-events-none absolute border-2 border-dashed border-action" style={area(draft)} />}
      {pins.map(({ t, b }) => (
        <button key={t.id} type="button" data-testid="image-pin" data-thread-id={t.id}
          aria-label={`Comment ${t.number}${t.resolved ? " (resolved)" : ""} by ${t.author.name}: ${t.body.slice(0, 80)}`}
          title={`${t.number}. ${t.author.name}: ${t.body.slice(0, 120)}`}
          onClick={(e) => { e.stopPropagation(); onOpen(t.id); }}
          onPointerDown={(e) => e.stopPropagation()}
          className="pointer-events-auto absolute flex h-11 w-11 items-center justify-center" style={at(b)}>
          <span className={`flex h-7 min-w-7 items-center justify-center rounded-full border-2 px-1 text-sm font-bold shadow ${t.resolved ? "border-card bg-ok-soft text-ok" : "border-card bg-action text-action-ink"}`}>
            {t.number}
          </span>
        </button>
      ))}
      {draft && (
        <span aria-hidden className="pointer-events-none absolute flex h-11 w-11 items-center justify-center" style={at(draft)}>
          <span className="h-7 w-7 rounded-full border-2 border-dashed border-action bg-card/80" />
        </span>
      )}
    </div>
  );
}
