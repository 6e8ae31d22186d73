"use client";
import { useCallback, useState, type ReactNode } from "react";
import type { AttachmentDto } from "@/lib/dal/revisions-read";
import { AttachmentEditControls } from "./AttachmentEditControls";
import { ImageViewer } from "./ImageViewer";

export interface GalleryProps {
  attachments: AttachmentDto[];
  /** The studio on a draft: caption editing and removal. */
  editable?: boolean;
  /** After a caption is saved or a file removed. */
  onChanged?: () => void;
  /** Drawn over the picture (in the lead image and the viewer), sized to the picture's box. */
  renderOverlay?: (attachment: AttachmentDto) => ReactNode;
  /** A tap on a picture in the viewer, in percent of the picture's width and height. */
  onImageClick?: (attachment: AttachmentDto, xPercent: number, yPercent: number) => void;
  /** close the full-screen viewer after a tap has been reported (so a comment box below can be reached) */
  closeOnImageClick?: boolean;
}

const ordered = (list: AttachmentDto[]) => [...list].sort((a, b) => a.position - b.position || a.id - b.id);
const size = (n: number) => (n >= 1024 * 1024 ? `${(n / (1024 * 1024)).toFixed(1)} MB` : `${Math.max(1, Math.round(n / 1024))} KB`);
const overlayBox = "pointer-events-none absolute inset-0 [&_a]:pointer-events-auto [&_button]:pointer-events-auto";

/** A revision's files: the lead picture large, then the rest; pictures open in a zoomable viewer. */
export function Gallery({ attachments, editable = false, onChanged, renderOverlay, onImageClick, closeOnImageClick = false }: GalleryProps) {
  const all = ordered(attachments);
  const images = all.filter((a) => a.kind !== "pdf");
  const lead = images[0];
  const rest = all.filter((a) => a !== lead);
  const [open, setOpen] = useState<number | null>(null);
  const close = useCallback(() => setOpen(null), []);
  const openImage = (a: AttachmentDto) => setOpen(images.indexOf(a));

  if (!all.length) return <p className="text-ink-soft" data-testid="gallery">No files yet.</p>;
  return (
    <div className="grid gap-4" data-testid="gallery">
      {lead && (
        <figure className="overflow-hidden rounded-lg border border-line bg-card" data-testid="gallery-lead">
          <div className="relative">
            <button type="button" onClick={() => openImage(lead)} className="block w-full cursor-zoom-in" aria-label={`Open ${lead.caption || lead.name} full screen`}>
              <img src={lead.url} alt={lead.caption || lead.name} width={lead.width ?? undefined} height={lead.height ?? undefined} className="block h-auto w-full" />
            </button>
            {renderOverlay && <div className={overlayBox}>{renderOverlay(lead)}</div>}
          </div>
          <figcaption className="px-4 py-3">
            {lead.caption && <p>{lead.caption}</p>}
            <p className="text-sm text-ink-soft">{lead.name}</p>
            {editable && <AttachmentEditControls attachment={lead} onChanged={onChanged} />}
          </figcaption>
        </figure>
      )}
      {rest.length > 0 && (
        <ul className="grid grid-cols-1 gap-3 min-[420px]:grid-cols-2 md:grid-cols-3" aria-label="More files">
          {rest.map((a) => (
            <li key={a.id} className="flex flex-col overflow-hidden rounded-lg border border-line bg-card" data-testid="gallery-item" data-kind={a.kind}>
              {a.kind === "pdf" ? (
                <div className="grid min-h-32 place-items-center gap-1 bg-record-soft p-4 text-center text-record">
                  <span className="font-serif text-2xl font-semibold">PDF</span>
                  <span className="text-sm">{a.pages ? `${a.pages} page${a.pages === 1 ? "" : "s"} · ` : ""}{size(a.sizeBytes)}</span>
                </div>
              ) : (
                <button type="button" onClick={() => openImage(a)} className="block cursor-zoom-in bg-paper-deep" aria-label={`Open ${a.caption || a.name} full screen`}>
                  <img src={a.thumbUrl ?? a.url} alt={a.caption || a.name} loading="lazy" className="block aspect-[4/3] w-full object-contain" />
                </button>
              )}
              <div className="grid gap-1 p-3">
                {a.caption && <p className="text-sm">{a.caption}</p>}
                <p className="break-words text-sm text-ink-soft">{a.name}</p>
                {a.kind === "pdf" && (
                  <a href={a.url} target="_blank" rel="noopener noreferrer" className="inline-flex min-h-11 items-center font-medium">Open the PDF</a>
                )}
                {editable && <AttachmentEditControls attachment={a} onChanged={onChanged} />}
              </div>
            </li>
          ))}
        </ul>
      )}
      {open !== null && images[open] && (
        <ImageViewer images={images} index={open} onIndex={setOpen} onClose={close} renderOverlay={renderOverlay}
          onImageClick={onImageClick ? (a, x, y) => { onImageClick(a, x, y); if (closeOnImageClick) close(); } : undefined} />
      )}
    </div>
  );
}
