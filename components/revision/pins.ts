import type { ViewerPin } from "@/components/font";

interface ThreadLike {
  id: number;
  target: { kind: string; part?: string; point?: [number, number, number] };
  resolved?: boolean;
}

/** Model pins for the 3D viewer from the comment threads pinned to the model. */
export function modelPins(threads: ThreadLike[]): ViewerPin[] {
  return threads
    .filter((t) => t.target.kind === "model" && t.target.point && t.target.part)
    .map((t, i) => ({ id: String(t.id), part: t.target.part as ViewerPin["part"], point: t.target.point!, label: String(i + 1) }));
}
