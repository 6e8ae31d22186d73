import { describe, expect, it } from "vitest";
import { MAX_FILE_BYTES, MAX_FILES_PER_REVISION, countCheck } from "@/lib/uploads";
import { countCheck as clientCountCheck } from "@/lib/uploads/limits";

describe("limits", () => {
  it("are 25 MB per file and 40 files per revision", () => {
    expect(MAX_FILE_BYTES).toBe(26_214_400);
    expect(MAX_FILES_PER_REVISION).toBe(40);
    expect(clientCountCheck).toBe(countCheck);
  });

  it("allows up to 40 files", () => {
    expect(countCheck(0, 40)).toEqual({ ok: true, remaining: 0 });
    expect(countCheck(39, 1)).toEqual({ ok: true, remaining: 0 });
    expect(countCheck(10, 0)).toEqual({ ok: true, remaining: 30 });
  });

  it("refuses the 41st file and says how many more fit", () => {
    expect(countCheck(40, 1)).toMatchObject({ ok: false, field: "file", code: "too_many_files", remaining: 0 });
    const r = countCheck(38, 5);
    expect(r).toMatchObject({ ok: false, remaining: 2 });
    if (!r.ok) expect(r.message).toBe("A revision can hold at most 40 files. This one has 38, so there is room for 2 more files; you tried to add 5.");
    const full = countCheck(45, 1);
    if (!full.ok) expect(full.message).toMatch(/it is full/);
  });

  it("answers nonsense counts with a refusal, not a crash", () => {
    for (const [a, b] of [[-1, 1], [1.5, 1], [0, Number.NaN], [0, -2]] as const) {
      expect(countCheck(a, b)).toMatchObject({ ok: false, code: "too_many_files" });
    }
  });
});
