"use client";

/**
 * The WebGL part of the viewer (loaded only through FontViewer). Renders on demand: a frame is drawn
 * only when something changes.
 */
import { useEffect, useMemo, useState } from "react";
import { Canvas, useThree } from "@react-three/fiber";
import { fontGeometry } from "@/models/font";
import { buttonClass } from "@/components/ui/button";
import { cssColor } from "./palette";
import { FontScene } from "./viewer/FontScene";
import { cameraPosition, initialOrbit, tilt, turn, zoomBy, type Orbit } from "./viewer/orbit";
import { useOrbitDrag } from "./viewer/useOrbitDrag";
import type { FontViewerProps } from "./viewerTypes";

const FOV = 35;

interface CanvasProps extends FontViewerProps {
  summaryId: string;
  frameClassName: string;
  onContextLost: () => void;
}

function CameraRig({ orbit, target, distance }: { orbit: Orbit; target: [number, number, number]; distance: number }) {
  const camera = useThree((s) => s.camera);
  const invalidate = useThree((s) => s.invalidate);
  useEffect(() => {
    const [x, y, z] = cameraPosition(orbit, target, distance);
    camera.position.set(x, y, z);
    camera.near = Math.max(1, distance / 200);
    camera.far = distance * 20;
    camera.lookAt(target[0], target[1], target[2]);
    camera.updateProjectionMatrix();
    invalidate();
  }, [camera, invalidate, orbit, target, distance]);
  return null;
}

export default function FontViewerCanvas(props: CanvasProps) {
  const { params, ghostParams, pins = [], onPickPoint, onPinSelect, initialSection = false, initialWater = true } = props;
  const [orbit, setOrbit] = useState<Orbit>(initialSection ? { ...initialOrbit, azimuthDeg: 12 } : initialOrbit);
  const [section, setSection] = useState(initialSection);
  const [water, setWater] = useState(initialWater);
  const drag = useOrbitDrag(setOrbit);
  // Pin labels are DOM overlays; they are mounted once the canvas is in the page, or they never place.
  const [ready, setReady] = useState(false);
  const [colours, setColours] = useState({ pin: "#9a7b2f", ghost: "#1d3a6e" });
  useEffect(() => {
    setColours({ pin: cssColor("--color-record", "#9a7b2f"), ghost: cssColor("--color-action", "#1d3a6e") });
  }, []);

  // Frame the whole font (and the older form, when comparing) with a little room round it.
  const { target, distance } = useMemo(() => {
    const forms = [params, ...(ghostParams ? [ghostParams] : [])].map((p) => fontGeometry(p));
    const height = Math.max(...forms.map((g) => g.rimZ));
    const halfWidth = Math.max(...forms.map((g) => Math.max(g.outerRimRadius, g.pedestalRadius)));
    const fit = Math.max(height * 0.55, halfWidth * 1.1) / Math.tan(((FOV / 2) * Math.PI) / 180);
    return { target: [0, height * 0.5, 0] as [number, number, number], distance: fit * 1.2 };
  }, [params, ghostParams]);

  const toggleSection = () => {
    if (!section) setOrbit((o) => ({ ...o, azimuthDeg: 12 })); // face the cut
    setSection(!section);
  };

  const tool = buttonClass("secondary", "px-3 text-sm");
  const toggle = (on: boolean) => buttonClass(on ? "primary" : "secondary", "px-3 text-sm");

  return (
    <div className="flex flex-col gap-2">
      <div
        ref={drag.ref}
        {...drag.handlers}
        className={`${props.frameClassName} ${onPickPoint ? "cursor-crosshair" : "cursor-grab"}`}
        style={{ touchAction: "pan-y" }}
        role="img"
        aria-label={props.label}
        aria-describedby={props.summaryId}
        data-testid="font-canvas"
      >
        <Canvas
          frameloop="demand"
          dpr={[1, 2]}
          camera={{ fov: FOV, position: [0, 0, 3000], near: 5, far: 60000 }}
          gl={{ antialias: true, preserveDrawingBuffer: true }}
          onCreated={({ gl }) => {
            setReady(true);
            gl.domElement.addEventListener("webglcontextlost", (e) => {
              e.preventDefault();
              props.onContextLost();
            });
          }}
        >
          <CameraRig orbit={orbit} target={target} distance={distance} />
          <hemisphereLight args={["#fffaf0", "#b8a88a", 1.1]} />
          <directionalLight position={[1500, 2500, 2000]} intensity={1.6} />
          <directionalLight position={[-2000, 1200, -1500]} intensity={0.5} />
          <FontScene
            params={params}
            ghostParams={ghostParams}
            section={section}
            water={water}
            pins={ready ? pins : []}
            pinColour={colours.pin}
            ghostColour={colours.ghost}
            onPickPoint={onPickPoint}
          />
        </Canvas>
      </div>

      <div className="grid grid-cols-3 gap-2 sm:flex sm:flex-wrap" role="toolbar" aria-label="Move the 3D view">
        <button type="button" className={tool} onClick={() => setOrbit((o) => turn(o, -30))}>
          Turn left
        </button>
        <button type="button" className={tool} onClick={() => setOrbit((o) => turn(o, 30))}>
          Turn right
        </button>
        <button type="button" className={tool} onClick={() => setOrbit((o) => tilt(o, 10))}>
          Tilt up
        </button>
        <button type="button" className={tool} onClick={() => setOrbit((o) => tilt(o, -10))}>
          Tilt down
        </button>
        <button type="button" className={tool} onClick={() => setOrbit((o) => zoomBy(o, 1.25))}>
          Zoom in
        </button>
        <button type="button" className={tool} onClick={() => setOrbit((o) => zoomBy(o, 1 / 1.25))}>
          Zoom out
        </button>
        <button type="button" className={tool} onClick={() => setOrbit(section ? { ...initialOrbit, azimuthDeg: 12 } : initialOrbit)}>
          Reset view
        </button>
        <button type="button" className={toggle(section)} aria-pressed={section} onClick={toggleSection}>
          Cut in half
        </button>
        <button type="button" className={toggle(water)} aria-pressed={water} onClick={() => setWater((w) => !w)}>
          Show water
        </button>
      </div>

      {pins.length > 0 && (
        <ul className="grid gap-1 text-sm text-ink-soft" aria-label="Points marked on the model">
          {pins.map((p) => (
            <li key={p.id}>
              {onPinSelect ? (
                <button type="button" className="min-h-11 text-left text-action underline-offset-2 hover:underline" onClick={() => onPinSelect(p.id)}>
                  Comment {p.label} — on the {p.part}
                </button>
              ) : (
                <span><span className="text-ink">Comment {p.label}</span> — on the {p.part}</span>
              )}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
