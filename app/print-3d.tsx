// Print entry for 3D figures: renders a resolved spec with the viewer's own scene code into a canvas
// of exactly the asked pixel size, then sets `data-figure-ready="true"` (or `data-figure-error`) on
// <html> and leaves the facts and the label projection in window.__LOBEWRIGHT_PRINT_RESULT__.
// The first job comes from window.__LOBEWRIGHT_PRINT__ (set before load) or from ?job=<url of JSON>;
// later jobs may be handed to window.__lobewrightPrint(job) on the same page, which keeps the WebGL
// context and compiled shaders warm for batches. Geometry is computed here, on the main thread.
import { Component, useEffect, useRef, useState, type ReactNode } from 'react';
import { createRoot } from 'react-dom/client';
import { Canvas, useFrame, useThree } from '@react-three/fiber';
import type { Camera } from 'three';
import { figureSpecSchema } from '../shared/spec/figure-spec';
import { defaultHouseStyle } from '../shared/spec/house-style';
import { resolveFigureSpec, type ResolvedFigureSpec } from '../shared/spec/resolve-figure-spec';
import { buildOrbitalGeometry } from './features/orbital-view/utils/build-orbital-geometry';
import type { OrbitalFacts, OrbitalGeometry } from './features/orbital-view/utils/orbital-geometry';
import { OrbitalScene } from './features/orbital-view/components/orbital-scene';
import { axisEnds, AXIS_NAMES } from './features/orbital-view/components/axes';
import { pixelsPerBohrAtNucleus } from './features/orbital-view/components/scale-bar';
import { scaleBarLayout } from './features/orbital-view/utils/scale-bar-layout';
import {
  projectToPixels,
  type PrintProjection,
} from './features/orbital-view/utils/print-projection';

export interface PrintJob {
  /** A figure spec (resolved, or stored: missing look and print fields take the product defaults). */
  spec: unknown;
  widthPx: number;
  heightPx: number;
}

export interface PrintResult {
  facts: OrbitalFacts;
  notes: readonly string[];
  projection: PrintProjection;
  /** Milliseconds for the geometry and from handing the scene to React to the drawn frame. */
  ms: { geometry: number; draw: number };
}

declare global {
  interface Window {
    __LOBEWRIGHT_PRINT__?: PrintJob;
    __LOBEWRIGHT_PRINT_RESULT__?: PrintResult;
    __lobewrightPrint?: (job: PrintJob) => Promise<PrintResult>;
    __lobewrightCapture?: () => string;
  }
}

/** Cloud dots on paper, mm (a fine dot that still prints). */
const CLOUD_DOT_MM = 0.22;
const MAX_SIDE_PX = 8192;

interface PreparedJob {
  token: number;
  spec: ResolvedFigureSpec;
  geometry: OrbitalGeometry;
  widthPx: number;
  heightPx: number;
  geometryMs: number;
  startedAt: number;
  done: (result: PrintResult) => void;
}

const html = document.documentElement;
let showJob: ((job: PreparedJob) => void) | null = null;
let nextToken = 1;

function fail(message: string): void {
  html.dataset.figureError = message;
}

function checkSide(value: unknown, field: string): number {
  if (typeof value !== 'number' || !Number.isInteger(value) || value < 1 || value > MAX_SIDE_PX) {
    throw new Error(
      `${field}: must be an integer number of pixels from 1 to ${MAX_SIDE_PX}, got ${String(value)}`,
    );
  }
  return value;
}

/** Draws a job: validates it, computes the geometry, hands the scene to React and resolves when the frame is drawn. */
function print(job: PrintJob): Promise<PrintResult> {
  delete html.dataset.figureReady;
  delete html.dataset.figureError;
  return new Promise<PrintResult>((resolve, reject) => {
    try {
      const widthPx = checkSide(job.widthPx, 'widthPx');
      const heightPx = checkSide(job.heightPx, 'heightPx');
      const parsed = figureSpecSchema.safeParse(job.spec);
      if (!parsed.success) {
        const issue = parsed.error.issues[0];
        throw new Error(`spec.${issue.path.join('.')}: ${issue.message}`);
      }
      const spec = resolveFigureSpec(parsed.data, defaultHouseStyle);
      document.body.style.background =
        spec.print.background === 'white' ? '#ffffff' : 'transparent';
      const started = performance.now();
      const geometry = buildOrbitalGeometry(spec);
      const geometryMs = performance.now() - started;
      if (!showJob) throw new Error('the print page is not ready');
      showJob({
        token: nextToken++,
        spec,
        geometry,
        widthPx,
        heightPx,
        geometryMs,
        startedAt: performance.now(),
        done: (result) => {
          window.__LOBEWRIGHT_PRINT_RESULT__ = result;
          html.dataset.figureReady = 'true';
          resolve(result);
        },
      });
    } catch (error) {
      const message = error instanceof Error ? error.message : String(error);
      fail(message);
      reject(new Error(message));
    }
  });
}

