// Writes the add-in's icons (assets/icon-16.png … icon-128.png): a cell with two electrodes.
// Pure Node (zlib), so icons can be regenerated anywhere: node scripts/make-icons.mjs
import { deflateSync } from 'node:zlib';
import { writeFileSync, mkdirSync } from 'node:fs';

const crcTable = Array.from({ length: 256 }, (_, n) => {
  let c = n;
  for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
  return c >>> 0;
});
const crc32 = (buf) => {
  let c = 0xffffffff;
  for (const b of buf) c = crcTable[(c ^ b) & 0xff] ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
};
const chunk = (type, data) => {
  const len = Buffer.alloc(4);
  len.writeUInt32BE(data.length);
  const td = Buffer.concat([Buffer.from(type), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(td));
  return Buffer.concat([len, td, crc]);
};

function icon(size) {
  const px = (x, y) => {
    const u = (x + 0.5) / size, v = (y + 0.5) / size;
    // rounded square background, teal
    const r = 0.18, dx = Math.max(0, Math.abs(u - 0.5) - (0.5 - r)), dy = Math.max(0, Math.abs(v - 0.5) - (0.5 - r));
    if (dx * dx + dy * dy > r * r) return [0, 0, 0, 0];
    // electrolyte level (lower 55%) lighter
    const bg = v > 0.45 ? [46, 139, 148] : [23, 96, 104];
    // two electrodes: left darker (anode), right copper-coloured (cathode)
    if (v > 0.18 && v < 0.82 && u > 0.27 && u < 0.37) return [235, 235, 235, 255];
    if (v > 0.18 && v < 0.82 && u > 0.63 && u < 0.73) return [222, 139, 72, 255];
    // bus bar across the top
    if (v > 0.12 && v < 0.19 && u > 0.27 && u < 0.73) return [250, 250, 250, 255];
    return [...bg, 255];
  };
  const raw = Buffer.alloc(size * (size * 4 + 1));
  for (let y = 0; y < size; y++) {
    raw[y * (size * 4 + 1)] = 0;
    for (let x = 0; x < size; x++) {
      const [r, g, b, a] = px(x, y);
      const o = y * (size * 4 + 1) + 1 + x * 4;
      raw[o] = r; raw[o + 1] = g; raw[o + 2] = b; raw[o + 3] = a;
    }
  }
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(size, 0); ihdr.writeUInt32BE(size, 4);
  ihdr[8] = 8; ihdr[9] = 6; ihdr[10] = 0; ihdr[11] = 0; ihdr[12] = 0;
  return Buffer.concat([Buffer.from([137, 80, 78, 71, 13, 10, 26, 10]), chunk('IHDR', ihdr), chunk('IDAT', deflateSync(raw)), chunk('IEND', Buffer.alloc(0))]);
}

mkdirSync('assets', { recursive: true });
for (const s of [16, 32, 64, 80, 128]) writeFileSync(`assets/icon-${s}.png`, icon(s));
console.log('icons written to assets/');
