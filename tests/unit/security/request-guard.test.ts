import { describe, expect, it } from "vitest";
import { BODY_LIMITS, guardRequest, MAX_UPLOAD_REQUEST_BYTES, readSmallForm } from "@/lib/request-guard";

const APP = "http://localhost:3000";
const url = `${APP}/api/ballots/1/votes`;
const ok = { origin: APP, "content-type": "application/json" };

function req(method: string, headers: Record<string, string>, body?: BodyInit) {
  return new Request(url, { method, headers, body, ...(body instanceof ReadableStream ? { duplex: "half" } : {}) } as RequestInit);
}
const status = async (r: Request, kind: "json" | "form" | "multipart" = "json") => {
  const out = await guardRequest(r, APP, kind);
  return out instanceof Response ? out.status : "passed";
};

describe("mutations only from our own pages", () => {
  it("refuses a missing, foreign or opaque Origin with 403 (OWASP ASVS 4.0.3 V13.2.3, V4.2.2)", async () => {
    expect(await status(req("POST", { "content-type": "application/json" }, "{}"))).toBe(403);
    expect(await status(req("POST", { ...ok, origin: "https://evil.example" }, "{}"))).toBe(403);
    expect(await status(req("POST", { ...ok, origin: "http://localhost:3000.evil.example" }, "{}"))).toBe(403);
    expect(await status(req("POST", { ...ok, origin: "null" }, "{}"))).toBe(403);
    expect(await status(req("DELETE", { origin: "http://localhost:3001" }))).toBe(403);
  });

  it("refuses Sec-Fetch-Site: cross-site even beside a matching Origin (W3C Fetch Metadata §2.1; ASVS V13.2.3)", async () => {
    expect(await status(req("PATCH", { ...ok, "sec-fetch-site": "cross-site" }, "{}"))).toBe(403);
    expect(await status(req("PATCH", { ...ok, "sec-fetch-site": "same-origin" }, "{}"))).toBe("passed");
  });

  it("names the problem in a JSON answer", async () => {
    const out = (await guardRequest(req("POST", { ...ok, origin: "https://evil.example" }, "{}"), APP, "json")) as Response;
    expect(await out.json()).toMatchObject({ code: "origin-foreign", error: expect.stringContaining("https://evil.example") });
  });

  it("lets reads through untouched, whatever their origin", async () => {
    const r = new Request(url, { headers: { origin: "https://evil.example" } });
    expect(await guardRequest(r, APP, "json")).toBe(r);
  });

  it("refuses a body that is not JSON with 415 (ASVS V13.2.5)", async () => {
    expect(await status(req("POST", { origin: APP, "content-type": "text/plain" }, '{"choice":"in-favour"}'))).toBe(415);
    expect(await status(req("POST", { origin: APP, "content-type": "application/x-www-form-urlencoded" }, "choice=in-favour"))).toBe(415);
    expect(await status(req("POST", { origin: APP, "content-type": "multipart/form-data; boundary=x" }, "--x--"))).toBe(415);
    expect(await status(req("POST", { origin: APP }, new Blob(['{"a":1}']).stream()))).toBe(415);
    expect(await status(req("POST", { origin: APP, "content-type": "application/json; charset=utf-8" }, "{}"))).toBe("passed");
    expect(await status(req("POST", { origin: APP }))).toBe("passed"); // no body at all, e.g. closing a ballot
  });

  it("keeps multipart for uploads and refuses JSON there", async () => {
    expect(await status(req("POST", { origin: APP, "content-type": "multipart/form-data; boundary=x" }, "--x--"), "multipart")).toBe("passed");
    expect(await status(req("POST", ok, "{}"), "multipart")).toBe(415);
  });

  it("caps JSON at 64 KB and forms at 8 KB before parsing, by length or by counting (OWASP ASVS 4.0.3 V12.1.1; the limits themselves: common practice)", async () => {
    expect(BODY_LIMITS).toMatchObject({ json: 65536, form: 8192, multipart: MAX_UPLOAD_REQUEST_BYTES });
    const big = "a".repeat(1024 * 1024);
    expect(await status(req("POST", ok, big))).toBe(413);
    const justOver = `"${"a".repeat(BODY_LIMITS.json - 1)}"`;
    expect(await status(req("POST", ok, justOver))).toBe(413);
    expect(await status(req("POST", ok, `"${"a".repeat(BODY_LIMITS.json - 2)}"`))).toBe("passed");
    // A stream sends no Content-Length: it is counted as it arrives.
    expect(await status(req("POST", ok, new Blob([big]).stream()))).toBe(413);
    const form = { origin: APP, "content-type": "application/x-www-form-urlencoded" };
    expect(await status(req("POST", form, `a=${"b".repeat(8191)}`), "form")).toBe(413);
    expect(await status(req("POST", form, `a=${"b".repeat(8190)}`), "form")).toBe("passed");
  });

  it("hands on the same body to the handler", async () => {
    const out = await guardRequest(req("POST", ok, '{"choice":"against"}'), APP, "json");
    expect(out).toBeInstanceOf(Request);
    expect(await (out as Request).json()).toEqual({ choice: "against" });
  });
});

describe("uploads keep their own limit", () => {
  it("a declared length over the upload limit is refused before the handler, naming the file field", async () => {
    const r = new Request(url, { method: "POST", headers: { origin: APP, "content-type": "multipart/form-data; boundary=x", "content-length": String(MAX_UPLOAD_REQUEST_BYTES + 1) }, body: "--x--" });
    const out = (await guardRequest(r, APP, "multipart")) as Response;
    expect(out.status).toBe(413);
    expect((await out.json()).fields.file).toMatch(/over the limit of 25 MB/);
  });
});

describe("the sign-in forms' capped reader", () => {
  const chunked = (bytes: number) =>
    new ReadableStream<Uint8Array>({
      start(c) {
        for (let sent = 0; sent < bytes; sent += 1024) c.enqueue(new TextEncoder().encode("a".repeat(1024)));
        c.close();
      },
    });

  it("reads a small URL-encoded form (WHATWG URL Standard, application/x-www-form-urlencoded)", async () => {
    const form = await readSmallForm(req("POST", { "content-type": "application/x-www-form-urlencoded" }, "email=a%40b.test&next="), 8192);
    expect(form?.get("email")).toBe("a@b.test");
  });

  it("stops a chunked body with no Content-Length once it passes the cap (OWASP ASVS 4.0.3 V12.1.1)", async () => {
    const r = req("POST", { "content-type": "application/x-www-form-urlencoded" }, chunked(64 * 1024));
    expect(r.headers.get("content-length")).toBeNull();
    expect(await readSmallForm(r, 8192)).toBeNull();
  });
});
