import { describe, expect, it } from "vitest";
import { fileResponse } from "@/lib/file-response";
import { MAX_UPLOAD_REQUEST_BYTES, readUploadForm } from "@/lib/upload-request";
import { ValidationError } from "@/lib/errors";

const post = (body: BodyInit, headers: Record<string, string> = {}) => new Request("http://localhost/api/revisions/1/attachments", { method: "POST", body, headers });

describe("serving a stored file", () => {
  it("sends the stored type with a fixed name, no sniffing, a sandbox and private caching", async () => {
    const res = fileResponse({ bytes: new Uint8Array([1, 2, 3]), mime: "image/png", downloadName: "revision-attachment-7.png", sha256: "ab".repeat(32) });
    expect(res.headers.get("content-type")).toBe("image/png");
    expect(res.headers.get("content-disposition")).toBe('inline; filename="revision-attachment-7.png"');
    expect(res.headers.get("x-content-type-options")).toBe("nosniff");
    expect(res.headers.get("content-security-policy")).toBe("sandbox; default-src 'none'");
    expect(res.headers.get("cache-control")).toBe("private, max-age=3600");
    expect(new Uint8Array(await res.arrayBuffer())).toEqual(new Uint8Array([1, 2, 3]));
  });
  it("answers 304 when the browser already holds this exact file", () => {
    const file = { bytes: new Uint8Array([1]), mime: "application/pdf", downloadName: "revision-attachment-8.pdf", sha256: "cd".repeat(32) };
    const res = fileResponse(file, new Request("http://localhost/", { headers: { "if-none-match": `"${"cd".repeat(32)}"` } }));
    expect(res.status).toBe(304);
    expect(res.headers.get("content-security-policy")).toBe("sandbox; default-src 'none'");
    expect(fileResponse(file, new Request("http://localhost/", { headers: { "if-none-match": '"other"' } })).status).toBe(200);
  });
  it("refuses to serve anything that is not one of the four stored types", () => {
    expect(() => fileResponse({ bytes: new Uint8Array(1), mime: "text/html", downloadName: "x.html", sha256: null })).toThrow();
  });
});

describe("reading an upload request", () => {
  it("reads one file and its caption", async () => {
    const form = new FormData();
    form.append("file", new Blob([new Uint8Array([9, 8, 7])]), "plan.png");
    form.append("caption", "Plan");
    const got = await readUploadForm(post(form));
    expect(got).toMatchObject({ name: "plan.png", caption: "Plan", bytes: new Uint8Array([9, 8, 7]) });
  });
  it("refuses a body declared larger than the limit before reading it, with 413 naming the file field", async () => {
    const res = await readUploadForm(post("x", { "content-type": "multipart/form-data; boundary=b", "content-length": String(MAX_UPLOAD_REQUEST_BYTES + 1) }));
    expect(res).toBeInstanceOf(Response);
    expect((res as Response).status).toBe(413);
    expect((await (res as Response).json()).fields.file).toMatch(/25 MB/);
  });
  it("stops reading a body that grows past the limit without declaring its size", async () => {
    const chunk = new Uint8Array(1024 * 1024);
    let sent = 0;
    const stream = new ReadableStream<Uint8Array>({ pull(c) { if (sent++ > 40) c.close(); else c.enqueue(chunk); } });
    const req = new Request("http://localhost/x", { method: "POST", body: stream, headers: { "content-type": "multipart/form-data; boundary=b" }, duplex: "half" } as RequestInit);
    const res = await readUploadForm(req);
    expect((res as Response).status).toBe(413);
    expect(sent).toBeLessThan(30);
  });
  it.each([
    ["not multipart", () => post("{}", { "content-type": "application/json" }), /multipart\/form-data/],
    ["no file", () => { const f = new FormData(); f.append("caption", "x"); return post(f); }, /Choose a file/],
    ["two files", () => { const f = new FormData(); f.append("file", new Blob(["a"]), "a.png"); f.append("file", new Blob(["b"]), "b.png"); return post(f); }, /one file per request/],
    ["text instead of a file", () => { const f = new FormData(); f.append("file", "hello"); return post(f); }, /sent text instead/],
    ["a broken multipart body", () => post("--b\r\nContent-Disposition: form-data; name=\"file\"\r\n\r\nxx", { "content-type": "multipart/form-data; boundary=b" }), /could not be read/],
  ])("refuses %s on the file field", async (_l, make, pattern) => {
    const err = await readUploadForm(make()).catch((e) => e);
    expect(err).toBeInstanceOf(ValidationError);
    expect(err.fields.file).toMatch(pattern);
  });
});
