import { describe, expect, it } from "vitest";
import { precheck } from "@/components/revision/upload-precheck";
import { MAX_FILE_BYTES, MAX_FILES_PER_REVISION } from "@/lib/uploads/limits";

describe("the uploader's early checks (the server decides again)", () => {
  it("lets a drawing through", () => {
    expect(precheck({ name: "Section A.png", size: 1000 }, 0)).toEqual({ safeName: "Section A.png", problem: null });
    expect(precheck({ name: "SPEC.PDF", size: MAX_FILE_BYTES }, 0).problem).toBeNull();
  });
  it("names the file in every refusal", () => {
    expect(precheck({ name: "notes.docx", size: 10 }, 0).problem).toMatch(/“notes\.docx” is not a kind of file/);
    expect(precheck({ name: "empty.jpg", size: 0 }, 0).problem).toMatch(/“empty\.jpg” is empty/);
    expect(precheck({ name: "huge.jpg", size: MAX_FILE_BYTES + 1 }, 0).problem).toMatch(/“huge\.jpg” is 25\.0 MB, over the limit of 25 MB/);
    expect(precheck({ name: "drawing", size: 10 }, 0).problem).toMatch(/“drawing”/);
  });
  it("refuses names that hide what they are", () => {
    expect(precheck({ name: "invoice\u202Egnp.exe", size: 10 }, 0).problem).toMatch(/reverse the direction of text/);
    expect(precheck({ name: "../../x.png", size: 10 }, 0).problem).toMatch(/folder names/);
  });
  it("counts the revision's files", () => {
    expect(precheck({ name: "a.png", size: 10 }, MAX_FILES_PER_REVISION - 1).problem).toBeNull();
    expect(precheck({ name: "a.png", size: 10 }, MAX_FILES_PER_REVISION).problem).toMatch(/“a\.png” cannot be added: A revision can hold at most 40 files/);
  });
});
