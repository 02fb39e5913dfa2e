/**
 * A small PNG encoder for the colour fields of figures (embedded in SVG as data: URIs and in PDF),
 * pure TypeScript so it runs in the browser and on the server alike.
 *
 * Format: PNG (ISO/IEC 15948, W3C PNG 2nd ed.), 8-bit truecolour, with alpha only when some pixel is
 * not opaque; every row uses the "Up" filter, then zlib deflate (fflate). An opaque field is written
 * as RGB, which pdfkit embeds without decoding. Optional pHYs chunk for the resolution. No time
 * chunk: the same pixels always give the same bytes.
 */
import { zlibSync } from 'fflate';

const CRC_TABLE = (() => {
  const table = new Uint32Array(256);
  for (let n = 0; n < 256; n++) {
    let c = n;
    for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
    table[n] = c >>> 0;
  }
  return table;
})();

function crc32(bytes: Uint8Array, start: number, end: number): number {
  let c = 0xffffffff;
  for (let i = start; i < end; i++) c = CRC_TABLE[(c ^ bytes[i]) & 0xff] ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}

function chunk(type: string, data: Uint8Array): Uint8Array {
  const out = new Uint8Array(12 + data.length);
  const view = new DataView(out.buffer);
  view.setUint32(0, data.length);
  for (let i = 0; i < 4; i++) out[4 + i] = type.charCodeAt(i);
  out.set(data, 8);
  view.setUint32(8 + data.length, crc32(out, 4, 8 + data.length));
  return out;
}

export function isOpaque(rgba: Uint8Array): boolean {
  for (let i = 3; i < rgba.length; i += 4) if (rgba[i] !== 255) return false;
  return true;
}

export interface PngOptions {
  /** Writes a pHYs chunk with this resolution (pixels per inch, stored per metre). */
  dpi?: number;
  /** zlib level 0–9; default 6. */
  level?: 0 | 1 | 2 | 3 | 4 | 5 | 6 | 7 | 8 | 9;
}

export function encodePng(
  width: number,
  height: number,
  rgba: Uint8Array,
  options: PngOptions = {},
): Uint8Array {
  if (!Number.isInteger(width) || !Number.isInteger(height) || width < 1 || height < 1) {
    throw new Error(
      `encodePng: width and height must be positive integers, got ${width} × ${height}`,
    );
  }
  if (rgba.length !== width * height * 4)
    throw new Error(`encodePng: expected ${width * height * 4} bytes of RGBA, got ${rgba.length}`);
  const opaque = isOpaque(rgba);
  const channels = opaque ? 3 : 4;
  const stride = width * channels;
  const raw = new Uint8Array((stride + 1) * height);
  const previous = new Uint8Array(stride);
  const row = new Uint8Array(stride);
  for (let y = 0; y < height; y++) {
    const src = y * width * 4;
    if (opaque) {
      for (let x = 0, s = src, d = 0; x < width; x++, s += 4, d += 3) {
        row[d] = rgba[s];
        row[d + 1] = rgba[s + 1];
        row[d + 2] = rgba[s + 2];
      }
    } else {
      row.set(rgba.subarray(src, src + stride));
    }
    const o = y * (stride + 1);
    raw[o] = 2; // filter "Up"
    for (let i = 0; i < stride; i++) raw[o + 1 + i] = (row[i] - previous[i]) & 0xff;
    previous.set(row);
  }
  const header = new Uint8Array(13);
  const hv = new DataView(header.buffer);
  hv.setUint32(0, width);
  hv.setUint32(4, height);
  header[8] = 8;
  header[9] = opaque ? 2 : 6;
  const parts = [
    new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', header),
  ];
  if (options.dpi !== undefined) {
    const perMetre = Math.round(options.dpi / 0.0254);
    const phys = new Uint8Array(9);
    const pv = new DataView(phys.buffer);
    pv.setUint32(0, perMetre);
    pv.setUint32(4, perMetre);
    phys[8] = 1;
    parts.push(chunk('pHYs', phys));
  }
  parts.push(
    chunk('IDAT', zlibSync(raw, { level: options.level ?? 6 })),
    chunk('IEND', new Uint8Array(0)),
  );
  const total = parts.reduce((s, p) => s + p.length, 0);
  const out = new Uint8Array(total);
  let at = 0;
  for (const p of parts) {
    out.set(p, at);
    at += p.length;
  }
  return out;
}

const BASE64 = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789+/';

/** Base64 without btoa/Buffer, so the same code runs everywhere. */
export function base64(bytes: Uint8Array): string {
  const parts: string[] = [];
  let chunkText = '';
  for (let i = 0; i < bytes.length; i += 3) {
    const a = bytes[i];
    const b = i + 1 < bytes.length ? bytes[i + 1] : 0;
    const c = i + 2 < bytes.length ? bytes[i + 2] : 0;
    const n = (a << 16) | (b << 8) | c;
    chunkText += BASE64[(n >> 18) & 63] + BASE64[(n >> 12) & 63];
    chunkText += i + 1 < bytes.length ? BASE64[(n >> 6) & 63] : '=';
    chunkText += i + 2 < bytes.length ? BASE64[n & 63] : '=';
    if (chunkText.length >= 65536) {
      parts.push(chunkText);
      chunkText = '';
    }
  }
  parts.push(chunkText);
  return parts.join('');
}
