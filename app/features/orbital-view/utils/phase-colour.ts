/**
 * Colours by phase. Real states: the look's positive colour where ψ > 0, negative where ψ < 0.
 * Complex states: a colour wheel of arg ψ that starts at the positive colour's hue for arg ψ = 0
 * and turns once round the hue circle, keeping its saturation and lightness (Lobewright's own
 * choice; the read-out says that colours mean phase there).
 */
import { Color } from 'three';

const hsl = { h: 0, s: 0, l: 0 };

/** RGB per item (linear, as three.js vertex colours expect) from arg ψ per item. */
export function phaseColours(
  phases: Float32Array,
  positive: string,
  negative: string,
  isReal: boolean,
): Float32Array {
  const out = new Float32Array(3 * phases.length);
  const plus = new Color(positive);
  const minus = new Color(negative);
  const wheel = new Color();
  plus.getHSL(hsl);
  const { h, s, l } = hsl;
  for (let i = 0; i < phases.length; i++) {
    let c: Color;
    if (isReal) c = Math.abs(phases[i]) > Math.PI / 2 ? minus : plus;
    else c = wheel.setHSL((((h + phases[i] / (2 * Math.PI)) % 1) + 1) % 1, s, l);
    out[3 * i] = c.r;
    out[3 * i + 1] = c.g;
    out[3 * i + 2] = c.b;
  }
  return out;
}
