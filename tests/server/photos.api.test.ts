import { createHash } from 'node:crypto';
import { readdirSync } from 'node:fs';
import path from 'node:path';
import supertest from 'supertest';
import { describe, expect, it, vi } from 'vitest';
import { Jimp } from 'jimp';
import { Photo } from '../../server/photos/photo.entity';
import { thumbnailer } from '../../server/photos/thumbnailer';
import { config } from '../../server/core/config';
import { dataSource } from '../../server/db/data-source';
import { heicRefusal } from '../../shared/schemas/photos';
import { createTestApp } from '../setup/test-app';
import { signedIn } from '../setup/factories';
import { auditCount, heicBytes, makeJpeg, makePng, photosOf, withExifOrientation } from './incidents-fixtures';
import { errorOf, issuePath } from '../setup/bodies';

const app = createTestApp();

function storedFiles(): string[] {
  const walk = (dir: string): string[] => {
    try {
      return readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
        e.isDirectory() ? walk(path.join(dir, e.name)) : [path.join(dir, e.name)],
      );
    } catch {
      return [];
    }
  };
  return walk(path.resolve(config().UPLOAD_DIR));
}

async function upload(
  client: Awaited<ReturnType<typeof signedIn>>,
  files: { bytes: Buffer; name: string }[],
  field = 'photos',
) {
  let req = client.agent.post('/api/photos').set('X-CSRF-Token', client.token());
  for (const f of files) req = req.attach(field, f.bytes, f.name);
  return req;
}

