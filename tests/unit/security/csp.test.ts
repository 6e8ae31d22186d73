import { describe, expect, it } from "vitest";
import { contentSecurityPolicy, newNonce, staticSecurityHeaders } from "@/lib/security-headers";

const directives = (csp: string) => Object.fromEntries(csp.split(";").map((d) => d.trim().split(/\s+/)).map(([k, ...v]) => [k, v]));

describe("the page policy (OWASP ASVS 4.0.3 V14.4.3, V14.4.7; W3C CSP Level 3)", () => {
  it("scripts only by nonce and strict-dynamic, never unsafe-inline; no plugins, no base, no framing", () => {
    const d = directives(contentSecurityPolicy("abc", { https: false, dev: false }));
    expect(d["script-src"]).toEqual(["'self'", "'nonce-abc'", "'strict-dynamic'"]);
    expect(d["object-src"]).toEqual(["'none'"]);
    expect(d["base-uri"]).toEqual(["'none'"]);
    expect(d["frame-ancestors"]).toEqual(["'none'"]);
    expect(d["upgrade-insecure-requests"]).toBeUndefined();
    expect(directives(contentSecurityPolicy("abc", { https: true, dev: false }))["upgrade-insecure-requests"]).toEqual([]);
  });

  it("a nonce has 128 random bits and is not repeated (CSP Level 3 §7.1)", () => {
    const seen = new Set(Array.from({ length: 1000 }, newNonce));
    expect(seen.size).toBe(1000);
    for (const n of seen) expect(Buffer.from(n, "base64")).toHaveLength(16);
  });

  it("HSTS only under https; Referrer-Policy same-origin; no camera, microphone, location or payment (ASVS V14.4.5, V14.4.6)", () => {
    expect(staticSecurityHeaders(false)["Strict-Transport-Security"]).toBeUndefined();
    expect(staticSecurityHeaders(true)["Strict-Transport-Security"]).toMatch(/^max-age=\d{8,}/);
    const h = staticSecurityHeaders(true);
    expect(h["Referrer-Policy"]).toBe("same-origin");
    for (const f of ["camera", "microphone", "geolocation", "payment"]) expect(h["Permissions-Policy"]).toContain(`${f}=()`);
  });
});
