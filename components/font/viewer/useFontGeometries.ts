"use client";

import { useEffect, useMemo } from "react";
import type { BufferGeometry } from "three";
import { fontProfile, type FontParameters, type FontProfile } from "@/models/font";
import { buildLathe, buildSectionFaces, DEFAULT_LATHE_SEGMENTS } from "../latheMesh";

export interface FontGeometries {
  profile: FontProfile;
  bowl: BufferGeometry;
  foot: BufferGeometry;
  pedestal: BufferGeometry;
  /** cut faces, only in the section view */
  cuts: { bowl: BufferGeometry; foot: BufferGeometry; pedestal: BufferGeometry; water: BufferGeometry } | null;
}

/** The meshes for one form, rebuilt when the form or the view changes and disposed afterwards. */
export function useFontGeometries(
  params: FontParameters,
  section: boolean,
  segments = DEFAULT_LATHE_SEGMENTS,
  withCuts = true,
): FontGeometries {
  const geos = useMemo(() => {
    const profile = fontProfile(params);
    const lathe = (pts: typeof profile.bowl.points) => buildLathe(pts, segments, section);
    return {
      profile,
      bowl: lathe(profile.bowl.points),
      foot: lathe(profile.foot.points),
      pedestal: lathe(profile.pedestal.points),
      cuts: section && withCuts
        ? {
            bowl: buildSectionFaces(profile.bowl.points),
            foot: buildSectionFaces(profile.foot.points),
            pedestal: buildSectionFaces(profile.pedestal.points),
            water: buildSectionFaces(profile.water.points),
          }
        : null,
    };
  }, [params, section, segments, withCuts]);

  useEffect(
    () => () => {
      for (const g of [geos.bowl, geos.foot, geos.pedestal]) g.dispose();
      if (geos.cuts) for (const g of Object.values(geos.cuts)) g.dispose();
    },
    [geos],
  );
  return geos;
}
