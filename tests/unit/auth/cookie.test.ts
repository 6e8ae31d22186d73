import { afterEach, describe, expect, it, vi } from "vitest";

async function cookieModule(appUrl: string) {
  vi.resetModules();
  vi.stubEnv("AUTH_URL", appUrl);
  return import("@/lib/session-store");
}

afterEach(() => { vi.unstubAllEnvs(); });

describe("session cookie flags", { timeout: 30_000 }, () => {
  it("under https: __Host- prefix, Secure, HttpOnly, SameSite=Lax, Path=/ (OWASP ASVS 4.0.3 V3.4.1–V3.4.5; RFC 6265bis §4.1.3.2)", async () => {
    const m = await cookieModule("https://placet.example");
    const header = m.setCookieHeader("v", 43200);
    expect(header.startsWith("__Host-placet-session=v;")).toBe(true);
    expect(header.split("; ")).toEqual(expect.arrayContaining(["Path=/", "HttpOnly", "SameSite=Lax", "Secure", "Max-Age=43200"]));
    expect(header).not.toMatch(/Domain=/i); // a __Host- cookie must not name a domain
  });

  it("under plain http (local only): no Secure and so no __Host- prefix, still HttpOnly and SameSite=Lax", async () => {
    const m = await cookieModule("http://localhost:3000");
    const header = m.setCookieHeader("v", 60);
    expect(header.startsWith("placet-session=v;")).toBe(true);
    expect(header).not.toContain("Secure");
    expect(header.split("; ")).toEqual(expect.arrayContaining(["HttpOnly", "SameSite=Lax"]));
  });
});
