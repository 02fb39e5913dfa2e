/**
 * Colour scales of slices: diverging for signed ψ (negative phase colour ← white at zero → positive
 * phase colour) and sequential for the density (white → positive colour → its darker shade).
 * Linear in the value, mixed in sRGB; the phase colours come from the figure's look.
 */

export type Rgb = [number, number, number];

export function parseHex(hex: string): Rgb {
  const m = /^#([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(hex);
  if (!m) throw new Error(`not a #rrggbb colour: ${hex}`);
  return [parseInt(m[1], 16), parseInt(m[2], 16), parseInt(m[3], 16)];
}

const WHITE: Rgb = [255, 255, 255];

function mix(a: Rgb, b: Rgb, t: number): Rgb {
  return [a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t, a[2] + (b[2] - a[2]) * t];
}

/** The darker end of the density scale: the positive colour at 55 % brightness. */
function darker(c: Rgb): Rgb {
  return [c[0] * 0.55, c[1] * 0.55, c[2] * 0.55];
}

export interface ColourScale {
  /** Value range the scale spans (density: [0, max]; ψ: [−max, max]). */
  lo: number;
  hi: number;
  /** 256 RGB entries spanning lo … hi, for loops that colour many pixels. */
  lut: Uint8Array;
  /** Writes the colour of value v as bytes into out at offset (RGBA, alpha 255). */
  write(v: number, out: Uint8Array, offset: number): void;
}

/** A 256-entry lookup table from a function of t ∈ [0, 1]. */
function table(f: (t: number) => Rgb): Uint8Array {
  const lut = new Uint8Array(256 * 3);
  for (let i = 0; i < 256; i++) {
    const c = f(i / 255);
    lut[3 * i] = Math.round(c[0]);
    lut[3 * i + 1] = Math.round(c[1]);
    lut[3 * i + 2] = Math.round(c[2]);
  }
  return lut;
}

function fromTable(lut: Uint8Array, lo: number, hi: number): ColourScale {
  const k = 255 / (hi - lo);
  return {
    lo,
    hi,
    lut,
    write(v, out, offset) {
      let i = Math.round((v - lo) * k);
      i = i < 0 ? 0 : i > 255 ? 255 : i;
      out[offset] = lut[3 * i];
      out[offset + 1] = lut[3 * i + 1];
      out[offset + 2] = lut[3 * i + 2];
      out[offset + 3] = 255;
    },
  };
}

export function divergingScale(max: number, positive: string, negative: string): ColourScale {
  const pos = parseHex(positive);
  const neg = parseHex(negative);
  // 255 steps over [−max, max]: entry 127.5 is zero, so white sits between two entries; use 2t − 1.
  const lut = table((t) => {
    const s = 2 * t - 1;
    return s >= 0 ? mix(WHITE, pos, s) : mix(WHITE, neg, -s);
  });
  return fromTable(lut, -max, max);
}

export function sequentialScale(max: number, positive: string): ColourScale {
  const pos = parseHex(positive);
  const lut = table((t) =>
    t <= 0.7 ? mix(WHITE, pos, t / 0.7) : mix(pos, darker(pos), (t - 0.7) / 0.3),
  );
  return fromTable(lut, 0, max);
}

/** A vertical strip of the scale, top = hi, as RGBA rows for an image node. */
export function scaleStrip(scale: ColourScale, width: number, height: number): Uint8Array {
  const rgba = new Uint8Array(width * height * 4);
  for (let y = 0; y < height; y++) {
    const v = scale.hi - ((y + 0.5) / height) * (scale.hi - scale.lo);
    for (let x = 0; x < width; x++) scale.write(v, rgba, 4 * (y * width + x));
  }
  return rgba;
}
