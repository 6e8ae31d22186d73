import { describe, expect, it } from "vitest";
import { checkName, inspectUpload, safeDisplayName } from "@/lib/uploads";
import * as f from "./fixtures";
import { expectAccepted, expectRefused } from "./helpers";

describe("file names", () => {
  it("refuses path-traversal names, with a display name that has no path", async () => {
    const png = await f.png(16, 16);
    const r = await expectRefused("../../etc/passwd.png", png, "bad_name", /folder names/);
    expect(r.safeName).toBe("passwd.png");
    await expectRefused("..\\..\\windows\\win.ini.png", png, "bad_name", /folder names/);
    await expectRefused("/var/www/index.png", png, "bad_name");
  });

  it("refuses a right-to-left override that disguises a program as a picture", async () => {
    // Shows as "invoiceexe.png" but is really named "invoice…gnp.exe".
    const r = await expectRefused("invoice\u202Egnp.exe", await f.png(16, 16), "bad_name", /reverse the direction of text/);
    expect(r.safeName).toBe("invoicegnp.exe");
  });

  it("refuses the other text-direction controls too", async () => {
    for (const mark of ["\u202D", "\u2066", "\u2067", "\u2068", "\u200F", "\u061C"]) {
      await expectRefused(`plan${mark}.png`, await f.png(16, 16), "bad_name");
    }
  });

  it("refuses NUL and control characters (header injection, truncation tricks)", async () => {
    const png = await f.png(16, 16);
    const r = await expectRefused("photo.png\u0000.exe", png, "bad_name", /control characters/);
    expect(r.safeName).toBe("photo.png.exe");
    await expectRefused("photo\r\nSet-Cookie: a=b.png", png, "bad_name", /control characters/);
    await expectRefused("tab\there.png", png, "bad_name");
  });

  it("refuses a blank or missing name without crashing", async () => {
    const png = await f.png(16, 16);
    await expectRefused("   ", png, "bad_name", /has no name/);
    await expectRefused("", png, "bad_name", /has no name/);
    const r = await inspectUpload({ name: undefined as unknown as string, bytes: png });
    expect(r).toMatchObject({ ok: false, code: "bad_name", safeName: "file" });
  });

  it("shortens names over 200 characters, keeping the extension", async () => {
    const ok = await expectAccepted(`${"Font bowl elevation ".repeat(20)}final.png`, await f.png(16, 16));
    expect(Array.from(ok.safeName).length).toBe(200);
    expect(ok.safeName.endsWith("….png")).toBe(true);
  });

  it("cleans characters unsafe in downloads and drops invisible ones", async () => {
    const ok = await expectAccepted('  12" bowl: <plan> *v2*?.png  ', await f.png(16, 16));
    expect(ok.safeName).toBe("12_ bowl_ _plan_ _v2__.png");
    expect(safeDisplayName("plan\u200B.png")).toBe("plan.png");
    expect(safeDisplayName(".hidden.png")).toBe("hidden.png");
    expect(safeDisplayName("plan.png. . ")).toBe("plan.png");
  });

  it("keeps ordinary non-Latin names and upper-case extensions", async () => {
    const ok = await expectAccepted("Taufbecken Südansicht.JPG", await f.jpeg(32, 32));
    expect(ok.safeName).toBe("Taufbecken Südansicht.JPG");
    expect(checkName("Ναός.pdf")).toEqual({ ok: true, safeName: "Ναός.pdf", extension: "pdf" });
  });

  it("normalises decomposed accents to one form", () => {
    const decomposed = "Su\u0308dansicht.png";
    expect(safeDisplayName(decomposed)).toBe("S\u00FCdansicht.png");
  });
});
