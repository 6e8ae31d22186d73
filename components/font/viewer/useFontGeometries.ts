"use client";

import { useEffect, useMemo } from "react";
import type { BufferGeometry } from "three";
import type { FontProfile } from "@/models/font";
import { buildLathe, buildSectionFaces, DEFAULT_LATHE_SEGMENTS } from "../latheMesh";

export interface FontGeometries {
  bowl: BufferGeometry;
  foot: BufferGeometry;
  pedestal: BufferGeometry;
  /** cut faces, only in the section view */
  cuts: { bowl: BufferGeometry; foot: BufferGeometry; pedestal: BufferGeometry; water: BufferGeometry } | null;
}

/** The meshes for one profile, built from it (never from the parameters again) and disposed afterwards. */
export function buildFontGeometries(
  profile: FontProfile,
  section: boolean,
  segments = DEFAULT_LATHE_SEGMENTS,
  withCuts = true,
): FontGeometries {
  const lathe = (pts: typeof profile.bowl.points) => buildLathe(pts, segments, section);
  const cuts =
    section && withCuts
      ? {
          bowl: buildSectionFaces(profile.bowl.points),
          foot: buildSectionFaces(profile.foot.points),
          pedestal: buildSectionFaces(profile.pedestal.points),
          water: buildSectionFaces(profile.water.points),
        }
      : null;
  return {
    bowl: lathe(profile.bowl.points),
    foot: lathe(profile.foot.points),
    pedestal: lathe(profile.pedestal.points),
    cuts,
  };
}

/** The meshes for one form, rebuilt when its profile or the view changes and disposed afterwards. */
export function useFontGeometries(...args: Parameters<typeof buildFontGeometries>): FontGeometries {
  const [profile, section, segments, withCuts] = args;
  const geos = useMemo(
    () => buildFontGeometries(profile, section, segments, withCuts),
    [profile, section, segments, withCuts],
  );
  useEffect(
    () => () => {
      for (const g of [geos.bowl, geos.foot, geos.pedestal]) g.dispose();
      if (geos.cuts) for (const g of Object.values(geos.cuts)) g.dispose();
    },
    [geos],
  );
  return geos;
}
