"use client";

import { DoubleSide, Quaternion, Vector3 } from "three";
import type { ThreeEvent } from "@react-three/fiber";
import { Html } from "@react-three/drei";
import type { FontModel, FontPart } from "@/models/font";
import { modelToScene, sceneToModel } from "../latheMesh";
import { sceneColours } from "../palette";
import type { PointMm, ViewerPin } from "../viewerTypes";
import { useFontGeometries, type FontGeometries } from "./useFontGeometries";

export interface FontSceneProps {
  /** the form, worked out once by the viewer */
  model: FontModel;
  /** an older form drawn faintly behind */
  ghost?: FontModel | null;
  section: boolean;
  water: boolean;
  pins: ViewerPin[];
  pinColour: string;
  ghostColour: string;
  onPickPoint?: (part: FontPart, pointMm: PointMm) => void;
}

type Pick = (part: FontPart) => ((e: ThreeEvent<MouseEvent>) => void) | undefined;

const UP = new Vector3(0, 1, 0);
const round = (v: number) => Math.round(v * 10) / 10;

function picker(onPickPoint: FontSceneProps["onPickPoint"]): Pick {
  return (part) =>
    onPickPoint
      ? (e) => {
          if (e.delta > 6) return; // the end of a drag, not a pick
          e.stopPropagation();
          const [x, y, z] = sceneToModel([e.point.x, e.point.y, e.point.z]);
          onPickPoint(part, [round(x), round(y), round(z)]);
        }
      : undefined;
}

export function FontScene({ model, ghost, section, water, pins, pinColour, ghostColour, onPickPoint }: FontSceneProps) {
  const geos = useFontGeometries(model.profile, section);
  const g = model.profile.geometry;
  const pick = picker(onPickPoint);
  return (
    <>
      <Parts geos={geos} pick={pick} />
      {geos.cuts && <CutFaces cuts={geos.cuts} pick={pick} water={water} />}
      {water && <WaterSurface model={model} section={section} />}
      <EngravingMarks model={model} section={section} />
      {ghost && <Ghost profile={ghost.profile} section={section} colour={ghostColour} />}
      <Pins pins={pins} colour={pinColour} rimRadius={model.params.rimRadius} />
      <mesh rotation={[-Math.PI / 2, 0, 0]} position={[0, -0.5, 0]}>
        <circleGeometry args={[Math.max(g.outerRimRadius, g.pedestalRadius) * 1.6, 64]} />
        <meshStandardMaterial color={sceneColours.floor} roughness={1} />
      </mesh>
    </>
  );
}

function Parts({ geos, pick }: { geos: FontGeometries; pick: Pick }) {
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
    </>
  );
}

function CutFaces({ cuts, pick, water }: { cuts: NonNullable<FontGeometries["cuts"]>; pick: Pick; water: boolean }) {
  return (
    <>
      <mesh geometry={cuts.pedestal} position={[0, 0, 0.2]}>
        <meshStandardMaterial color={sceneColours.wood} roughness={0.9} side={DoubleSide} />
      </mesh>
      <mesh geometry={cuts.foot} position={[0, 0, 0.2]} onClick={pick("foot")}>
        <meshStandardMaterial color={sceneColours.glassCut} roughness={0.3} side={DoubleSide} />
      </mesh>
      <mesh geometry={cuts.bowl} position={[0, 0, 0.2]} onClick={pick("bowl")}>
        <meshStandardMaterial color={sceneColours.glassCut} roughness={0.3} side={DoubleSide} />
      </mesh>
      {water && (
        <mesh geometry={cuts.water} position={[0, 0, 0.1]}>
          <meshStandardMaterial color={sceneColours.water} transparent opacity={0.55} side={DoubleSide} />
        </mesh>
      )}
    </>
  );
}

function WaterSurface({ model, section }: { model: FontModel; section: boolean }) {
  return (
    <mesh position={[0, model.profile.geometry.waterLineZ - 0.6, 0]} rotation={[-Math.PI / 2, 0, 0]} renderOrder={3}>
      <circleGeometry args={[model.profile.geometry.waterLineRadius - 0.5, 96, 0, section ? Math.PI : Math.PI * 2]} />
      <meshStandardMaterial color={sceneColours.water} transparent opacity={0.6} roughness={0.1} depthWrite={false} />
    </mesh>
  );
}

/** Where each engraving sits on the outside of the bowl, from the figures the model already holds. */
export function engravingMarkPlaces(model: FontModel, section: boolean) {
  const centreZ = model.profile.geometry.centreZ;
  return model.figures.engravings
    .map((e) => {
      const [x, y, z] = modelToScene([e.x, e.y, e.z]);
      const normal = new Vector3(x, y - centreZ, z).normalize();
      const pos = new Vector3(x, y, z).addScaledVector(normal, 0.4);
      return { key: e.index, pos, quat: new Quaternion().setFromUnitVectors(UP, normal), hidden: section && z > 1e-6 };
    })
    .filter((m) => !m.hidden);
}

function EngravingMarks({ model, section }: { model: FontModel; section: boolean }) {
  const size = Math.min(45, Math.max(8, model.params.rimRadius * 0.1));
  return (
    <>
      {engravingMarkPlaces(model, section).map((m) => (
        <mesh key={m.key} position={m.pos} quaternion={m.quat} renderOrder={4}>
          <cylinderGeometry args={[size, size, 1, 32]} />
          <meshStandardMaterial
            color={sceneColours.engraving}
            emissive={sceneColours.engraving}
            emissiveIntensity={0.35}
            roughness={0.95}
          />
        </mesh>
      ))}
    </>
  );
}

function Pins({ pins, colour, rimRadius }: { pins: ViewerPin[]; colour: string; rimRadius: number }) {
  const radius = Math.min(14, Math.max(5, rimRadius * 0.025));
  return (
    <>
      {pins.map((pin, i) => (
        <group key={pin.id} position={modelToScene(pin.point)}>
          <mesh renderOrder={5}>
            <sphereGeometry args={[radius, 16, 12]} />
            <meshBasicMaterial color={colour} depthTest={false} transparent />
          </mesh>
          <Html center zIndexRange={[10, 0]} style={{ pointerEvents: "none" }}>
            <span
              className="block translate-y-[-1.4rem] rounded bg-card px-1.5 text-xs font-semibold whitespace-nowrap text-record shadow"
              title={pin.label}
            >
              {pin.label || i + 1}
            </span>
          </Html>
        </group>
      ))}
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

function Ghost({ profile, section, colour }: { profile: FontModel["profile"]; section: boolean; colour: string }) {
  const geos = useFontGeometries(profile, section, 48, false);
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
