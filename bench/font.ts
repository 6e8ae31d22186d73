/**
 * How long one parameter change takes: validate + lathe profile + figures + the three LatheGeometry
 * meshes (bowl, foot, pedestal) — everything the editor redoes when a value changes. The baseline is
 * building the same three LatheGeometry meshes alone from ready-made points. Goal: a change under 2 ms.
 *
 * Run: npx tsx bench/font.ts
 */
import { performance } from "node:perf_hooks";
import { computeFontFigures, defaultFontParameters, fontProfile, parseFontParameters } from "@/models/font";
import { buildLathe, DEFAULT_LATHE_SEGMENTS } from "@/components/font/latheMesh";

const GOAL_US = 2000;
const RUNS = 2000;
const WARMUP = 300;

function measure(label: string, fn: (i: number) => void): { median: number; mean: number; p95: number } {
  for (let i = 0; i < WARMUP; i++) fn(i);
  const times: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    const t0 = performance.now();
    fn(i);
    times.push((performance.now() - t0) * 1000);
  }
  times.sort((a, b) => a - b);
  const mean = times.reduce((s, t) => s + t, 0) / times.length;
  const r = { median: times[Math.floor(times.length / 2)], mean, p95: times[Math.floor(times.length * 0.95)] };
  console.log(
    `${label.padEnd(44)} median ${r.median.toFixed(0).padStart(5)} µs   mean ${r.mean.toFixed(0).padStart(5)} µs   p95 ${r.p95.toFixed(0).padStart(5)} µs`,
  );
  return r;
}

let sink = 0;

const change = measure("font: one parameter change (all of it)", (i) => {
  // A different depth every time, as when a designer drags through values.
  const input = { ...defaultFontParameters, depth: 120 + (i % 60) };
  const parsed = parseFontParameters(input);
  if (!parsed.ok) throw new Error("bench input should be valid");
  const profile = fontProfile(parsed.params);
  const figures = computeFontFigures(parsed.params, profile);
  const meshes = [profile.bowl, profile.foot, profile.pedestal].map((part) => buildLathe(part.points, DEFAULT_LATHE_SEGMENTS));
  sink += figures.filledMassKg + meshes.reduce((s, m) => s + m.getAttribute("position").count, 0);
});

const profile = fontProfile(defaultFontParameters);
const parts = [profile.bowl, profile.foot, profile.pedestal];
const baseline = measure("baseline: three LatheGeometry builds alone", () => {
  for (const part of parts) sink += buildLathe(part.points, DEFAULT_LATHE_SEGMENTS).getAttribute("position").count;
});

const modelOnly = measure("model only: validate + profile + figures", (i) => {
  const parsed = parseFontParameters({ ...defaultFontParameters, depth: 120 + (i % 60) });
  if (parsed.ok) sink += computeFontFigures(parsed.params).capacityLitres;
});

const points = parts.reduce((s, p) => s + p.points.length, 0);
console.log(`mesh size: ${points} profile points × ${DEFAULT_LATHE_SEGMENTS + 1} meridians`);
console.log(`one change takes ${change.median.toFixed(0)} µs (median), of which the meshes ~${baseline.median.toFixed(0)} µs and the model ~${modelOnly.median.toFixed(0)} µs`);
console.log(
  `goal: a change under ${GOAL_US} µs — ${change.median < GOAL_US ? "met" : "NOT met"} at the median ` +
    `(p95 ${change.p95.toFixed(0)} µs includes garbage collection and whatever else this machine is running)`,
);
if (sink === 0) console.log("(unreachable)");
