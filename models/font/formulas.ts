/**
 * Closed-form volumes and centroids, kept beside the profile integration as an independent check on it
 * (the unit tests compare the two, and these against worked examples).
 */

/** Spherical cap of a sphere of radius ρ, height h: V = πh²(3ρ − h)/3. */
export const sphericalCapVolume = (rho: number, h: number): number => (Math.PI * h * h * (3 * rho - h)) / 3;

/** The same cap from its base radius b: V = πh(3b² + h²)/6. */
export const sphericalCapVolumeFromBase = (b: number, h: number): number => (Math.PI * h * (3 * b * b + h * h)) / 6;

/** Frustum of a cone: V = πh(R² + Rr + r²)/3. */
export const frustumVolume = (R: number, r: number, h: number): number =>
  (Math.PI * h * (R * R + R * r + r * r)) / 3;

/** Distance of a spherical cap's centroid from the sphere's centre: 3(2ρ − h)² / 4(3ρ − h). */
export const capCentroidFromCentre = (rho: number, h: number): number =>
  (3 * (2 * rho - h) ** 2) / (4 * (3 * rho - h));

/** Height of a frustum's centroid above its base (base radius R, top radius r): h(R² + 2Rr + 3r²) / 4(R² + Rr + r²). */
export const frustumCentroidFromBase = (R: number, r: number, h: number): number =>
  (h * (R * R + 2 * R * r + 3 * r * r)) / (4 * (R * R + R * r + r * r));
