import { describe, expect, it } from "vitest";
import { fromHeader, headerText, mailbox, MAX_SUBJECT_CHARS } from "@/lib/mail";

describe("names and subjects reaching a mail header (OWASP ASVS 4.0.3 V5.2.3, RFC 5322 §2.2)", () => {
  it("strips CR, LF and other line breaks so no header can be added", () => {
    const evil = 'Ruth\r\nBcc: everyone@evil.example\r\n\r\nHello';
    const out = headerText(evil, 200);
    expect(out).not.toMatch(/[\r\n]/);
    expect(out).toBe("Ruth Bcc: everyone@evil.example Hello");
    expect(headerText("a\u2028b\u0085c\u0000d\te", 50)).toBe("a b c d e");
  });

  it("caps length by whole characters, marking the cut", () => {
    const long = `Comment by ${"é".repeat(500)}`;
    const out = headerText(long, MAX_SUBJECT_CHARS);
    expect(Array.from(out)).toHaveLength(MAX_SUBJECT_CHARS);
    expect(out.endsWith("…")).toBe(true);
    const emoji = "🪟".repeat(300);
    expect(Array.from(headerText(emoji, 10)).every((c) => c === "🪟" || c === "…")).toBe(true);
    expect(headerText("Short", MAX_SUBJECT_CHARS)).toBe("Short");
  });

  it("makes a display name safe and refuses an address with a break in it", () => {
    expect(mailbox('Eve "x"\r\nBcc: a@b', "eve@example.test")).toEqual({ name: "Eve x Bcc: a@b", address: "eve@example.test" });
    expect(() => mailbox("Eve", "eve@example.test\r\nBcc: a@b")).toThrow(/cannot appear in a header/);
    expect(fromHeader("Placet <noreply@placet.localhost>")).toEqual({ name: "Placet", address: "noreply@placet.localhost" });
    expect(fromHeader("noreply@placet.localhost")).toEqual({ name: "", address: "noreply@placet.localhost" });
  });
});
