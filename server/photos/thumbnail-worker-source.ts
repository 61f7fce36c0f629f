import { createRequire } from 'node:module';
import path from 'node:path';

const require = createRequire(import.meta.url);

/** The CommonJS build of jimp, resolved here so the worker needs no module resolution of its own. */
export const jimpEntry = require.resolve('jimp');

/** libwebp's decoder compiled to WebAssembly (jimp has no WebP decoder): its ES module and its .wasm. */
const webpDir = path.dirname(require.resolve('@jsquash/webp/package.json'));
export const webpDecodeEntry = path.join(webpDir, 'decode.js');
export const webpWasm = path.join(webpDir, 'codec/dec/webp_dec.wasm');

/**
 * The worker runs as a plain script (Worker eval mode): tsx, Vitest and node start it the
 * same way, where a .ts worker file would need a loader that Vitest does not give threads.
 */
export const thumbnailWorkerSource = String.raw`
const { parentPort, workerData } = require('node:worker_threads');
const { readFileSync } = require('node:fs');
const { pathToFileURL } = require('node:url');
const { Jimp } = require(workerData.jimpEntry);
const edge = workerData.thumbEdge;

let webpDecode;
async function readWebp(bytes) {
  if (!webpDecode) {
    const decoder = await import(pathToFileURL(workerData.webpDecodeEntry).href);
    await decoder.init(await WebAssembly.compile(readFileSync(workerData.webpWasm)));
    webpDecode = decoder.default;
  }
  const { data, width, height } = await webpDecode(bytes);
  return Jimp.fromBitmap({ data: Buffer.from(data.buffer, data.byteOffset, data.byteLength), width, height });
}

parentPort.on('message', async ({ jobId, bytes, mime }) => {
  try {
    // Jimp.read applies the EXIF orientation, so width and height are as the photo is seen.
    const image = mime === 'image/webp' ? await readWebp(bytes) : await Jimp.read(Buffer.from(bytes));
    const { width, height } = image.bitmap;
    if (Math.max(width, height) > edge) image.scaleToFit({ w: edge, h: edge });
    const thumb = await image.getBuffer('image/jpeg', { quality: 78 });
    parentPort.postMessage({ jobId, width, height, thumb });
  } catch (err) {
    parentPort.postMessage({ jobId, error: err instanceof Error ? err.message : String(err) });
  }
});
`;
