/**
 * Volume and first moment of a solid of revolution from its outline (Green's theorem in the (r, z)
 * plane): V = ∮ π r² dz and M_z = ∮ π r² z dz over an anticlockwise outline.
 *
 * Along a straight segment r is linear in z, so r² is quadratic; along an arc centred on the axis
 * r² = ρ² − (z − z_c)², also quadratic. Simpson's rule is exact for polynomials up to degree three, so
 * one Simpson step per segment integrates both r² and r²·z exactly: no sampling error in the figures.
 */
import type { ProfileSegment } from "./profile";

export interface SolidOfRevolution {
  /** mm³ */
  volume: number;
  /** height of the centroid, mm */
  centroidZ: number;
}

function r2AtMid(seg: ProfileSegment): number {
  const zm = (seg.from[1] + seg.to[1]) / 2;
  if (seg.kind === "arc") return seg.radius ** 2 - (zm - seg.centreZ) ** 2;
  const rm = (seg.from[0] + seg.to[0]) / 2;
  return rm * rm;
}

export function integrateOutline(segments: ProfileSegment[]): SolidOfRevolution {
  let v = 0;
  let m = 0;
  for (const seg of segments) {
    const [r0, z0] = seg.from;
    const [r1, z1] = seg.to;
    const dz = z1 - z0;
    if (dz === 0) continue;
    const zm = (z0 + z1) / 2;
    const q0 = r0 * r0;
    const q1 = r1 * r1;
    const qm = r2AtMid(seg);
    v += (dz / 6) * (q0 + 4 * qm + q1);
    m += (dz / 6) * (q0 * z0 + 4 * qm * zm + q1 * z1);
  }
  const volume = Math.PI * v;
  return { volume, centroidZ: volume === 0 ? 0 : (Math.PI * m) / volume };
}
