"use client";

/**
 * The 3D view of a font, loaded lazily: three.js and react-three-fiber are fetched only when a page
 * shows this component, and never rendered on the server. Without WebGL (or if its context is lost)
 * a flat cross-section drawn from the same profile stands in. The text summary is always present.
 * Everything is read from the model it is given; nothing here works the font out again.
 */
import dynamic from "next/dynamic";
import { Component, useEffect, useId, useMemo, useState, type ReactNode } from "react";
import { describeFont, type FontModel } from "@/models/font";
import { buttonClass } from "@/components/ui/button";
import { FontSectionDrawing } from "./FontSectionDrawing";
import { hasWebGL } from "./webgl";
import type { FontViewerProps } from "./viewerTypes";

export type { FontViewerProps, PointMm, ViewerPin } from "./viewerTypes";

const FontViewerCanvas = dynamic(() => import("./FontViewerCanvas"), {
  ssr: false,
  loading: () => <ViewerPlaceholder text="Loading the 3D view…" />,
});

const frame = "relative w-full overflow-hidden rounded-lg border border-line bg-card aspect-square sm:aspect-[4/3]";

function ViewerPlaceholder({ text }: { text: string }) {
  return (
    <div className={`${frame} flex items-center justify-center text-ink-soft`} aria-busy="true">
      <p className="font-sans text-sm">{text}</p>
    </div>
  );
}

class ViewerErrorBoundary extends Component<{ fallback: ReactNode; children: ReactNode }, { failed: boolean }> {
  state = { failed: false };
  static getDerivedStateFromError() {
    return { failed: true };
  }
  render() {
    return this.state.failed ? this.props.fallback : this.props.children;
  }
}

type Mode = "checking" | "3d" | "no-webgl" | "lost";

/** The flat cross-section shown instead of the 3D view, with why, and a retry when it may work again. */
function SectionFallback({ model, why, onRetry }: { model: FontModel; why: string; onRetry?: () => void }) {
  return (
    <div className={`${frame} flex flex-col items-center justify-center gap-3 p-4`}>
      <FontSectionDrawing profile={model.profile} className="h-3/4 w-full text-ink" />
      <p className="text-center font-sans text-sm text-ink-soft">{why}</p>
      {onRetry && (
        <button type="button" className={buttonClass("secondary")} onClick={onRetry}>
          Try the 3D view again
        </button>
      )}
    </div>
  );
}

export function FontViewer(props: FontViewerProps) {
  const { model, units = "mm", className = "", label = "3D view of the font" } = props;
  const summaryId = useId();
  const [mode, setMode] = useState<Mode>("checking");
  const [attempt, setAttempt] = useState(0);

  useEffect(() => {
    setMode(hasWebGL() ? "3d" : "no-webgl");
  }, []);

  const summary = useMemo(() => describeFont(model.params, model.figures, units), [model, units]);

  const retry = () => {
    setAttempt((n) => n + 1);
    setMode("3d");
  };
  const fallback = (why: string, canRetry: boolean) => (
    <SectionFallback model={model} why={why} onRetry={canRetry ? retry : undefined} />
  );

  let body: ReactNode;
  if (mode === "checking") body = <ViewerPlaceholder text="Preparing the 3D view…" />;
  else if (mode === "no-webgl")
    body = fallback("This browser cannot show the 3D view, so here is a cross-section instead.", false);
  else if (mode === "lost") body = fallback("The 3D view stopped working, so here is a cross-section instead.", true);
  else
    body = (
      <ViewerErrorBoundary
        key={attempt}
        fallback={fallback("The 3D view could not start, so here is a cross-section instead.", true)}
      >
        <FontViewerCanvas
          {...props}
          label={label}
          summaryId={summaryId}
          frameClassName={frame}
          onContextLost={() => setMode("lost")}
        />
      </ViewerErrorBoundary>
    );

  return (
    <figure className={`font-sans ${className}`} data-testid="font-viewer">
      {body}
      <figcaption id={summaryId} className="sr-only">
        {summary}
      </figcaption>
    </figure>
  );
}

export default FontViewer;
