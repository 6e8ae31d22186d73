import { describe, expect, it } from "vitest";
import { commissionSchema, fieldErrors, inviteSchema, signInSchema } from "@/models/schemas/people";
import { safeNext } from "@/lib/safe-next";

describe("input schemas", () => {
  it("normalises e-mail addresses (trim, lower case)", () => {
    expect(signInSchema.parse({ email: "  Margaret@StWenna.TEST " }).email).toBe("margaret@stwenna.test");
  });
  it.each(["", "plain", "a@", "@b.org", "a b@c.org", "x".repeat(250) + "@a.org"])("refuses %j with a message on the email field", (email) => {
    const r = signInSchema.safeParse({ email });
    expect(r.success).toBe(false);
    if (!r.success) expect(fieldErrors(r.error).email).toBeTruthy();
  });
  it("invitation: each bad field is named", () => {
    const r = inviteSchema.safeParse({ email: "x", name: " ", role: "bishop" });
    expect(r.success).toBe(false);
    if (!r.success) expect(Object.keys(fieldErrors(r.error)).sort()).toEqual(["email", "name", "role"]);
  });
  it("invitation: treasurer defaults to false", () => {
    expect(inviteSchema.parse({ email: "a@b.test", name: "A", role: "member" }).treasurer).toBe(false);
  });
  it("commission: title, body and site are required with their own messages", () => {
    const r = commissionSchema.safeParse({ title: "", clientBody: "", site: "" });
    expect(r.success).toBe(false);
    if (!r.success) expect(Object.keys(fieldErrors(r.error)).sort()).toEqual(["clientBody", "site", "title"]);
  });
  it("only same-site paths may follow sign-in", () => {
    expect(safeNext("/commissions/1")).toBe("/commissions/1");
    for (const bad of ["//evil.test", "https://evil.test", "\\\\evil", "", "javascript:alert(1)", "/\t/evil.test", "/\n/evil.test"]) expect(safeNext(bad)).toBe("/commissions");
  });
});