/** Waits for the first frame drawn at the job's exact size, then reports it (the canvas resizes a frame late). */
function ReadySignal({ job }: { job: PreparedJob }) {
  const invalidate = useThree((s) => s.invalidate);
  const armed = useRef(true);
  useEffect(() => invalidate(), [invalidate]);
  useFrame((state) => {
    if (!armed.current) return;
    const canvas = state.gl.domElement;
    if (
      state.size.width !== job.widthPx ||
      state.size.height !== job.heightPx ||
      canvas.width !== job.widthPx ||
      canvas.height !== job.heightPx
    ) {
      state.invalidate();
      return;
    }
    armed.current = false;
    // useFrame runs just before the frame is drawn; the next animation frame comes after it.
    requestAnimationFrame(() => job.done(printResult(job, state.camera)));
  });
  return null;
}

function printResult(job: PreparedJob, camera: Camera): PrintResult {
  const { spec, geometry, widthPx, heightPx } = job;
  const pixelsPerBohr = pixelsPerBohrAtNucleus(
    camera as Parameters<typeof pixelsPerBohrAtNucleus>[0],
    heightPx,
  );
  return {
    facts: geometry.facts,
    notes: geometry.notes,
    projection: {
      widthPx,
      heightPx,
      pixelsPerBohr,
      nucleus: projectToPixels(camera, [0, 0, 0], widthPx, heightPx),
      axes: spec.look.showAxes
        ? axisEnds(geometry.radius).map((end, i) => ({
            name: AXIS_NAMES[i],
            end: projectToPixels(camera, end, widthPx, heightPx),
          }))
        : [],
      scaleBar:
        spec.look.showScaleBar && geometry.hasLength
          ? scaleBarLayout(pixelsPerBohr, widthPx, heightPx, spec.system.lengthUnit)
          : null,
    },
    ms: { geometry: job.geometryMs, draw: performance.now() - job.startedAt },
  };
}

class PrintErrorBoundary extends Component<{ children: ReactNode }, { failed: boolean }> {
  override state = { failed: false };
  static getDerivedStateFromError(): { failed: boolean } {
    return { failed: true };
  }
  override componentDidCatch(error: Error): void {
    fail(`drawing: ${error.message}`);
  }
  override render(): ReactNode {
    return this.state.failed ? null : this.props.children;
  }
}

/** One canvas for every job of the page: the WebGL context and shader programs survive between figures. */
function PrintApp() {
  const [job, setJob] = useState<PreparedJob | null>(null);
  useEffect(() => {
    showJob = setJob;
    return () => {
      showJob = null;
    };
  }, []);
  if (!job) return null;
  const { spec, geometry, widthPx, heightPx } = job;
  const pxPerPt = spec.print.dpi / 72;
  return (
    <div style={{ width: `${widthPx}px`, height: `${heightPx}px` }}>
      <Canvas
        frameloop="demand"
        flat
        dpr={1}
        resize={{ debounce: 0 }}
        gl={{ antialias: true, alpha: true, preserveDrawingBuffer: true }}
        onCreated={({ gl }) => {
          window.__lobewrightCapture = () => gl.domElement.toDataURL('image/png');
        }}
      >
        {spec.print.background === 'white' ? (
          <color attach="background" args={['#ffffff']} />
        ) : null}
        <OrbitalScene
          key={job.token}
          geometry={geometry}
          spec={spec}
          domLabels={false}
          lineWidthPx={spec.look.lineWidthPt * pxPerPt}
          pointSizePx={Math.max(1, (CLOUD_DOT_MM / 25.4) * spec.print.dpi)}
        />
        <ReadySignal key={`ready-${job.token}`} job={job} />
      </Canvas>
    </div>
  );
}

async function firstJob(): Promise<PrintJob | null> {
  if (window.__LOBEWRIGHT_PRINT__) return window.__LOBEWRIGHT_PRINT__;
  const url = new URLSearchParams(location.search).get('job');
  if (!url) return null;
  const response = await fetch(url);
  if (!response.ok) throw new Error(`job: ${url} answered ${response.status}`);
  return (await response.json()) as PrintJob;
}

window.addEventListener('error', (event) => fail(event.message));
window.addEventListener('unhandledrejection', (event) =>
  fail(String((event.reason as Error)?.message ?? event.reason)),
);

const root = document.getElementById('root');
if (!root) throw new Error('print-3d.html must contain #root');
createRoot(root).render(
  <PrintErrorBoundary>
    <PrintApp />
  </PrintErrorBoundary>,
);
window.__lobewrightPrint = async (job) => {
  // The root mounts PrintApp asynchronously; wait for it before the first job.
  while (!showJob) await new Promise((r) => setTimeout(r, 5));
  return print(job);
};
firstJob()
  .then((job) => (job ? window.__lobewrightPrint!(job) : null))
  .catch((error: unknown) => fail(error instanceof Error ? error.message : String(error)));
