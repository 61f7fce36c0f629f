import { Worker } from 'node:worker_threads';
import { jimpEntry, thumbnailWorkerSource, webpDecodeEntry, webpWasm } from './thumbnail-worker-source';

export interface DecodedPhoto {
  width: number;
  height: number;
  thumb: Buffer;
}

interface Job {
  resolve: (d: DecodedPhoto) => void;
  reject: (e: Error) => void;
}

interface Slot {
  worker: Worker;
  jobs: Map<number, Job>;
  idle?: NodeJS.Timeout;
}

type Reply = { jobId: number; width: number; height: number; thumb: Uint8Array } | { jobId: number; error: string };

const poolSize = 2;
const thumbEdge = 480;
// An idle worker holds jimp's decoders in memory; it is started again on the next upload.
const idleMs = 5_000;

/**
 * Decoding a large JPEG takes about a second, so it runs in worker threads: one upload
 * never stalls the other requests. Workers are unref'd and retire when idle, so they never keep the process alive.
 */
class Thumbnailer {
  private slots: Slot[] = [];
  private nextId = 1;

  private spawn(): Slot {
    const slot: Slot = {
      worker: new Worker(thumbnailWorkerSource, {
        eval: true,
        workerData: { jimpEntry, webpDecodeEntry, webpWasm, thumbEdge },
        // A second guard behind the pixel limit: a decoder that runs away ends its worker, not the server.
        resourceLimits: { maxOldGenerationSizeMb: 256, maxYoungGenerationSizeMb: 48 },
      }),
      jobs: new Map(),
    };
    slot.worker.unref();
    slot.worker.on('message', (reply: Reply) => {
      const job = slot.jobs.get(reply.jobId);
      slot.jobs.delete(reply.jobId);
      if (slot.jobs.size === 0) this.retireLater(slot);
      if (!job) return;
      if ('error' in reply) job.reject(new Error(reply.error));
      else job.resolve({ width: reply.width, height: reply.height, thumb: Buffer.from(reply.thumb) });
    });
    const fail = (err: Error) => {
      clearTimeout(slot.idle);
      this.slots = this.slots.filter((s) => s !== slot);
      for (const job of slot.jobs.values()) job.reject(err);
      slot.jobs.clear();
    };
    slot.worker.on('error', fail);
    slot.worker.on('exit', (code) => fail(new Error(`thumbnail worker stopped with code ${code}`)));
    this.slots.push(slot);
    return slot;
  }

  private retireLater(slot: Slot) {
    clearTimeout(slot.idle);
    slot.idle = setTimeout(() => {
      if (slot.jobs.size > 0) return;
      this.slots = this.slots.filter((s) => s !== slot);
      void slot.worker.terminate();
    }, idleMs);
    slot.idle.unref();
  }

  private pick(): Slot {
    const idle = this.slots.find((s) => s.jobs.size === 0);
    if (idle) return idle;
    if (this.slots.length < poolSize) return this.spawn();
    return this.slots.reduce((a, b) => (b.jobs.size < a.jobs.size ? b : a));
  }

  /** Width and height as the photo is seen (EXIF orientation applied) and a JPEG thumbnail. */
  decode(bytes: Buffer, mime: string): Promise<DecodedPhoto> {
    const jobId = this.nextId++;
    const slot = this.pick();
    clearTimeout(slot.idle);
    return new Promise((resolve, reject) => {
      slot.jobs.set(jobId, { resolve, reject });
      slot.worker.postMessage({ jobId, bytes, mime });
    });
  }
}

export const thumbnailer = new Thumbnailer();
