"use client";

/**
 * The WebGL part of the viewer (loaded only through FontViewer). Renders on demand: a frame is drawn
 * only when something changes. It reads the model it is given and never works the font out again.
 */
import { useEffect, useMemo, useState, type Dispatch, type SetStateAction } from "react";
import { Canvas, useThree } from "@react-three/fiber";
import type { FontModel } from "@/models/font";
import { buttonClass } from "@/components/ui/button";
import { cssColor } from "./palette";
import { FontScene } from "./viewer/FontScene";
import { cameraPosition, initialOrbit, tilt, turn, zoomBy, type Orbit } from "./viewer/orbit";
import { useOrbitDrag } from "./viewer/useOrbitDrag";
import type { FontViewerProps, ViewerPin } from "./viewerTypes";

const FOV = 35;
const sectionOrbit: Orbit = { ...initialOrbit, azimuthDeg: 12 }; // facing the cut

interface CanvasProps extends FontViewerProps {
  summaryId: string;
  frameClassName: string;
  onContextLost: () => void;
}

type Framing = { target: [number, number, number]; distance: number };

/** Frame the whole font (and the older form, when comparing) with a little room round it. */
export function frameForms(model: FontModel, ghost?: FontModel | null): Framing {
  const forms = [model, ...(ghost ? [ghost] : [])].map((m) => m.profile.geometry);
  const height = Math.max(...forms.map((g) => g.rimZ));
  const halfWidth = Math.max(...forms.map((g) => Math.max(g.outerRimRadius, g.pedestalRadius)));
  const fit = Math.max(height * 0.55, halfWidth * 1.1) / Math.tan(((FOV / 2) * Math.PI) / 180);
  return { target: [0, height * 0.5, 0], distance: fit * 1.2 };
}

function CameraRig({ orbit, target, distance }: { orbit: Orbit } & Framing) {
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

function useSceneColours() {
  const [colours, setColours] = useState({ pin: "#9a7b2f", ghost: "#1d3a6e" });
  useEffect(() => {
    setColours({ pin: cssColor("--color-record", "#9a7b2f"), ghost: cssColor("--color-action", "#1d3a6e") });
  }, []);
  return colours;
}

interface ViewState {
  orbit: Orbit;
  section: boolean;
  water: boolean;
  setOrbit: Dispatch<SetStateAction<Orbit>>;
  toggleSection: () => void;
  toggleWater: () => void;
}

function useViewState(initialSection: boolean, initialWater: boolean): ViewState {
  const [orbit, setOrbit] = useState<Orbit>(initialSection ? sectionOrbit : initialOrbit);
  const [section, setSection] = useState(initialSection);
  const [water, setWater] = useState(initialWater);
  const toggleSection = () => {
    if (!section) setOrbit((o) => ({ ...o, azimuthDeg: sectionOrbit.azimuthDeg }));
    setSection(!section);
  };
  return { orbit, section, water, setOrbit, toggleSection, toggleWater: () => setWater((w) => !w) };
}

export default function FontViewerCanvas(props: CanvasProps) {
  const { pins = [], onPickPoint, onPinSelect, initialSection = false, initialWater = true } = props;
  const view = useViewState(initialSection, initialWater);
  const drag = useOrbitDrag(view.setOrbit);
  // Pin labels are DOM overlays; they are mounted once the canvas is in the page, or they never place.
  const [ready, setReady] = useState(false);
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
        <SceneCanvas {...props} pins={ready ? pins : []} view={view} onReady={() => setReady(true)} />
      </div>
      <ViewToolbar view={view} />
      {pins.length > 0 && <PinList pins={pins} onPinSelect={onPinSelect} />}
    </div>
  );
}

function SceneCanvas(props: CanvasProps & { view: ViewState; onReady: () => void }) {
  const { view } = props;
  const colours = useSceneColours();
  const framing = useMemo(() => frameForms(props.model, props.ghost), [props.model, props.ghost]);
  return (
    <Canvas
      frameloop="demand"
      dpr={[1, 2]}
      camera={{ fov: FOV, position: [0, 0, 3000], near: 5, far: 60000 }}
      gl={{ antialias: true, preserveDrawingBuffer: true }}
      onCreated={({ gl }) => {
        props.onReady();
        gl.domElement.addEventListener("webglcontextlost", (e) => {
          e.preventDefault();
          props.onContextLost();
        });
      }}
    >
      <CameraRig orbit={view.orbit} {...framing} />
      <hemisphereLight args={["#fffaf0", "#b8a88a", 1.1]} />
      <directionalLight position={[1500, 2500, 2000]} intensity={1.6} />
      <directionalLight position={[-2000, 1200, -1500]} intensity={0.5} />
      <FontScene
        model={props.model}
        ghost={props.ghost}
        section={view.section}
        water={view.water}
        pins={props.pins ?? []}
        pinColour={colours.pin}
        ghostColour={colours.ghost}
        onPickPoint={props.onPickPoint}
      />
    </Canvas>
  );
}

function ViewToolbar({ view }: { view: ViewState }) {
  const tool = buttonClass("secondary", "px-3 text-sm");
  const toggle = (on: boolean) => buttonClass(on ? "primary" : "secondary", "px-3 text-sm");
  const moves: [string, (o: Orbit) => Orbit][] = [
    ["Turn left", (o) => turn(o, -30)],
    ["Turn right", (o) => turn(o, 30)],
    ["Tilt up", (o) => tilt(o, 10)],
    ["Tilt down", (o) => tilt(o, -10)],
    ["Zoom in", (o) => zoomBy(o, 1.25)],
    ["Zoom out", (o) => zoomBy(o, 1 / 1.25)],
    ["Reset view", () => (view.section ? sectionOrbit : initialOrbit)],
  ];
  return (
    <div className="grid grid-cols-3 gap-2 sm:flex sm:flex-wrap" role="toolbar" aria-label="Move the 3D view">
      {moves.map(([label, move]) => (
        <button key={label} type="button" className={tool} onClick={() => view.setOrbit(move)}>
          {label}
        </button>
      ))}
      <button type="button" className={toggle(view.section)} aria-pressed={view.section} onClick={view.toggleSection}>
        Cut in half
      </button>
      <button type="button" className={toggle(view.water)} aria-pressed={view.water} onClick={view.toggleWater}>
        Show water
      </button>
    </div>
  );
}

function PinList({ pins, onPinSelect }: { pins: ViewerPin[]; onPinSelect?: (pinId: string) => void }) {
  return (
    <ul className="grid gap-1 text-sm text-ink-soft" aria-label="Points marked on the model">
      {pins.map((p) => (
        <li key={p.id}>
          {onPinSelect ? (
            <button
              type="button"
              className="min-h-11 text-left text-action underline-offset-2 hover:underline"
              onClick={() => onPinSelect(p.id)}
            >
              Comment {p.label} — on the {p.part}
            </button>
          ) : (
            <span>
              <span className="text-ink">Comment {p.label}</span> — on the {p.part}
            </span>
          )}
        </li>
      ))}
    </ul>
  );
}