describe('POST /api/photos', () => {
  it('answers 401 without a session and 403 to a trainer', async () => {
    const anon = await supertest(app).post('/api/photos');
    expect([401, 403]).toContain(anon.status);
    const trainer = await signedIn(app, 'trainer');
    const res = await upload(trainer, [{ bytes: await makeJpeg(), name: 'a.jpg' }]);
    expect(res.status).toBe(403);
  });

  it('stores a JPEG with its dimensions, a thumbnail and an audit event', async () => {
    const tech = await signedIn(app, 'technician');
    const bytes = await makeJpeg(800, 600);
    const res = await upload(tech, [{ bytes, name: 'jar.jpg' }]);
    expect(res.status).toBe(201);
    const photo = photosOf(res)[0]!;
    // SHA-256 as specified by NIST FIPS 180-4; node's crypto is the reference implementation here.
    expect(photo).toMatchObject({
      sha256: createHash('sha256').update(bytes).digest('hex'),
      width: 800,
      height: 600,
      mime: 'image/jpeg',
    });
    expect(photo.url).toBe(`/api/photos/${photo.id}/original`);
    expect(await auditCount('photo', photo.id)).toBe(1);

    const original = await tech.agent.get(photo.url).buffer(true);
    expect(original.status).toBe(200);
    expect(original.headers['content-type']).toBe('image/jpeg');
    expect(Buffer.compare(original.body as Buffer, bytes)).toBe(0);

    const thumb = await tech.agent.get(photo.thumbUrl).buffer(true);
    expect(thumb.status).toBe(200);
    const decoded = await Jimp.read(thumb.body as Buffer);
    expect(Math.max(decoded.bitmap.width, decoded.bitmap.height)).toBe(480);
    expect(decoded.bitmap.width / decoded.bitmap.height).toBeCloseTo(800 / 600, 2);
  });

  it('accepts PNG and reads the type from the bytes, not the name', async () => {
    const tech = await signedIn(app, 'technician');
    const res = await upload(tech, [{ bytes: await makePng(64, 48), name: 'looks-like.txt' }]);
    expect(res.status).toBe(201);
    expect(photosOf(res)[0]).toMatchObject({ mime: 'image/png', width: 64, height: 48 });
  });

  it('answers 415 naming the field for a text file renamed .jpg, and stores nothing', async () => {
    const tech = await signedIn(app, 'technician');
    const rowsBefore = await dataSource.manager.count(Photo);
    const filesBefore = storedFiles().length;
    const res = await upload(tech, [
      { bytes: await makeJpeg(), name: 'good.jpg' },
      { bytes: Buffer.from('not a photo, just notes about jar 12\n'.repeat(20)), name: 'notes.jpg' },
    ]);
    expect(res.status).toBe(415);
    expect(issuePath(res)).toBe('photos.1');
    expect(errorOf(res).message).toMatch(/notes\.jpg.*not a JPEG, PNG or WebP/);
    expect(await dataSource.manager.count(Photo)).toBe(rowsBefore);
    expect(storedFiles()).toHaveLength(filesBefore);
  });

  it('refuses HEIC with the ask for the most compatible camera setting', async () => {
    const tech = await signedIn(app, 'technician');
    const res = await upload(tech, [{ bytes: heicBytes(), name: 'IMG_0001.HEIC' }]);
    expect(res.status).toBe(415);
    expect(errorOf(res).message).toBe(heicRefusal);
  });

  it('answers 413 for a photo over 12 MB and stores nothing', async () => {
    const tech = await signedIn(app, 'technician');
    const rowsBefore = await dataSource.manager.count(Photo);
    const big = Buffer.concat([await makeJpeg(), Buffer.alloc(12 * 1024 * 1024)]);
    const res = await upload(tech, [{ bytes: big, name: 'big.jpg' }]);
    expect(res.status).toBe(413);
    expect(issuePath(res)).toBe('photos');
    expect(await dataSource.manager.count(Photo)).toBe(rowsBefore);
  });

  it('answers 413 for more than six photos at once', async () => {
    const tech = await signedIn(app, 'technician');
    const jpeg = await makeJpeg(40, 30);
    const res = await upload(
      tech,
      Array.from({ length: 7 }, (_, i) => ({ bytes: jpeg, name: `p${i}.jpg` })),
    );
    expect(res.status).toBe(413);
  });

  it('answers 400 when no photo is attached or the field is wrong', async () => {
    const tech = await signedIn(app, 'technician');
    const none = await tech.agent.post('/api/photos').set('X-CSRF-Token', tech.token()).field('note', 'x');
    expect(none.status).toBe(400);
    expect(issuePath(none)).toBe('photos');
    const wrong = await upload(tech, [{ bytes: await makeJpeg(), name: 'a.jpg' }], 'file');
    expect(wrong.status).toBe(400);
    expect(issuePath(wrong)).toBe('photos');
  });

  it('stores the same photo once when it is uploaded twice', async () => {
    const tech = await signedIn(app, 'technician');
    const bytes = await makeJpeg(200, 100);
    const sha = createHash('sha256').update(bytes).digest('hex');
    const first = await upload(tech, [{ bytes, name: 'a.jpg' }]);
    const second = await upload(tech, [
      { bytes, name: 'b.jpg' },
      { bytes, name: 'c.jpg' },
    ]);
    expect(first.status).toBe(201);
    expect(second.status).toBe(201);
    const firstId = photosOf(first)[0]!.id;
    expect(photosOf(second).map((p) => p.id)).toEqual([firstId, firstId]);
    expect(await dataSource.manager.countBy(Photo, { sha256: sha })).toBe(1);
    expect(storedFiles().filter((f) => f.includes(sha))).toHaveLength(2);
  });

  it('honours the EXIF orientation when it records width and height', async () => {
    const tech = await signedIn(app, 'technician');
    // Orientation 6: the stored rows are displayed rotated 90° clockwise (Exif 2.3, tag 274; from memory).
    const bytes = withExifOrientation(await makeJpeg(300, 200), 6);
    const res = await upload(tech, [{ bytes, name: 'portrait.jpg' }]);
    expect(res.status).toBe(201);
    expect(photosOf(res)[0]).toMatchObject({ width: 200, height: 300 });
  });

  it('keeps answering other requests while a large photo is decoded', async () => {
    const tech = await signedIn(app, 'technician');
    const bytes = await makeJpeg(3000, 2000);
    // Events, not the clock: learn when decoding starts and whether it has finished.
    const decode = thumbnailer.decode.bind(thumbnailer);
    let decoded = false;
    let started!: () => void;
    const decoding = new Promise<void>((resolve) => (started = resolve));
    const spy = vi.spyOn(thumbnailer, 'decode').mockImplementation((b, mime) => {
      started();
      return decode(b, mime).finally(() => (decoded = true));
    });
    try {
      const uploading = upload(tech, [{ bytes, name: 'large.jpg' }]);
      await decoding;
      await tech.agent.get('/api/auth/me').expect(200);
      // Decoding a 6-megapixel JPEG takes the worker about a second; a sign-in check, milliseconds.
      expect(decoded).toBe(false);
      expect((await uploading).status).toBe(201);
    } finally {
      spy.mockRestore();
    }
  });
});

describe('GET /api/photos/:id', () => {
  it('serves files only to signed-in users and answers 404 for an unknown id', async () => {
    const tech = await signedIn(app, 'technician');
    const res = await upload(tech, [{ bytes: await makeJpeg(), name: 'a.jpg' }]);
    const { id } = photosOf(res)[0]!;
    expect((await supertest(app).get(`/api/photos/${id}/original`)).status).toBe(401);
    expect((await supertest(app).get(`/api/photos/${id}/thumb`)).status).toBe(401);
    const trainer = await signedIn(app, 'trainer');
    expect((await trainer.agent.get(`/api/photos/${id}/thumb`)).status).toBe(200);
    expect((await trainer.agent.get(`/api/photos/${id}`)).body).toMatchObject({ id, mime: 'image/jpeg' });
    expect((await trainer.agent.get('/api/photos/999999/original')).status).toBe(404);
    expect((await trainer.agent.get('/api/photos/abc/original')).status).toBe(400);
  });

  it('answers 304 to a matching ETag', async () => {
    const tech = await signedIn(app, 'technician');
    const res = await upload(tech, [{ bytes: await makeJpeg(), name: 'a.jpg' }]);
    const { url } = photosOf(res)[0]!;
    const first = await tech.agent.get(url);
    const again = await tech.agent.get(url).set('If-None-Match', first.headers.etag as string);
    expect(again.status).toBe(304);
  });
});
