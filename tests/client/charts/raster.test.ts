import { crc32, inflateSync } from 'node:zlib';
import { describe, expect, it } from 'vitest';
import { encodePng } from '../../../src/components/charts/raster';

/** Splits a PNG into its chunks (Boutell et al., PNG Specification, W3C 2003, section 5.3). */
function chunks(png: Uint8Array) {
  const bytes = Buffer.from(png);
  const found: Array<{ type: string; data: Buffer; crc: number }> = [];
  for (let at = 8; at < bytes.length;) {
    const length = bytes.readUInt32BE(at);
    const type = bytes.toString('latin1', at + 4, at + 8);
    found.push({ type, data: bytes.subarray(at + 8, at + 8 + length), crc: bytes.readUInt32BE(at + 8 + length) });
    at += 12 + length;
  }
  return found;
}

describe('heatmap raster PNG', () => {
  it('writes the PNG signature, IHDR for 8-bit RGB and chunk CRCs that Node zlib agrees with', () => {
    const png = encodePng(2, 1, Uint8Array.from([255, 0, 0, 0, 0, 255]));
    // PNG Specification section 5.2: the eight-byte signature.
    expect(Array.from(png.subarray(0, 8))).toEqual([137, 80, 78, 71, 13, 10, 26, 10]);
    const parts = chunks(png);
    expect(parts.map((c) => c.type)).toEqual(['IHDR', 'IDAT', 'IEND']);
    const ihdr = parts[0].data;
    expect([ihdr.readUInt32BE(0), ihdr.readUInt32BE(4), ihdr[8], ihdr[9]]).toEqual([2, 1, 8, 2]);
    for (const part of parts)
      expect(part.crc).toBe(crc32(Buffer.concat([Buffer.from(part.type, 'latin1'), part.data])));
    expect(Array.from(inflateSync(parts[1].data))).toEqual([0, 255, 0, 0, 0, 0, 255]);
  });

  it('splits large images into several stored deflate blocks that inflate back exactly', () => {
    const width = 300;
    const height = 100; // 90 100 bytes of scanlines: two stored blocks
    const rgb = Uint8Array.from({ length: width * height * 3 }, (_, i) => (i * 7) % 256);
    const raw = inflateSync(chunks(encodePng(width, height, rgb))[1].data);
    expect(raw.length).toBe(height * (1 + width * 3));
    for (const y of [0, 57, 99]) {
      const line = raw.subarray(y * (1 + width * 3), (y + 1) * (1 + width * 3));
      expect(line[0]).toBe(0);
      expect(Buffer.compare(line.subarray(1), Buffer.from(rgb.subarray(y * width * 3, (y + 1) * width * 3)))).toBe(0);
    }
  });

  it('refuses pixel data that does not match the size', () => {
    expect(() => encodePng(2, 2, new Uint8Array(11))).toThrow('raster: 11 bytes given for 2 × 2 RGB pixels');
  });
});
