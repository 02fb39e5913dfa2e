/**
 * Keeps annotation labels from overlapping each other, the legend or the axes: each label offers
 * candidate positions in order of preference and takes the first one that is free and inside bounds.
 */
import { clipSegment } from './clip-polyline';
import type { TextNode } from './scene';
import { boxesOverlap, textBox, type Box } from './text-layout';

export class LabelPlacer {
  private readonly taken: Box[] = [];
  /** Segments of drawn curves: avoided when possible, crossed when nothing else fits. */
  private readonly segments: [[number, number], [number, number]][] = [];
  constructor(
    private readonly bounds: Box,
    private readonly gapMm = 0.6,
  ) {}

  occupy(box: Box): void {
    this.taken.push(box);
  }

  avoidCurve(points: readonly (readonly [number, number])[]): void {
    for (let i = 0; i + 1 < points.length; i++)
      this.segments.push([
        [points[i][0], points[i][1]],
        [points[i + 1][0], points[i + 1][1]],
      ]);
  }

  fits(box: Box, avoidCurves = true): boolean {
    const b = this.bounds;
    if (box.x0 < b.x0 || box.y0 < b.y0 || box.x1 > b.x1 || box.y1 > b.y1) return false;
    if (this.taken.some((t) => boxesOverlap(t, box, this.gapMm))) return false;
    if (!avoidCurves) return true;
    const g = this.gapMm / 2;
    const grown = { x0: box.x0 - g, y0: box.y0 - g, x1: box.x1 + g, y1: box.y1 + g };
    return !this.segments.some(([a, b]) => clipSegment(a, b, grown) !== null);
  }

  /**
   * The first candidate clear of labels and curves, else the first clear of labels only (now
   * occupied), or null when none fits.
   */
  place(candidates: readonly TextNode[]): TextNode | null {
    for (const avoidCurves of [true, false]) {
      for (const c of candidates) {
        const box = textBox(c);
        if (this.fits(box, avoidCurves)) {
          this.taken.push(box);
          return c;
        }
      }
    }
    return null;
  }
}

export interface NearPlacement {
  label: TextNode;
  /** A thin line from the anchor to the label when the label sits away from it. */
  leader: [[number, number], [number, number]] | null;
}

const RINGS_MM = [1.2, 2.5, 4, 6, 9, 13, 18];
const DIRECTIONS = 16;
/** Labels farther than this from their anchor get a leader line. */
const LEADER_FROM_MM = 3;

/**
 * Places a label near an anchor point: tries rings of positions around it, nearest first, each
 * clear of other labels and of curves; else the nearest spot clear of labels only.
 * `make(x, y, anchor)` builds the label with its baseline start, middle or end at (x, y).
 */
export function placeNear(
  placer: LabelPlacer,
  at: [number, number],
  capMm: number,
  make: (x: number, y: number, anchor: TextNode['anchor']) => TextNode,
): NearPlacement | null {
  const candidates: { node: TextNode; distance: number }[] = [];
  for (const r of RINGS_MM) {
    for (let k = 0; k < DIRECTIONS; k++) {
      const a = (2 * Math.PI * k) / DIRECTIONS;
      const dx = r * Math.cos(a);
      const dy = -r * Math.sin(a);
      const anchor: TextNode['anchor'] =
        Math.abs(dx) < 0.3 * r ? 'middle' : dx > 0 ? 'start' : 'end';
      const baseline = at[1] + dy + (dy < -0.3 * r ? 0 : dy > 0.3 * r ? capMm : capMm / 2);
      candidates.push({ node: make(at[0] + dx, baseline, anchor), distance: r });
    }
  }
  for (const avoidCurves of [true, false]) {
    for (const c of candidates) {
      if (!avoidCurves && c.distance > LEADER_FROM_MM) break;
      const box = textBox(c.node);
      if (!placer.fits(box, avoidCurves)) continue;
      placer.occupy(box);
      let leader: NearPlacement['leader'] = null;
      if (c.distance > LEADER_FROM_MM) {
        const nx = Math.min(Math.max(at[0], box.x0), box.x1);
        const ny = Math.min(Math.max(at[1], box.y0), box.y1);
        leader = [at, [nx, ny]];
      }
      return { label: c.node, leader };
    }
  }
  return null;
}
