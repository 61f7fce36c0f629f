import { randomUUID } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { mkdir, rename, rm, stat, writeFile } from 'node:fs/promises';
import path from 'node:path';
import type { Readable } from 'node:stream';
import { config } from '../core/config';

/** Where photo bytes live; keys are content-addressed, so put() of an existing key is harmless. */
export interface PhotoStorage {
  put(key: string, bytes: Buffer): Promise<void>;
  open(key: string): Promise<Readable>;
  exists(key: string): Promise<boolean>;
  remove(key: string): Promise<void>;
}

const keyPattern = /^[a-z]+\/[0-9a-f]{2}\/[0-9a-f]{64}\.[a-z]+$/;

export class LocalDiskStorage implements PhotoStorage {
  constructor(private readonly root: string) {}

  private file(key: string): string {
    // Keys are made by this module; the check keeps a bad key from ever leaving the upload folder.
    if (!keyPattern.test(key)) throw new Error(`invalid photo storage key ${key}`);
    return path.join(this.root, key);
  }

  async put(key: string, bytes: Buffer): Promise<void> {
    const target = this.file(key);
    await mkdir(path.dirname(target), { recursive: true });
    // Unique per call: two uploads of the same photo in the same millisecond must not share a part file.
    const temp = `${target}.${randomUUID()}.part`;
    await writeFile(temp, bytes);
    await rename(temp, target);
  }

  open(key: string): Promise<Readable> {
    const stream = createReadStream(this.file(key));
    return new Promise((resolve, reject) => {
      stream.once('open', () => resolve(stream)).once('error', reject);
    });
  }

  async exists(key: string): Promise<boolean> {
    try {
      return (await stat(this.file(key))).isFile();
    } catch {
      return false;
    }
  }

  async remove(key: string): Promise<void> {
    await rm(this.file(key), { force: true });
  }
}

let current: PhotoStorage | undefined;

export function photoStorage(): PhotoStorage {
  current ??= new LocalDiskStorage(path.resolve(config().UPLOAD_DIR));
  return current;
}
