// Reads the first IFD of a TIFF file: enough to check compression and resolution tags
// (TIFF 6.0 specification, Adobe 1992: tags 259 Compression, 282/283 X/YResolution, 296 ResolutionUnit).
export interface TiffTags {
  compression: number;
  xResolution: number;
  yResolution: number;
  resolutionUnit: number;
}

export function readTiffTags(buf: Buffer): TiffTags {
  const le = buf.toString('latin1', 0, 2) === 'II';
  const u16 = (o: number) => (le ? buf.readUInt16LE(o) : buf.readUInt16BE(o));
  const u32 = (o: number) => (le ? buf.readUInt32LE(o) : buf.readUInt32BE(o));
  if (u16(2) !== 42) throw new Error('not a TIFF file');
  const ifd = u32(4);
  const tags = new Map<number, number>();
  for (let i = 0; i < u16(ifd); i++) {
    const e = ifd + 2 + i * 12;
    const tag = u16(e);
    const type = u16(e + 2);
    if (type === 3) tags.set(tag, u16(e + 8));
    else if (type === 4) tags.set(tag, u32(e + 8));
    else if (type === 5) {
      const off = u32(e + 8);
      tags.set(tag, u32(off) / u32(off + 4));
    }
  }
  return {
    compression: tags.get(259) ?? 1,
    xResolution: tags.get(282) ?? NaN,
    yResolution: tags.get(283) ?? NaN,
    resolutionUnit: tags.get(296) ?? 2,
  };
}
