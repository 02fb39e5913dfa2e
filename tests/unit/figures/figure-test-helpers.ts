// Helpers for the figure tests: resolve a spec with the product's house style, and read back the
// positions of tick labels so a test can map a value to its x on the page.
import type { FigureScene, SceneNode, TextNode } from '../../../shared/figures/scene';
import { runsText, walkScene } from '../../../shared/figures/scene';
import { figureSpecSchema, type FigureSpecInput } from '../../../shared/spec/figure-spec';
import { defaultHouseStyle } from '../../../shared/spec/house-style';
import {
  resolveFigureSpec,
  type ResolvedFigureSpec,
} from '../../../shared/spec/resolve-figure-spec';

export function resolved(input: FigureSpecInput): ResolvedFigureSpec {
  return resolveFigureSpec(figureSpecSchema.parse(input), defaultHouseStyle);
}

export function nodesWithRole(nodes: readonly SceneNode[], role: string): SceneNode[] {
  return [...walkScene(nodes)].filter((n) => 'role' in n && n.role === role);
}

export function textsWithRole(scene: FigureScene | readonly SceneNode[], role: string): TextNode[] {
  const nodes = 'children' in scene ? scene.children : scene;
  return nodesWithRole(nodes, role).filter((n): n is TextNode => n.type === 'text');
}

/** Printed tick value (U+2212 minus understood). */
export function tickValue(t: TextNode): number {
  return Number(runsText(t.runs).replace('\u2212', '-'));
}

/** The page x (mm) of an r value, from the first and last x tick labels of a panel. */
export function xOfValue(ticks: readonly TextNode[], value: number): number {
  const a = ticks[0];
  const b = ticks[ticks.length - 1];
  return a.x + ((value - tickValue(a)) * (b.x - a.x)) / (tickValue(b) - tickValue(a));
}
