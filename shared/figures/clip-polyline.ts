/**
 * Cuts a polyline to a rectangle, so curves that run off a plot (V_eff near r = 0) end exactly at
 * the frame instead of carrying far-away points. Segment clipping by Liang & Barsky, "A new concept
 * and method for line clipping", ACM Trans. Graph. 3, 1 (1984).
 */
import type { Frame } from './plot-axes';

type Point = [number, number];

export function clipSegment(a: Point, b: Point, f: Frame): [Point, Point] | null {
  let t0 = 0;
  let t1 = 1;
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const edges: [number, number][] = [
    [-dx, a[0] - f.x0],
    [dx, f.x1 - a[0]],
    [-dy, a[1] - f.y0],
    [dy, f.y1 - a[1]],
  ];
  for (const [p, q] of edges) {
    if (p === 0) {
      if (q < 0) return null;
      continue;
    }
    const r = q / p;
    if (p < 0) {
      if (r > t1) return null;
      if (r > t0) t0 = r;
    } else {
      if (r < t0) return null;
      if (r < t1) t1 = r;
    }
  }
  // Unclipped ends are returned as given, so consecutive segments join exactly.
  return [
    t0 === 0 ? a : [a[0] + t0 * dx, a[1] + t0 * dy],
    t1 === 1 ? b : [a[0] + t1 * dx, a[1] + t1 * dy],
  ];
}

/** The pieces of the polyline inside the frame, each with at least two points. */
export function clipPolyline(points: readonly Point[], frame: Frame): Point[][] {
  const pieces: Point[][] = [];
  let current: Point[] = [];
  for (let i = 0; i + 1 < points.length; i++) {
    const clipped = clipSegment(points[i], points[i + 1], frame);
    if (!clipped) {
      if (current.length > 1) pieces.push(current);
      current = [];
      continue;
    }
    const [p, q] = clipped;
    const last = current[current.length - 1];
    if (!last || last[0] !== p[0] || last[1] !== p[1]) {
      if (current.length > 1) pieces.push(current);
      current = [p];
    }
    current.push(q);
  }
  if (current.length > 1) pieces.push(current);
  return pieces;
}
