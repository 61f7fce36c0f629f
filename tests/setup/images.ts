import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';
import { deflateSync } from 'node:zlib';

// CRC-32 as PNG uses it (ISO/IEC 15948:2004, Annex D; W3C PNG Specification, 2nd ed., 2003).
const crcTable = Array.from({ length: 256 }, (_, n) => {
  let c = n;
  for (let k = 0; k < 8; k += 1) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
  return c >>> 0;
});
function crc32(bytes: Buffer): number {
  let c = 0xffffffff;
  for (const b of bytes) c = crcTable[(c ^ b) & 0xff]! ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}

function chunk(type: string, data: Buffer): Buffer {
  const body = Buffer.concat([Buffer.from(type, 'latin1'), data]);
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([length, body, crc]);
}

function ihdr(width: number, height: number): Buffer {
  const data = Buffer.alloc(13);
  data.writeUInt32BE(width, 0);
  data.writeUInt32BE(height, 4);
  // 1-bit greyscale keeps a huge black image small on disk and in the test's memory.
  data.writeUInt8(1, 8);
  data.writeUInt8(0, 9);
  return chunk('IHDR', data);
}

const signature = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);

/** A PNG whose header claims width × height pixels and that holds almost nothing else. */
export const pngBombHeader = (width: number, height: number) =>
  Buffer.concat([
    signature,
    ihdr(width, height),
    chunk('IDAT', deflateSync(Buffer.alloc(1))),
    chunk('IEND', Buffer.alloc(0)),
  ]);

/** A valid all-black 1-bit PNG of width × height: a few kB that decode to width × height × 4 bytes. */
export function blackPng(width: number, height: number): Buffer {
  const row = Buffer.alloc(1 + Math.ceil(width / 8));
  const raw = Buffer.alloc(row.length * height);
  return Buffer.concat([
    signature,
    ihdr(width, height),
    chunk('IDAT', deflateSync(raw, { level: 9 })),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

/** A WebP made by libwebp (compiled to WebAssembly, from npm), as a phone's browser would send one. */
export async function makeWebp(width: number, height: number): Promise<Buffer> {
  const require = createRequire(import.meta.url);
  const dir = path.dirname(require.resolve('@jsquash/webp/package.json'));
  const encoder = await import('@jsquash/webp/encode.js');
  await encoder.init(await WebAssembly.compile(readFileSync(path.join(dir, 'codec/enc/webp_enc.wasm'))));
  const data = new Uint8ClampedArray(width * height * 4);
  for (let i = 0; i < data.length; i += 4) data.set([40, 120, 200, 255], i);
  return Buffer.from(await encoder.default({ data, width, height, colorSpace: 'srgb' }, { quality: 80 }));
}
