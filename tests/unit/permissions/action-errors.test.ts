import { describe, expect, it, vi } from "vitest";
import { formErrors } from "@/lib/action-errors";
import { ConflictError, ForbiddenError, ValidationError } from "@/lib/errors";

describe("formErrors", () => {
  it("keeps per-field messages of bad input", () => {
    expect(formErrors(new ValidationError({ email: "Enter an e-mail address." }), "x")).toEqual({ email: "Enter an e-mail address." });
  });
  it("shows a refusal's own words on the form", () => {
    expect(formErrors(new ForbiddenError("Only the chair may do that."), "x")).toEqual({ _form: "Only the chair may do that." });
    expect(formErrors(new ConflictError("Revision 2 is frozen."), "x")).toEqual({ _form: "Revision 2 is frozen." });
  });
  it("logs anything unexpected and shows the fallback, never the internal message", () => {
    const log = vi.spyOn(console, "error").mockImplementation(() => {});
    expect(formErrors(new Error("ECONNRESET at 10.0.0.1"), "Nothing was changed.")).toEqual({ _form: "Nothing was changed." });
    expect(log).toHaveBeenCalledTimes(1);
    log.mockRestore();
  });
});
