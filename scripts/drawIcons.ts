/**
 * Draws the add-in's icons (assets/icon-16.png … icon-80.png, plus a 128 px copy for the
 * preview page) from plain geometry: a conical flask on a quiet slate tile, its liquid cut
 * into three bands like a short pH scale. Our own artwork; run `npx tsx scripts/drawIcons.ts`
 * after changing it and commit the PNGs (the build only copies them).
 *
 * PNG encoding is done here with zlib and a CRC-32 table, so no image package is needed.
 */
import { writeFileSync } from 'fs';
import { join } from 'path';
import { deflateSync } from 'zlib';

type Rgba = readonly [number, number, number, number];

const TILE: Rgba = [38, 70, 83, 255];
const GLASS: Rgba = [244, 246, 242, 255];
const BANDS: readonly Rgba[] = [
  [214, 160, 72, 255], // low pH end of the band: amber
  [122, 170, 110, 255], // middle: sage
  [76, 132, 176, 255], // high end: slate blue
];
const SIZES = [16, 32, 64, 80, 128];
/** Samples per pixel side for anti-aliasing. */
const SUPERSAMPLE = 5;

/** Inside a rounded square filling the unit box with corner radius r. */
function inRoundedSquare(x: number, y: number, r: number): boolean {
  const cx = Math.min(Math.max(x, r), 1 - r);
  const cy = Math.min(Math.max(y, r), 1 - r);
  return (x - cx) ** 2 + (y - cy) ** 2 <= r * r;
}

/** Half-width of the flask's outer outline at height y (unit box, y down), or −1 outside it. */
function flaskHalfWidth(y: number): number {
  const neckTop = 0.17;
  const shoulder = 0.4;
  const base = 0.84;
  if (y < neckTop || y > base) return -1;
  if (y < shoulder) return 0.085;
  const t = (y - shoulder) / (base - shoulder);
  return 0.085 + t * (0.33 - 0.085);
}

function colourAt(x: number, y: number): Rgba | null {
  if (!inRoundedSquare(x, y, 0.2)) return null;
  const dx = Math.abs(x - 0.5);
  const outer = flaskHalfWidth(y);
  // Neck lip: a short wider bar on top of the neck.
  if (y >= 0.14 && y <= 0.19 && dx <= 0.125) return GLASS;
  if (outer < 0 || dx > outer) return TILE;
  const wall = 0.05;
  const inner = outer - wall;
  if (dx > inner || y > 0.84 - wall) return GLASS;
  // Liquid: lower part of the body, three bands across (like a pH strip).
  const liquidTop = 0.55;
  if (y >= liquidTop) {
    const across = (x - 0.5 + inner) / (2 * inner);
    const band = Math.min(BANDS.length - 1, Math.max(0, Math.floor(across * BANDS.length)));
    return BANDS[band];
  }
  return TILE;
}

function render(size: number): Buffer {
  const rowBytes = size * 4 + 1;
  const raw = Buffer.alloc(rowBytes * size);
  for (let py = 0; py < size; py++) {
    raw[py * rowBytes] = 0; // filter: none
    for (let px = 0; px < size; px++) {
      let r = 0,
        g = 0,
        b = 0,
        a = 0;
      for (let sy = 0; sy < SUPERSAMPLE; sy++) {
        for (let sx = 0; sx < SUPERSAMPLE; sx++) {
          const c = colourAt((px + (sx + 0.5) / SUPERSAMPLE) / size, (py + (sy + 0.5) / SUPERSAMPLE) / size);
          if (!c) continue;
          r += c[0] * c[3];
          g += c[1] * c[3];
          b += c[2] * c[3];
          a += c[3];
        }
      }
      const o = py * rowBytes + 1 + px * 4;
      const n = SUPERSAMPLE * SUPERSAMPLE;
      raw[o] = a ? Math.round(r / a) : 0;
      raw[o + 1] = a ? Math.round(g / a) : 0;
      raw[o + 2] = a ? Math.round(b / a) : 0;
      raw[o + 3] = Math.round(a / n);
    }
  }
  return encodePng(size, size, raw);
}

const CRC_TABLE = (() => {
  const t = new Uint32Array(256);
  for (let n = 0; n < 256; n++) {
    let c = n;
    for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
    t[n] = c >>> 0;
  }
  return t;
})();

function crc32(buf: Buffer): number {
  let c = 0xffffffff;
  for (const byte of buf) c = CRC_TABLE[(c ^ byte) & 0xff] ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}

function chunk(type: string, data: Buffer): Buffer {
  const len = Buffer.alloc(4);
  len.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([len, body, crc]);
}

function encodePng(width: number, height: number, raw: Buffer): Buffer {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header[8] = 8; // bit depth
  header[9] = 6; // RGBA
  const signature = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  return Buffer.concat([signature, chunk('IHDR', header), chunk('IDAT', deflateSync(raw, { level: 9 })), chunk('IEND', Buffer.alloc(0))]);
}

for (const size of SIZES) {
  const file = join(__dirname, '..', 'assets', `icon-${size}.png`);
  writeFileSync(file, render(size));
  console.log(`wrote ${file}`);
}
