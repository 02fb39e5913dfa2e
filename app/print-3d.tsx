// Print entry for 3D figures: renders one resolved spec with the viewer's own scene code into a
// canvas of exactly the asked pixel size, then signals `data-figure-ready` (or `data-figure-error`)
// on <html> and leaves the facts and the label projection in window.__LOBEWRIGHT_PRINT_RESULT__.
// The job comes from window.__LOBEWRIGHT_PRINT__ (set before load) or from ?job=<url of JSON>.
import { Component, useEffect, useRef, type ReactNode } from 'react';
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
import { projectToPixels, type PrintProjection } from './features/orbital-view/utils/print-projection';

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
  /** Milliseconds for the geometry and from mounting to the drawn frame. */
  ms: { geometry: number; draw: number };
}

declare global {
  interface Window {
    __LOBEWRIGHT_PRINT__?: PrintJob;
    __LOBEWRIGHT_PRINT_RESULT__?: PrintResult;
    __lobewrightCapture?: () => string;
  }
}

/** Cloud dots on paper, mm (a fine dot that still prints). */
const CLOUD_DOT_MM = 0.22;
const MAX_SIDE_PX = 8192;

function fail(message: string): void {
  document.documentElement.dataset.figureError = message;
}

async function readJob(): Promise<PrintJob> {
  if (window.__LOBEWRIGHT_PRINT__) return window.__LOBEWRIGHT_PRINT__;
  const url = new URLSearchParams(location.search).get('job');
  if (!url) throw new Error('no print job: set window.__LOBEWRIGHT_PRINT__ or pass ?job=<url>');
  const response = await fetch(url);
  if (!response.ok) throw new Error(`job: ${url} answered ${response.status}`);
  return (await response.json()) as PrintJob;
}

function checkSide(value: unknown, field: string): number {
  if (typeof value !== 'number' || !Number.isInteger(value) || value < 1 || value > MAX_SIDE_PX) {
    throw new Error(`${field}: must be an integer number of pixels from 1 to ${MAX_SIDE_PX}, got ${String(value)}`);
  }
  return value;
}

function ReadySignal({ onDrawn }: { onDrawn: (camera: Camera) => void }) {
  const invalidate = useThree((s) => s.invalidate);
  const armed = useRef(true);
  useEffect(() => invalidate(), [invalidate]);
  // useFrame runs just before the frame is drawn; the next animation frame comes after it.
  useFrame((state) => {
    if (!armed.current) return;
    armed.current = false;
    requestAnimationFrame(() => onDrawn(state.camera));
  });
  return null;
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

interface PrintFigureProps {
  spec: ResolvedFigureSpec;
  geometry: OrbitalGeometry;
  widthPx: number;
  heightPx: number;
  geometryMs: number;
  /** performance.now() when the scene was handed to React. */
  mountedAt: number;
}

function PrintFigure({ spec, geometry, widthPx, heightPx, geometryMs, mountedAt }: PrintFigureProps) {
  const pxPerPt = spec.print.dpi / 72;
  const onDrawn = (camera: Camera): void => {
    const pixelsPerBohr = pixelsPerBohrAtNucleus(camera as Parameters<typeof pixelsPerBohrAtNucleus>[0], heightPx);
    const projection: PrintProjection = {
      widthPx,
      heightPx,
      pixelsPerBohr,
      nucleus: projectToPixels(camera, [0, 0, 0], widthPx, heightPx),
      axes: spec.look.showAxes ? axisEnds(geometry.radius).map((end, i) => ({ name: AXIS_NAMES[i], end: projectToPixels(camera, end, widthPx, heightPx) })) : [],
      scaleBar: spec.look.showScaleBar && geometry.hasLength ? scaleBarLayout(pixelsPerBohr, widthPx, heightPx, spec.system.lengthUnit) : null,
    };
    window.__LOBEWRIGHT_PRINT_RESULT__ = { facts: geometry.facts, notes: geometry.notes, projection, ms: { geometry: geometryMs, draw: performance.now() - mountedAt } };
    document.documentElement.dataset.figureReady = 'true';
  };
  return (
    <Canvas
      frameloop="demand"
      flat
      dpr={1}
      gl={{ antialias: true, alpha: true, preserveDrawingBuffer: true }}
      style={{ width: `${widthPx}px`, height: `${heightPx}px` }}
      onCreated={({ gl }) => {
        window.__lobewrightCapture = () => gl.domElement.toDataURL('image/png');
      }}
    >
      {spec.print.background === 'white' ? <color attach="background" args={['#ffffff']} /> : null}
      <OrbitalScene
        geometry={geometry}
        spec={spec}
        domLabels={false}
        lineWidthPx={spec.look.lineWidthPt * pxPerPt}
        pointSizePx={Math.max(1, (CLOUD_DOT_MM / 25.4) * spec.print.dpi)}
      />
      <ReadySignal onDrawn={onDrawn} />
    </Canvas>
  );
}

async function main(): Promise<void> {
  const job = await readJob();
  const widthPx = checkSide(job.widthPx, 'widthPx');
  const heightPx = checkSide(job.heightPx, 'heightPx');
  const parsed = figureSpecSchema.safeParse(job.spec);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw new Error(`spec.${issue.path.join('.')}: ${issue.message}`);
  }
  const spec = resolveFigureSpec(parsed.data, defaultHouseStyle);
  if (spec.print.background === 'white') document.body.style.background = '#ffffff';
  const started = performance.now();
  const geometry = buildOrbitalGeometry(spec);
  const geometryMs = performance.now() - started;
  const root = document.getElementById('root');
  if (!root) throw new Error('print-3d.html must contain #root');
  root.style.width = `${widthPx}px`;
  root.style.height = `${heightPx}px`;
  createRoot(root).render(
    <PrintErrorBoundary>
      <PrintFigure spec={spec} geometry={geometry} widthPx={widthPx} heightPx={heightPx} geometryMs={geometryMs} mountedAt={performance.now()} />
    </PrintErrorBoundary>,
  );
}

window.addEventListener('error', (event) => fail(event.message));
window.addEventListener('unhandledrejection', (event) => fail(String((event.reason as Error)?.message ?? event.reason)));
main().catch((error: unknown) => fail(error instanceof Error ? error.message : String(error)));
