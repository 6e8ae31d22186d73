"use client";

import { useMemo } from "react";
import { DoubleSide, Quaternion, Vector3 } from "three";
import type { ThreeEvent } from "@react-three/fiber";
import { Html } from "@react-three/drei";
import { computeFontFigures, type FontParameters, type FontPart } from "@/models/font";
import { modelToScene, sceneToModel } from "../latheMesh";
import { sceneColours } from "../palette";
import type { PointMm, ViewerPin } from "../viewerTypes";
import { useFontGeometries } from "./useFontGeometries";

export interface FontSceneProps {
  params: FontParameters;
  ghostParams?: FontParameters | null;
  section: boolean;
  water: boolean;
  pins: ViewerPin[];
  pinColour: string;
  ghostColour: string;
  onPickPoint?: (part: FontPart, pointMm: PointMm) => void;
}

const UP = new Vector3(0, 1, 0);
const round = (v: number) => Math.round(v * 10) / 10;

export function FontScene({ params, ghostParams, section, water, pins, pinColour, ghostColour, onPickPoint }: FontSceneProps) {
  const geos = useFontGeometries(params, section);
  const g = geos.profile.geometry;
  const figures = useMemo(() => computeFontFigures(params, geos.profile), [params, geos.profile]);

  const pick = (part: FontPart) =>
    onPickPoint
      ? (e: ThreeEvent<MouseEvent>) => {
          if (e.delta > 6) return; // the end of a drag, not a pick
          e.stopPropagation();
          const [x, y, z] = sceneToModel([e.point.x, e.point.y, e.point.z]);
          onPickPoint(part, [round(x), round(y), round(z)]);
        }
      : undefined;

  const markSize = Math.min(45, Math.max(8, params.rimRadius * 0.1));
  const marks = figures.engravings
    .map((e) => {
      const [x, y, z] = modelToScene([e.x, e.y, e.z]);
      const normal = new Vector3(x, y - g.centreZ, z).normalize();
      const pos = new Vector3(x, y, z).addScaledVector(normal, 0.4);
      return { key: e.index, pos, quat: new Quaternion().setFromUnitVectors(UP, normal), hidden: section && z > 1e-6 };
    })
    .filter((m) => !m.hidden);

  const pinRadius = Math.min(14, Math.max(5, params.rimRadius * 0.025));

  return (
    <>
      <mesh geometry={geos.pedestal} onClick={pick("pedestal")}>
        <meshStandardMaterial color={sceneColours.wood} roughness={0.75} metalness={0} />
      </mesh>
      <mesh geometry={geos.foot} onClick={pick("foot")} renderOrder={1}>
        <GlassMaterial />
      </mesh>
      <mesh geometry={geos.bowl} onClick={pick("bowl")} renderOrder={2}>
        <GlassMaterial />
      </mesh>

      {geos.cuts && (
        <>
          <mesh geometry={geos.cuts.pedestal} position={[0, 0, 0.2]}>
            <meshStandardMaterial color={sceneColours.wood} roughness={0.9} side={DoubleSide} />
          </mesh>
          <mesh geometry={geos.cuts.foot} position={[0, 0, 0.2]} onClick={pick("foot")}>
            <meshStandardMaterial color={sceneColours.glassCut} roughness={0.3} side={DoubleSide} />
          </mesh>
          <mesh geometry={geos.cuts.bowl} position={[0, 0, 0.2]} onClick={pick("bowl")}>
            <meshStandardMaterial color={sceneColours.glassCut} roughness={0.3} side={DoubleSide} />
          </mesh>
          {water && (
            <mesh geometry={geos.cuts.water} position={[0, 0, 0.1]}>
              <meshStandardMaterial color={sceneColours.water} transparent opacity={0.55} side={DoubleSide} />
            </mesh>
          )}
        </>
      )}

      {water && (
        <mesh position={[0, g.rimZ - 0.6, 0]} rotation={[-Math.PI / 2, 0, 0]} renderOrder={3}>
          <circleGeometry args={[params.rimRadius - 0.5, 96, 0, section ? Math.PI : Math.PI * 2]} />
          <meshStandardMaterial color={sceneColours.water} transparent opacity={0.6} roughness={0.1} depthWrite={false} />
        </mesh>
      )}

      {marks.map((m) => (
        <mesh key={m.key} position={m.pos} quaternion={m.quat} renderOrder={4}>
          <cylinderGeometry args={[markSize, markSize, 1, 32]} />
          <meshStandardMaterial
            color={sceneColours.engraving}
            emissive={sceneColours.engraving}
            emissiveIntensity={0.35}
            roughness={0.95}
          />
        </mesh>
      ))}

      {ghostParams && <Ghost params={ghostParams} section={section} colour={ghostColour} />}

      {pins.map((pin, i) => (
        <group key={pin.id} position={modelToScene(pin.point)}>
          <mesh renderOrder={5}>
            <sphereGeometry args={[pinRadius, 16, 12]} />
            <meshBasicMaterial color={pinColour} depthTest={false} transparent />
          </mesh>
          <Html center zIndexRange={[10, 0]} style={{ pointerEvents: "none" }}>
            <span
              className="block translate-y-[-1.4rem] whitespace-nowrap rounded bg-card px-1.5 text-xs font-semibold text-record shadow"
              title={pin.label}
            >
              {pin.label || i + 1}
            </span>
          </Html>
        </group>
      ))}

      <mesh rotation={[-Math.PI / 2, 0, 0]} position={[0, -0.5, 0]}>
        <circleGeometry args={[Math.max(g.outerRimRadius, g.pedestalRadius) * 1.6, 64]} />
        <meshStandardMaterial color={sceneColours.floor} roughness={1} />
      </mesh>
    </>
  );
}

function GlassMaterial() {
  return (
    <meshPhysicalMaterial
      color={sceneColours.glass}
      roughness={0.06}
      metalness={0}
      clearcoat={1}
      clearcoatRoughness={0.05}
      transparent
      opacity={0.55}
      ior={1.52}
    />
  );
}

function Ghost({ params, section, colour }: { params: FontParameters; section: boolean; colour: string }) {
  const geos = useFontGeometries(params, section, 48, false);
  return (
    <>
      {[geos.bowl, geos.foot].map((geo, i) => (
        <mesh key={i} geometry={geo} renderOrder={6}>
          <meshBasicMaterial color={colour} transparent opacity={0.14} depthWrite={false} />
        </mesh>
      ))}
    </>
  );
}
