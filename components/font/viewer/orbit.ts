/**
 * The camera's place round the font: turn (azimuth), tilt (elevation) and zoom. Kept as plain state
 * so buttons and drags change the same thing.
 */
export interface Orbit {
  azimuthDeg: number;
  elevationDeg: number;
  zoom: number;
}

export const initialOrbit: Orbit = { azimuthDeg: 32, elevationDeg: 16, zoom: 1 };

export const ORBIT_LIMITS = { minElevation: -5, maxElevation: 80, minZoom: 0.5, maxZoom: 4 };

const clamp = (v: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, v));

export function turn(o: Orbit, deg: number): Orbit {
  return { ...o, azimuthDeg: (((o.azimuthDeg + deg) % 360) + 360) % 360 };
}

export function tilt(o: Orbit, deg: number): Orbit {
  return { ...o, elevationDeg: clamp(o.elevationDeg + deg, ORBIT_LIMITS.minElevation, ORBIT_LIMITS.maxElevation) };
}

export function zoomBy(o: Orbit, factor: number): Orbit {
  return { ...o, zoom: clamp(o.zoom * factor, ORBIT_LIMITS.minZoom, ORBIT_LIMITS.maxZoom) };
}

/** Camera position (scene coordinates, Y up) for an orbit about a target at the given distance. */
export function cameraPosition(
  o: Orbit,
  target: [number, number, number],
  fitDistance: number,
): [number, number, number] {
  const d = fitDistance / o.zoom;
  const az = (o.azimuthDeg * Math.PI) / 180;
  const el = (o.elevationDeg * Math.PI) / 180;
  return [
    target[0] + d * Math.cos(el) * Math.sin(az),
    target[1] + d * Math.sin(el),
    target[2] + d * Math.cos(el) * Math.cos(az),
  ];
}
