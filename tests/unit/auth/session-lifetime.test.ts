import { describe, expect, it } from "vitest";
import { needsTouch, sessionExpiresAt, sessionStatus } from "@/models/session/lifetime";
import { describeBrowser } from "@/models/session/browser";

// OWASP ASVS 4.0.3 V3.3.2, level 2: re-authenticate after 12 hours or 30 minutes of inactivity.
const L = { absoluteSeconds: 12 * 3600, idleSeconds: 30 * 60 };
const t = (min: number) => new Date(Date.UTC(2026, 11, 2, 8, 0) + min * 60_000);

describe("session lifetime", () => {
  it("is active until 30 minutes without use", () => {
    expect(sessionStatus({ createdAt: t(0), lastSeenAt: t(0) }, t(29.9), L)).toBe("active");
    expect(sessionStatus({ createdAt: t(0), lastSeenAt: t(0) }, t(30), L)).toBe("idle-expired");
  });

  it("ends 12 hours after sign-in however recent the last request", () => {
    expect(sessionStatus({ createdAt: t(0), lastSeenAt: t(719) }, t(719.9), L)).toBe("active");
    expect(sessionStatus({ createdAt: t(0), lastSeenAt: t(719) }, t(720), L)).toBe("absolute-expired");
  });

  it("expires at the idle deadline, capped by the absolute one", () => {
    expect(sessionExpiresAt({ createdAt: t(0), lastSeenAt: t(10) }, L)).toEqual(t(40));
    expect(sessionExpiresAt({ createdAt: t(0), lastSeenAt: t(700) }, L)).toEqual(t(720));
  });

  it("writes last-seen at most once a minute", () => {
    expect(needsTouch(t(0), t(0.5))).toBe(false);
    expect(needsTouch(t(0), t(1))).toBe(true);
  });
});

describe("browser description (common practice: User-Agent product tokens, RFC 9110 §10.1.5)", () => {
  it.each([
    ["Mozilla/5.0 (Windows NT 10.0; Win64; x64) AppleWebKit/537.36 (KHTML, like Gecko) Chrome/126.0.0.0 Safari/537.36 Edg/126.0.0.0", "Edge on Windows"],
    ["Mozilla/5.0 (iPhone; CPU iPhone OS 17_5 like Mac OS X) AppleWebKit/605.1.15 (KHTML, like Gecko) Version/17.5 Mobile/15E148 Safari/604.1", "Safari on iOS"],
    ["Mozilla/5.0 (Macintosh; Intel Mac OS X 14_5) Gecko/20100101 Firefox/128.0", "Firefox on macOS"],
    ["Mozilla/5.0 (Linux; Android 14; Pixel 7) AppleWebKit/537.36 (KHTML, like Gecko) Chrome/126.0 Mobile Safari/537.36", "Chrome on Android"],
    ["", "Unknown browser"],
  ])("%s → %s", (ua, expected) => expect(describeBrowser(ua)).toBe(expected));
});
