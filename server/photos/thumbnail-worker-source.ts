import { createRequire } from 'node:module';

/** The CommonJS build of jimp, resolved here so the worker needs no module resolution of its own. */
export const jimpEntry = createRequire(import.meta.url).resolve('jimp');

/**
 * The worker runs as a plain script (Worker eval mode): tsx, Vitest and node start it the
 * same way, where a .ts worker file would need a loader that Vitest does not give threads.
 */
export const thumbnailWorkerSource = String.raw`
const { parentPort, workerData } = require('node:worker_threads');
const { Jimp } = require(workerData.jimpEntry);
const edge = workerData.thumbEdge;

parentPort.on('message', async ({ jobId, bytes }) => {
  try {
    // Jimp.read applies the EXIF orientation, so width and height are as the photo is seen.
    const image = await Jimp.read(Buffer.from(bytes));
    const { width, height } = image.bitmap;
    if (Math.max(width, height) > edge) image.scaleToFit({ w: edge, h: edge });
    const thumb = await image.getBuffer('image/jpeg', { quality: 78 });
    parentPort.postMessage({ jobId, width, height, thumb });
  } catch (err) {
    parentPort.postMessage({ jobId, error: err instanceof Error ? err.message : String(err) });
  }
});
`;
