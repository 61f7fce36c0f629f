import { beforeAll, describe, expect, it } from 'vitest';
import { Photo } from '../../server/photos/photo.entity';
import { dataSource } from '../../server/db/data-source';
import { createTestApp } from '../setup/test-app';
import { signedIn, type Client } from '../setup/factories';
import { blackPng, makeWebp, pngBombHeader } from '../setup/images';
import { errorOf } from '../setup/bodies';
import { photosOf } from './incidents-fixtures';

const app = createTestApp();

let tech: Client;
beforeAll(async () => {
  tech = await signedIn(app, 'technician');
});

const upload = (bytes: Buffer, name: string) =>
  tech.agent.post('/api/photos').set('X-CSRF-Token', tech.token()).attach('photos', bytes, name);

describe('pixel limit, read from the header before decoding', () => {
  it.each([
    ['a header-only PNG claiming 8000 × 8000', () => pngBombHeader(8000, 8000), '8000 × 8000'],
    ['a header-only PNG claiming 50000 × 50000', () => pngBombHeader(50000, 50000), '50000 × 50000'],
    ['a valid all-black PNG of 7000 × 6000', () => blackPng(7000, 6000), '7000 × 6000'],
  ])('answers 422 naming the 40-megapixel limit for %s', async (_what, bytes, size) => {
    const before = await dataSource.manager.count(Photo);
    const res = await upload(bytes(), 'bomb.png');
    expect(res.status).toBe(422);
    expect(errorOf(res).code).toBe('too-many-pixels');
    expect(errorOf(res).message).toContain(size);
    expect(errorOf(res).issues![0]).toEqual({ path: 'photos.0', message: 'may have at most 40 megapixels' });
    expect(await dataSource.manager.count(Photo)).toBe(before);
  });

  it('still takes a photo just under the limit', async () => {
    const res = await upload(blackPng(1000, 800), 'small.png');
    expect(res.status).toBe(201);
    expect(photosOf(res)[0]).toMatchObject({ mime: 'image/png', width: 1000, height: 800 });
  });
});

describe('WebP photos', () => {
  it('stores a WebP with its size and a JPEG thumbnail', async () => {
    const res = await upload(await makeWebp(640, 360), 'shelf.webp');
    expect(res.status).toBe(201);
    const [photo] = photosOf(res);
    expect(photo).toMatchObject({ mime: 'image/webp', width: 640, height: 360 });
    const thumb = await tech.agent.get(photo!.thumbUrl);
    expect(thumb.status).toBe(200);
    expect(thumb.headers['content-type']).toBe('image/jpeg');
  });
});
