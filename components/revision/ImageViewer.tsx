"use client";
import { useEffect, useRef, useState, type CSSProperties, type KeyboardEvent, type ReactNode, type RefObject } from "react";
import type { AttachmentDto } from "@/lib/dal/revisions-read";
import { MAX_SCALE, useZoomPan } from "./use-zoom-pan";

export interface ImageViewerProps {
  images: AttachmentDto[];
  index: number;
  onIndex: (index: number) => void;
  onClose: () => void;
  renderOverlay?: (attachment: AttachmentDto) => ReactNode;
  onImageClick?: (attachment: AttachmentDto, xPercent: number, yPercent: number) => void;
}

const control = "inline-flex min-h-11 min-w-11 items-center justify-center rounded-md border border-paper/40 px-3 text-lg font-semibold text-paper hover:bg-paper/10 disabled:opacity-40";

/** The fitted size of a picture inside the stage (contain), from the stored width and height. */
function useFitted(stage: RefObject<HTMLDivElement | null>, a: AttachmentDto) {
  const [box, setBox] = useState<{ w: number; h: number } | null>(null);
  useEffect(() => {
    const el = stage.current;
    if (!el) return;
    const measure = () => {
      const sw = el.clientWidth - 16, sh = el.clientHeight - 16;
      const w = a.width ?? sw, h = a.height ?? sh;
      const k = Math.min(sw / w, sh / h);
      setBox({ w: Math.max(1, Math.floor(w * k)), h: Math.max(1, Math.floor(h * k)) });
    };
    measure();
    const ro = new ResizeObserver(measure);
    ro.observe(el);
    return () => ro.disconnect();
  }, [stage, a.width, a.height]);
  return box;
}

/** A full-screen look at one picture: buttons, pinch and wheel to zoom, drag to pan, tap to point. */
export function ImageViewer({ images, index, onIndex, onClose, renderOverlay, onImageClick }: ImageViewerProps) {
  const a = images[index];
  const dialog = useRef<HTMLDialogElement>(null);
  const img = useRef<HTMLImageElement>(null);
  const onTap = (cx: number, cy: number) => {
    const r = img.current?.getBoundingClientRect();
    if (!r || !onImageClick || cx < r.left || cx > r.right || cy < r.top || cy > r.bottom) return;
    const pct = (v: number) => Math.min(100, Math.max(0, v * 100));
    onImageClick(a, pct((cx - r.left) / r.width), pct((cy - r.top) / r.height));
  };
  const zp = useZoomPan(onTap);
  const box = useFitted(zp.stageRef, a);
  const { fit } = zp;

  useEffect(() => {
    const d = dialog.current;
    if (d && !d.open) d.showModal();
    const closed = () => onClose();
    d?.addEventListener("close", closed);
    return () => d?.removeEventListener("close", closed);
  }, [onClose]);
  useEffect(() => fit(), [index, fit]);

  const go = (delta: number) => { if (images[index + delta]) onIndex(index + delta); };
  const onKeyDown = (e: KeyboardEvent) => {
    if ((e.target as Element).closest("input, textarea")) return;
    if (e.key === "+" || e.key === "=") zp.zoomBy(1.5);
    else if (e.key === "-") zp.zoomBy(1 / 1.5);
    else if (e.key === "0") zp.fit();
    else if (e.key === "ArrowLeft") go(-1);
    else if (e.key === "ArrowRight") go(1);
    else return;
    e.preventDefault();
  };
  const { s, x, y } = zp.view;
  const label = a.caption || a.name;

  return (
    <dialog ref={dialog} onKeyDown={onKeyDown} aria-label={`Picture: ${label}`} data-testid="image-viewer"
      className="fixed inset-0 m-0 h-dvh max-h-none w-screen max-w-none bg-ink p-0 text-paper backdrop:bg-ink/80 open:flex open:flex-col">
      <div className="flex flex-wrap items-center gap-2 p-2">
        <p className="min-w-0 flex-1 truncate px-1 font-medium">{a.name}{images.length > 1 && <span className="text-paper/70"> · {index + 1} of {images.length}</span>}</p>
        <button type="button" className={control} onClick={() => zp.zoomBy(1 / 1.5)} disabled={s <= 1} aria-label="Zoom out">−</button>
        <button type="button" className={control} onClick={zp.fit} disabled={s <= 1} aria-label="Fit to screen">Fit</button>
        <button type="button" className={control} onClick={() => zp.zoomBy(1.5)} disabled={s >= MAX_SCALE} aria-label="Zoom in">+</button>
        <span className="w-14 text-center text-sm tabular-nums" aria-live="polite">{Math.round(s * 100)}%</span>
        <button type="button" className={control} onClick={() => dialog.current?.close()} aria-label="Close">Close</button>
      </div>
      <div ref={zp.stageRef} {...zp.handlers} data-testid="viewer-stage"
        className="relative flex min-h-0 flex-1 touch-none items-center justify-center overflow-hidden select-none"
        style={{ cursor: onImageClick ? "crosshair" : s > 1 ? "grab" : "default" }}>
        <div ref={zp.contentRef} className="relative shrink-0"
          style={{ transform: `translate(${x}px, ${y}px) scale(${s})`, transformOrigin: "0 0", "--viewer-scale": s } as CSSProperties}>
          <img ref={img} src={a.url} alt={label} draggable={false} className="block max-w-none"
            style={box ? { width: box.w, height: box.h } : { maxWidth: "100%", maxHeight: "70dvh" }} />
          {renderOverlay && (
            <div className="pointer-events-none absolute inset-0 [&_a]:pointer-events-auto [&_button]:pointer-events-auto" data-testid="viewer-overlay">
              {renderOverlay(a)}
            </div>
          )}
        </div>
      </div>
      <div className="flex items-center gap-2 p-2">
        <button type="button" className={control} onClick={() => go(-1)} disabled={index === 0} aria-label="Previous picture">‹</button>
        <p className="min-w-0 flex-1 px-1 text-sm text-paper/90">{a.caption || "\u00a0"}</p>
        <button type="button" className={control} onClick={() => go(1)} disabled={index === images.length - 1} aria-label="Next picture">›</button>
      </div>
    </dialog>
  );
}
