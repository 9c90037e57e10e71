// Draws the Plumbline icon (a plumb bob hanging on a line, on a teal tile) at
// every size the manifest references. Run with `npx tsx scripts/make-icons.ts`.
// PNGs are encoded by hand with zlib so no image dependency is needed.
import { writeFileSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { deflateSync } from 'node:zlib';

const ICON_SIZES = [16, 32, 64, 80] as const;

type Rgba = readonly [number, number, number, number];
const TEAL: Rgba = [17, 122, 122, 255];
const WHITE: Rgba = [250, 250, 246, 255];
const CLEAR: Rgba = [0, 0, 0, 0];

// Shapes live in a unit square so one description serves every size.
function inTile(x: number, y: number): boolean {
  const r = 0.18;
  const cx = Math.min(Math.max(x, r), 1 - r);
  const cy = Math.min(Math.max(y, r), 1 - r);
  return (x - cx) ** 2 + (y - cy) ** 2 <= r * r;
}

function inGlyph(x: number, y: number, lineHalfWidth: number): boolean {
  const bar = y >= 0.14 && y <= 0.2 && Math.abs(x - 0.5) <= 0.16;
  const line = y >= 0.14 && y <= 0.5 && Math.abs(x - 0.5) <= lineHalfWidth;
  const bobRadius = 0.14;
  const bobCentreY = 0.6;
  const bobBody = (x - 0.5) ** 2 + (y - bobCentreY) ** 2 <= bobRadius ** 2;
  // The bob tapers to a point so the glyph reads as a weight, not a pin.
  const tipY = 0.88;
  const taper = y >= bobCentreY && y <= tipY && Math.abs(x - 0.5) <= (bobRadius * (tipY - y)) / (tipY - bobCentreY);
  return bar || line || bobBody || taper;
}

function render(size: number): Uint8Array {
  const samples = 4;
  // Thin lines vanish at 16 px, so keep the string at least a pixel wide.
  const lineHalfWidth = Math.max(0.035, 0.6 / size);
  const pixels = new Uint8Array(size * size * 4);
  for (let py = 0; py < size; py++) {
    for (let px = 0; px < size; px++) {
      const acc = [0, 0, 0, 0];
      for (let sy = 0; sy < samples; sy++) {
        for (let sx = 0; sx < samples; sx++) {
          const x = (px + (sx + 0.5) / samples) / size;
          const y = (py + (sy + 0.5) / samples) / size;
          const c = !inTile(x, y) ? CLEAR : inGlyph(x, y, lineHalfWidth) ? WHITE : TEAL;
          // Premultiply so edge pixels do not pick up colour from transparent samples.
          for (let k = 0; k < 3; k++) acc[k] += (c[k] * c[3]) / 255;
          acc[3] += c[3];
        }
      }
      const n = samples * samples;
      const alpha = acc[3] / n;
      const o = (py * size + px) * 4;
      for (let k = 0; k < 3; k++) pixels[o + k] = alpha > 0 ? Math.round((acc[k] / n) * (255 / alpha)) : 0;
      pixels[o + 3] = Math.round(alpha);
    }
  }
  return pixels;
}

const CRC_TABLE = (() => {
  const table = new Uint32Array(256);
  for (let n = 0; n < 256; n++) {
    let c = n;
    for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
    table[n] = c >>> 0;
  }
  return table;
})();

function crc32(bytes: Uint8Array): number {
  let c = 0xffffffff;
  for (const b of bytes) c = CRC_TABLE[(c ^ b) & 0xff] ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}

function chunk(type: string, data: Uint8Array): Buffer {
  const head = Buffer.alloc(8);
  head.writeUInt32BE(data.length, 0);
  head.write(type, 4, 'ascii');
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(Buffer.concat([head.subarray(4), data])), 0);
  return Buffer.concat([head, data, crc]);
}

function encodePng(size: number, rgba: Uint8Array): Buffer {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(size, 0);
  ihdr.writeUInt32BE(size, 4);
  ihdr[8] = 8; // bit depth
  ihdr[9] = 6; // colour type RGBA
  const stride = size * 4;
  const raw = Buffer.alloc((stride + 1) * size);
  for (let y = 0; y < size; y++) {
    raw[y * (stride + 1)] = 0; // filter: none
    raw.set(rgba.subarray(y * stride, (y + 1) * stride), y * (stride + 1) + 1);
  }
  const signature = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  return Buffer.concat([signature, chunk('IHDR', ihdr), chunk('IDAT', deflateSync(raw, { level: 9 })), chunk('IEND', new Uint8Array(0))]);
}

const outDir = join(__dirname, '..', 'assets');
mkdirSync(outDir, { recursive: true });
for (const size of ICON_SIZES) {
  const file = join(outDir, `icon-${size}.png`);
  writeFileSync(file, encodePng(size, render(size)));
  console.log(`wrote ${file}`);
}
