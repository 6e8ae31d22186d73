/**
 * The lathe profile: each part's outline in the (r, z) half-plane, as straight lines and arcs of
 * circles centred on the axis. The arcs are kept exact so the figures can integrate them exactly, and
 * sampled into [r, z] points for the 3D mesh (three's LatheGeometry turns those points about the axis).
 *
 * Outlines run anticlockwise in the (r, z) plane (r to the right, z up), starting and ending on the
 * axis, so the enclosed volume is ∮ π r² dz and the mesh's faces point outwards.
 */
import { fontGeometry, type FontGeometry } from "./geometry";
import type { FontDimensions } from "./types";

export type ProfilePoint = [r: number, z: number];

export type ProfileSegment =
  | { kind: "line"; from: ProfilePoint; to: ProfilePoint }
  | { kind: "arc"; from: ProfilePoint; to: ProfilePoint; centreZ: number; radius: number };

export type ProfilePartName = "bowl" | "foot" | "pedestal" | "water";

export interface PartProfile {
  part: ProfilePartName;
  segments: ProfileSegment[];
  /** sampled outline for the mesh; corners are repeated so the shading keeps them sharp */
  points: ProfilePoint[];
}

export interface FontProfile {
  geometry: FontGeometry;
  bowl: PartProfile;
  foot: PartProfile;
  pedestal: PartProfile;
  /** the water at the working level (what the pictures show) */
  water: PartProfile;
  /** the water when the bowl is full to the brim */
  brimWater: PartProfile;
}

/** Largest angle between two sampled points of an arc, in degrees. */
export const DEFAULT_ARC_STEP_DEG = 2.5;

export interface SamplingOptions {
  /** largest angle between sampled points of an arc, degrees */
  arcStepDeg?: number;
  /**
   * largest gap between an arc and its chords, mm. Left out, it is min(wall thickness, depth) / 500,
   * so shallow or thin bowls are sampled finely enough for the mesh to keep their volume.
   */
  arcSagittaMm?: number;
}

interface Sampling {
  stepRad: number;
  sagitta: number;
}

/** Angle of a point on a circle centred at (0, centreZ), measured from straight down. */
function angleFromBelow(p: ProfilePoint, centreZ: number): number {
  return Math.atan2(p[0], centreZ - p[1]);
}

function sampleArc(seg: Extract<ProfileSegment, { kind: "arc" }>, s: Sampling): ProfilePoint[] {
  const a0 = angleFromBelow(seg.from, seg.centreZ);
  const a1 = angleFromBelow(seg.to, seg.centreZ);
  // A chord spanning angle Δ leaves a gap ρ(1 − cos Δ/2) ≈ ρΔ²/8 to the arc.
  const bySagitta = Math.sqrt((8 * s.sagitta) / seg.radius);
  const step = Math.min(s.stepRad, bySagitta > 0 ? bySagitta : s.stepRad);
  const steps = Math.min(2000, Math.max(2, Math.ceil(Math.abs(a1 - a0) / step)));
  const out: ProfilePoint[] = [];
  for (let i = 1; i < steps; i++) {
    const a = a0 + ((a1 - a0) * i) / steps;
    out.push([seg.radius * Math.sin(a), seg.centreZ - seg.radius * Math.cos(a)]);
  }
  out.push(seg.to);
  return out;
}

export function samplePoints(segments: ProfileSegment[], s: Sampling): ProfilePoint[] {
  if (segments.length === 0) return [];
  const pts: ProfilePoint[] = [segments[0].from];
  segments.forEach((seg, i) => {
    if (i > 0) pts.push(seg.from); // repeat the corner: sharp shading
    if (seg.kind === "line") pts.push(seg.to);
    else pts.push(...sampleArc(seg, s));
  });
  return pts;
}

function part(name: ProfilePartName, segments: ProfileSegment[], s: Sampling): PartProfile {
  return { part: name, segments, points: samplePoints(segments, s) };
}

export function fontProfile(p: FontDimensions, options: SamplingOptions = {}): FontProfile {
  const g = fontGeometry(p);
  const sampling: Sampling = {
    stepRad: ((options.arcStepDeg ?? DEFAULT_ARC_STEP_DEG) * Math.PI) / 180,
    sagitta: options.arcSagittaMm ?? Math.min(p.wallThickness, p.depth) / 500,
  };
  const a = p.rimRadius;
  const f = p.flatRadius;
  const R = g.sphereRadius;
  const Ro = g.outerSphereRadius;
  const cz = g.centreZ;

  const bowl: ProfileSegment[] = [
    { kind: "line", from: [0, g.flatZ], to: [f, g.flatZ] }, // the ground flat
    { kind: "arc", from: [f, g.flatZ], to: [g.outerRimRadius, g.rimZ], centreZ: cz, radius: Ro }, // outside
    { kind: "line", from: [g.outerRimRadius, g.rimZ], to: [a, g.rimZ] }, // the rim
    { kind: "arc", from: [a, g.rimZ], to: [0, g.interiorBottomZ], centreZ: cz, radius: R }, // inside
  ];
  const foot: ProfileSegment[] = [
    { kind: "line", from: [0, g.footBaseZ], to: [p.footBaseRadius, g.footBaseZ] },
    { kind: "line", from: [p.footBaseRadius, g.footBaseZ], to: [p.footTopRadius, g.footTopZ] },
    { kind: "line", from: [p.footTopRadius, g.footTopZ], to: [0, g.footTopZ] },
  ];
  const rp = g.pedestalRadius;
  const pedestal: ProfileSegment[] = [
    { kind: "line", from: [0, 0], to: [rp, 0] },
    { kind: "line", from: [rp, 0], to: [rp, g.footBaseZ] },
    { kind: "line", from: [rp, g.footBaseZ], to: [0, g.footBaseZ] },
  ];
  const waterTo = (r: number, z: number): ProfileSegment[] => [
    { kind: "arc", from: [0, g.interiorBottomZ], to: [r, z], centreZ: cz, radius: R },
    { kind: "line", from: [r, z], to: [0, z] },
  ];
  return {
    geometry: g,
    bowl: part("bowl", bowl, sampling),
    foot: part("foot", foot, sampling),
    pedestal: part("pedestal", pedestal, sampling),
    // water at its working level may be shallower than the bowl: sampled finely enough for its own depth
    water: part("water", waterTo(g.waterLineRadius, g.waterLineZ), {
      ...sampling,
      sagitta: Math.min(sampling.sagitta, options.arcSagittaMm ?? (p.depth - p.workingDepthBelowRim) / 500),
    }),
    brimWater: part("water", waterTo(a, g.rimZ), sampling),
  };
}
