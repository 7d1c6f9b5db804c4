// A minimal PNG reader for the screenshot test: 8-bit greyscale, RGB or RGBA, not interlaced
// (what a browser's screenshot is). Returns the pixels as RGBA.

import { inflateSync } from 'node:zlib';

export interface Image {
  width: number;
  height: number;
  rgba: Uint8Array;
}

function paeth(a: number, b: number, c: number): number {
  const p = a + b - c,
    pa = Math.abs(p - a),
    pb = Math.abs(p - b),
    pc = Math.abs(p - c);
  return pa <= pb && pa <= pc ? a : pb <= pc ? b : c;
}

export function readPng(buf: Uint8Array): Image {
  const data = Buffer.from(buf);
  if (data.readUInt32BE(0) !== 0x89504e47) throw new Error('not a PNG');
  let off = 8,
    width = 0,
    height = 0,
    depth = 0,
    type = 0,
    interlace = 0;
  const idat: Buffer[] = [];
  while (off < data.length) {
    const len = data.readUInt32BE(off);
    const name = data.toString('latin1', off + 4, off + 8);
    const body = data.subarray(off + 8, off + 8 + len);
    if (name === 'IHDR') {
      width = body.readUInt32BE(0);
      height = body.readUInt32BE(4);
      depth = body[8];
      type = body[9];
      interlace = body[12];
    } else if (name === 'IDAT') idat.push(body);
    else if (name === 'IEND') break;
    off += 12 + len;
  }
  const channels = type === 0 ? 1 : type === 2 ? 3 : type === 6 ? 4 : type === 4 ? 2 : 0;
  if (depth !== 8 || channels === 0 || interlace !== 0)
    throw new Error(`unsupported PNG (depth ${depth}, colour type ${type}, interlace ${interlace})`);
  const raw = inflateSync(Buffer.concat(idat));
  const stride = width * channels;
  const px = new Uint8Array(height * stride);
  for (let y = 0; y < height; y++) {
    const filter = raw[y * (stride + 1)];
    const line = raw.subarray(y * (stride + 1) + 1, (y + 1) * (stride + 1));
    for (let x = 0; x < stride; x++) {
      const a = x >= channels ? px[y * stride + x - channels] : 0;
      const b = y > 0 ? px[(y - 1) * stride + x] : 0;
      const c = x >= channels && y > 0 ? px[(y - 1) * stride + x - channels] : 0;
      const v = line[x];
      px[y * stride + x] =
        (filter === 0 ? v : filter === 1 ? v + a : filter === 2 ? v + b : filter === 3 ? v + ((a + b) >> 1) : v + paeth(a, b, c)) & 0xff;
    }
  }
  const rgba = new Uint8Array(width * height * 4);
  for (let i = 0; i < width * height; i++) {
    const s = px.subarray(i * channels, (i + 1) * channels);
    if (channels <= 2) rgba.set([s[0], s[0], s[0], channels === 2 ? s[1] : 255], i * 4);
    else rgba.set([s[0], s[1], s[2], channels === 4 ? s[3] : 255], i * 4);
  }
  return { width, height, rgba };
}
