// @vitest-environment jsdom
/**
 * A change to the font is worked out once: one profile (one geometry), one set of figures per change,
 * however many views show it (picture, summary, figures, cold-working plan). Views given figures a
 * server already computed use them. The count is the product's own contract (common practice:
 * derive once, pass down), checked by wrapping the real model functions.
 */
import { afterEach, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { act, createElement } from "react";
import { createRoot, type Root } from "react-dom/client";

const calls = vi.hoisted(() => ({ profile: 0, geometry: 0, figures: 0 }));
vi.mock("@/models/font/profile", async (load) => {
  const real = await load<typeof import("@/models/font/profile")>();
  return {
    ...real,
    fontProfile: (...a: Parameters<typeof real.fontProfile>) => (calls.profile++, real.fontProfile(...a)),
  };
});
vi.mock("@/models/font/geometry", async (load) => {
  const real = await load<typeof import("@/models/font/geometry")>();
  return {
    ...real,
    fontGeometry: (...a: Parameters<typeof real.fontGeometry>) => (calls.geometry++, real.fontGeometry(...a)),
  };
});
vi.mock("@/models/font/figures", async (load) => {
  const real = await load<typeof import("@/models/font/figures")>();
  return {
    ...real,
    computeFontFigures: (...a: Parameters<typeof real.computeFontFigures>) => (
      calls.figures++,
      real.computeFontFigures(...a)
    ),
  };
});

const { defaultFontParameters, demoStudioSettings, evaluateFont, modelFont, planColdWorking } =
  await import("@/models/font");
const { FontEditor } = await import("@/components/font/FontEditor");
const { FontViewer } = await import("@/components/font/FontViewer");
const { frameForms } = await import("@/components/font/FontViewerCanvas");
const { engravingMarkPlaces } = await import("@/components/font/viewer/FontScene");
const { buildFontGeometries } = await import("@/components/font/viewer/useFontGeometries");

let root: Root | null = null;
let host: HTMLDivElement;
const reset = () => Object.assign(calls, { profile: 0, geometry: 0, figures: 0 });
const once = { profile: 1, geometry: 1, figures: 1 };
const none = { profile: 0, geometry: 0, figures: 0 };

function mount(el: ReturnType<typeof createElement>) {
  host = document.createElement("div");
  document.body.append(host);
  root = createRoot(host);
  act(() => root!.render(el));
}

function type(field: string, value: string) {
  const input = host.querySelector<HTMLInputElement>(`input[id$="-${field}"]`);
  if (!input) throw new Error(`no input for ${field}`);
  const setter = Object.getOwnPropertyDescriptor(HTMLInputElement.prototype, "value")!.set!;
  act(() => {
    setter.call(input, value);
    input.dispatchEvent(new Event("input", { bubbles: true }));
  });
}

beforeAll(() => {
  (globalThis as { IS_REACT_ACT_ENVIRONMENT?: boolean }).IS_REACT_ACT_ENVIRONMENT = true;
  // jsdom has no WebGL: the viewer shows its cross-section, drawn from the same model.
  HTMLCanvasElement.prototype.getContext = (() => null) as typeof HTMLCanvasElement.prototype.getContext;
});
beforeEach(reset);
afterEach(() => {
  act(() => root?.unmount());
  root = null;
  host?.remove();
});

// Rendering the whole editor in jsdom is slow on a busy machine; the counts, not the time, are checked.
describe("the editor works the font out once per change", { timeout: 30_000 }, () => {
  it("one profile, one geometry and one set of figures for each keystroke", () => {
    mount(createElement(FontEditor, { studioSettings: demoStudioSettings }));
    expect(host.querySelector('[aria-label="Cross-section of the font"]')).not.toBeNull();
    expect(host.querySelector('[data-testid="cold-working-plan"]')).not.toBeNull();
    for (const value of ["151", "152", "160"]) {
      reset();
      type("depth", value);
      expect(calls).toEqual(once);
    }
    expect(host.querySelector('[data-testid="font-status"]')?.textContent).toMatch(/Holds/);
  });

  it("an entry that does not make a font is not worked out at all, and the last good form stays", () => {
    mount(createElement(FontEditor, {}));
    reset();
    type("depth", "-4");
    expect(calls).toEqual(none);
    expect(host.querySelector('[data-testid="font-status"]')?.textContent).toMatch(/needs attention/);
  });

  it("changing the machine makes a new plan from the same profile", () => {
    mount(createElement(FontEditor, { studioSettings: demoStudioSettings }));
    const select = [...host.querySelectorAll("select")].find((s) =>
      s.closest("label")?.textContent?.startsWith("Machine"),
    );
    expect(select).toBeDefined();
    reset();
    act(() => {
      select!.value = demoStudioSettings.machines.at(-1)!.id;
      select!.dispatchEvent(new Event("change", { bubbles: true }));
    });
    expect(calls).toEqual(none);
  });
});

describe("views read the model they are given", { timeout: 30_000 }, () => {
  it("figures a server sent are used as they are; only the profile is built", () => {
    const sent = evaluateFont(defaultFontParameters);
    if (!sent.ok) throw new Error("the default font should be valid");
    reset();
    const model = modelFont(defaultFontParameters, sent.figures);
    expect(calls).toEqual({ profile: 1, geometry: 1, figures: 0 });
    expect(model.figures).toBe(sent.figures);
    reset();
    mount(createElement(FontViewer, { model, units: "mm" }));
    expect(host.querySelector("figcaption")?.textContent).toMatch(/glass font/);
    expect(calls).toEqual(none);
  });

  it("the scene's meshes, marks and framing, and the plan, come from the model alone", () => {
    const model = modelFont(defaultFontParameters);
    const ghost = modelFont({ ...defaultFontParameters, depth: 120 });
    reset();
    const geos = buildFontGeometries(model.profile, true);
    const marks = engravingMarkPlaces(model, false);
    const framing = frameForms(model, ghost);
    const plan = planColdWorking(model.params, demoStudioSettings, {}, model.profile);
    expect(calls).toEqual(none);
    expect(geos.cuts).not.toBeNull();
    expect(marks).toHaveLength(defaultFontParameters.engravingCount);
    expect(framing.distance).toBeGreaterThan(0);
    expect(plan.ok).toBe(true);
  });
});
