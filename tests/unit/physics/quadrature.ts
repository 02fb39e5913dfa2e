// Composite Gauss–Legendre quadrature for test integrals over [a, b] (panels of equal width).
import { gaussLegendre } from '../../../shared/physics/gauss-legendre';

export function integrate(
  f: (x: number) => number,
  a: number,
  b: number,
  panels = 400,
  order = 20,
): number {
  const rule = gaussLegendre(order);
  const h = (b - a) / panels;
  let sum = 0;
  for (let p = 0; p < panels; p++) {
    const centre = a + (p + 0.5) * h;
    for (let i = 0; i < order; i++) sum += rule.weights[i] * f(centre + 0.5 * h * rule.nodes[i]);
  }
  return sum * 0.5 * h;
}
