/**
 * Draws Ebb's icons (a sand-coloured wave over water on a deep teal tile) and writes them as
 * PNG files: icon-16.png ... icon-128.png. Plain Node (zlib for the PNG compression); run
 * `node assets/make-icons.js` after changing the drawing, and commit the PNG files with it.
 */
const fs = require("fs");
const path = require("path");
const zlib = require("zlib");

const SIZES = [16, 32, 64, 80, 128];
const TILE = [31, 78, 90]; // deep teal
const WATER = [112, 184, 176]; // light sea green
const CREST = [243, 211, 122]; // sand
const SAMPLES = 4; // per axis, for smooth edges

/** Colour (RGBA) of the point (x, y) in unit coordinates, y pointing down. */
function paint(x, y) {
  const r = 0.2; // tile corner radius
  const cx = Math.min(Math.max(x, r), 1 - r);
  const cy = Math.min(Math.max(y, r), 1 - r);
  if ((x - cx) ** 2 + (y - cy) ** 2 > r * r) return null; // outside the rounded tile
  const phase = 2 * Math.PI * 1.15 * x;
  const crest = 0.42 + 0.1 * Math.sin(phase + 0.6);
  if (Math.abs(y - crest) < 0.065) return CREST;
  const water = 0.62 + 0.07 * Math.sin(phase + 2.2);
  if (y > water) return WATER;
  return TILE;
}

function pixels(size) {
  const data = Buffer.alloc(size * size * 4);
  for (let py = 0; py < size; py++) {
    for (let px = 0; px < size; px++) {
      let rgb = [0, 0, 0];
      let covered = 0;
      for (let sy = 0; sy < SAMPLES; sy++) {
        for (let sx = 0; sx < SAMPLES; sx++) {
          const c = paint((px + (sx + 0.5) / SAMPLES) / size, (py + (sy + 0.5) / SAMPLES) / size);
          if (!c) continue;
          covered++;
          rgb = rgb.map((v, i) => v + c[i]);
        }
      }
      const o = (py * size + px) * 4;
      if (covered > 0) for (let i = 0; i < 3; i++) data[o + i] = Math.round(rgb[i] / covered);
      data[o + 3] = Math.round((255 * covered) / (SAMPLES * SAMPLES));
    }
  }
  return data;
}

const CRC_TABLE = Array.from({ length: 256 }, (_, n) => {
  let c = n;
  for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
  return c >>> 0;
});

function crc32(buf) {
  let c = 0xffffffff;
  for (const b of buf) c = CRC_TABLE[(c ^ b) & 0xff] ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}

function chunk(type, body) {
  const len = Buffer.alloc(4);
  len.writeUInt32BE(body.length);
  const typed = Buffer.concat([Buffer.from(type, "ascii"), body]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(typed));
  return Buffer.concat([len, typed, crc]);
}

/** A PNG file (8-bit RGBA, no filtering) of a size x size image. */
function png(size, rgba) {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(size, 0);
  header.writeUInt32BE(size, 4);
  header[8] = 8; // bit depth
  header[9] = 6; // colour type: RGBA
  const rows = Buffer.alloc(size * (size * 4 + 1));
  for (let y = 0; y < size; y++) rgba.copy(rows, y * (size * 4 + 1) + 1, y * size * 4, (y + 1) * size * 4);
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk("IHDR", header),
    chunk("IDAT", zlib.deflateSync(rows, { level: 9 })),
    chunk("IEND", Buffer.alloc(0)),
  ]);
}

if (require.main === module) {
  for (const size of SIZES) {
    const file = path.join(__dirname, `icon-${size}.png`);
    fs.writeFileSync(file, png(size, pixels(size)));
    console.log(`wrote ${file}`);
  }
}

module.exports = { png, pixels, SIZES };
