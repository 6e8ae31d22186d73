// @vitest-environment jsdom
import { afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { act, createElement } from "react";
import { createRoot, type Root } from "react-dom/client";
import type { AttachmentDto } from "@/lib/dal/revisions-read";
import { Gallery } from "@/components/revision/Gallery";
import { AttachmentUploader } from "@/components/revision/AttachmentUploader";

const dto = (id: number, kind: string, extra: Partial<AttachmentDto> = {}): AttachmentDto => ({
  id, name: `file-${id}.${kind === "jpeg" ? "jpg" : kind}`, caption: "", kind, mime: kind === "pdf" ? "application/pdf" : `image/${kind}`,
  sha256: "a".repeat(64), sizeBytes: 2048, width: kind === "pdf" ? null : 800, height: kind === "pdf" ? null : 400, pages: kind === "pdf" ? 3 : null,
  position: id, url: `/api/attachments/${id}/file`, thumbUrl: kind === "pdf" ? null : `/api/attachments/${id}/thumb`, ...extra,
});

let root: Root | null = null;
let host: HTMLDivElement;
function mount(el: ReturnType<typeof createElement>) {
  host = document.createElement("div");
  document.body.append(host);
  root = createRoot(host);
  act(() => root!.render(el));
}
const byText = (text: string, tag = "button") => [...host.querySelectorAll(tag)].find((b) => b.textContent?.trim() === text) as HTMLElement;
const byLabel = (label: string) => [...document.querySelectorAll("[aria-label]")].find((e) => e.getAttribute("aria-label") === label) as HTMLElement;
const click = (el: Element) => act(() => { (el as HTMLElement).click(); });
function pointer(el: Element, type: string, x: number, y: number, id = 1) {
  const e = new MouseEvent(type, { bubbles: true, clientX: x, clientY: y, button: 0 });
  Object.assign(e, { pointerId: id, pointerType: "touch" });
  act(() => { el.dispatchEvent(e); });
}

beforeAll(() => {
  (globalThis as { IS_REACT_ACT_ENVIRONMENT?: boolean }).IS_REACT_ACT_ENVIRONMENT = true;
  HTMLDialogElement.prototype.showModal = function () { this.setAttribute("open", ""); };
  HTMLDialogElement.prototype.close = function () { this.removeAttribute("open"); this.dispatchEvent(new Event("close")); };
  Element.prototype.setPointerCapture = () => undefined;
  globalThis.ResizeObserver = class { observe() {} disconnect() {} unobserve() {} } as unknown as typeof ResizeObserver;
});
afterEach(() => {
  act(() => root?.unmount());
  root = null;
  host?.remove();
  vi.unstubAllGlobals();
});

describe("Gallery", () => {
  const files = [dto(3, "pdf", { caption: "Specification" }), dto(1, "png", { caption: "Section <b>A</b>" }), dto(2, "jpeg")];

  it("shows the lead picture first and large, the PDF as a card with a link, captions as plain text", () => {
    mount(createElement(Gallery, { attachments: files }));
    const lead = host.querySelector('[data-testid="gallery-lead"] img') as HTMLImageElement;
    expect(lead.getAttribute("src")).toBe("/api/attachments/1/file");
    expect(host.querySelector('[data-testid="gallery-lead"]')!.textContent).toContain("Section <b>A</b>");
    expect(host.querySelector("b")).toBeNull();
    const pdf = host.querySelector('[data-kind="pdf"]')!;
    expect(pdf.textContent).toContain("3 pages");
    expect(byText("Open the PDF", "a").getAttribute("href")).toBe("/api/attachments/3/file");
    expect(host.querySelector('[data-kind="jpeg"] img')!.getAttribute("src")).toBe("/api/attachments/2/thumb");
    expect(host.textContent).not.toContain("Edit caption");
  });

  it("opens a viewer with button zoom, keeps the overlay on the picture and reports a tap in percent", () => {
    const onImageClick = vi.fn();
    mount(createElement(Gallery, { attachments: files, onImageClick, renderOverlay: (a: AttachmentDto) => createElement("span", { "data-pin": a.id }) }));
    click(byLabel("Open Section <b>A</b> full screen"));
    const viewer = document.querySelector('[data-testid="image-viewer"]')!;
    expect(viewer.hasAttribute("open")).toBe(true);
    expect(viewer.querySelector('[data-testid="viewer-overlay"] [data-pin="1"]')).not.toBeNull();
    click(byLabel("Zoom in"));
    expect(viewer.textContent).toContain("150%");
    click(byLabel("Zoom in"));
    expect(viewer.textContent).toContain("225%");
    click(byLabel("Fit to screen"));
    expect(viewer.textContent).toContain("100%");

    const img = viewer.querySelector("img")!;
    img.getBoundingClientRect = () => ({ left: 100, top: 50, width: 400, height: 200, right: 500, bottom: 250, x: 100, y: 50, toJSON() {} });
    const stage = viewer.querySelector('[data-testid="viewer-stage"]')!;
    pointer(stage, "pointerdown", 200, 100);
    pointer(stage, "pointerup", 200, 100);
    expect(onImageClick).toHaveBeenCalledTimes(1);
    expect(onImageClick.mock.calls[0][0].id).toBe(1);
    expect(onImageClick.mock.calls[0][1]).toBeCloseTo(25);
    expect(onImageClick.mock.calls[0][2]).toBeCloseTo(25);

    pointer(stage, "pointerdown", 200, 100);
    pointer(stage, "pointermove", 260, 140);
    pointer(stage, "pointerup", 260, 140);
    expect(onImageClick).toHaveBeenCalledTimes(1); // a drag is not a tap

    click(byLabel("Next picture"));
    expect(viewer.querySelector("img")!.getAttribute("src")).toBe("/api/attachments/2/file");
    click(byLabel("Close"));
    expect(document.querySelector('[data-testid="image-viewer"]')).toBeNull();
  });

  it("when editable, saves a caption and removes a file through the routes", async () => {
    const fetch = vi.fn(async (_url: string, init: RequestInit) =>
      init.method === "DELETE" ? new Response(null, { status: 204 }) : Response.json({ ...files[1], caption: "New words" }));
    vi.stubGlobal("fetch", fetch);
    const onChanged = vi.fn();
    mount(createElement(Gallery, { attachments: [files[1]], editable: true, onChanged }));
    click(byText("Edit caption"));
    const box = host.querySelector("textarea")!;
    act(() => {
      Object.getOwnPropertyDescriptor(HTMLTextAreaElement.prototype, "value")!.set!.call(box, "New words");
      box.dispatchEvent(new Event("input", { bubbles: true }));
    });
    await act(async () => { byText("Save caption").click(); });
    expect(fetch).toHaveBeenCalledWith("/api/attachments/1", expect.objectContaining({ method: "PATCH", body: JSON.stringify({ caption: "New words" }) }));
    expect(onChanged).toHaveBeenCalledTimes(1);
    click(byText("Remove"));
    await act(async () => { byText("Yes, remove it").click(); });
    expect(fetch).toHaveBeenLastCalledWith("/api/attachments/1", expect.objectContaining({ method: "DELETE" }));
    expect(onChanged).toHaveBeenCalledTimes(2);
  });
});

/** An XMLHttpRequest stand-in that reports progress and then the server's answer. */
class FakeXhr {
  static answers: { status: number; body: unknown }[] = [];
  static sent: FormData[] = [];
  /** While held, an upload stops at half way until the test lets it finish (no race with real timers). */
  static held = false;
  static waiting: (() => void)[] = [];
  upload: { onprogress?: (e: { lengthComputable: boolean; loaded: number; total: number }) => void } = {};
  status = 0; responseText = ""; responseType = "";
  onload?: () => void; onerror?: () => void; onabort?: () => void;
  open() {} setRequestHeader() {} abort() { this.onabort?.(); }
  send(body: FormData) {
    FakeXhr.sent.push(body);
    const answer = FakeXhr.answers.shift()!;
    const finish = () => { this.status = answer.status; this.responseText = JSON.stringify(answer.body); this.onload?.(); };
    setTimeout(() => {
      this.upload.onprogress?.({ lengthComputable: true, loaded: 50, total: 100 });
      if (FakeXhr.held) FakeXhr.waiting.push(finish);
      else setTimeout(finish, 5);
    }, 5);
  }
}

describe("AttachmentUploader", () => {
  it("checks files early, uploads each with progress and shows the server's refusal by name", async () => {
    vi.stubGlobal("XMLHttpRequest", FakeXhr);
    FakeXhr.answers = [{ status: 201, body: dto(9, "png") }, { status: 422, body: { error: "x", fields: { file: "“b.png” is a program, not a picture." } } }];
    const onUploaded = vi.fn();
    mount(createElement(AttachmentUploader, { revisionId: 5, existingCount: 0, onUploaded }));
    const input = host.querySelector('[data-testid="attachment-input"]') as HTMLInputElement;
    const files = [new File([new Uint8Array(10)], "a.png", { type: "image/png" }), new File([new Uint8Array(10)], "b.png", { type: "image/png" }), new File(["x"], "notes.docx")];
    Object.defineProperty(input, "files", { value: files });
    await act(async () => { input.dispatchEvent(new Event("change", { bubbles: true })); await new Promise((r) => setTimeout(r, 20)); });
    const items = () => [...host.querySelectorAll('[data-testid="upload-item"]')] as HTMLElement[];
    expect(items().map((i) => i.dataset.status)).toEqual(["ready", "ready", "refused"]);
    expect(items()[2].textContent).toContain("“notes.docx” is not a kind of file");

    FakeXhr.held = true;
    await act(async () => { byText("Upload 2 files").click(); });
    await vi.waitFor(() => expect(FakeXhr.waiting).toHaveLength(1), { timeout: 2000 });
    await act(async () => { await new Promise((r) => setTimeout(r, 0)); });
    expect(host.querySelector('[role="progressbar"]')!.getAttribute("aria-valuenow")).toBe("50");
    FakeXhr.held = false;
    await act(async () => { FakeXhr.waiting.splice(0).forEach((f) => f()); await new Promise((r) => setTimeout(r, 60)); });
    await vi.waitFor(() => expect(items().map((i) => i.dataset.status)).toEqual(["done", "refused", "refused"]), { timeout: 2000 });
    expect(items()[0].querySelector('[role="progressbar"]')!.getAttribute("aria-valuenow")).toBe("100");
    expect(items()[1].textContent).toContain("“b.png” is a program");
    expect(onUploaded).toHaveBeenCalledTimes(1);
    expect((FakeXhr.sent[0].get("file") as File).name).toBe("a.png");
  });
});
