import { randomBytes } from 'node:crypto';
import { existsSync } from 'node:fs';
import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { S3Storage } from '../../../server/storage/s3-storage';
import { STORAGE_KEY_PATTERN } from '../../../server/storage/storage';
import { createTestApp, type TestApp } from '../../helpers/test-app';
import { tinyPng } from '../systems/images';
import { authFor, buildFixture, recordBody, type Fixture } from '../systems/system-fixtures';
import { startS3Fake, type S3Fake } from './s3-fake';
import { fileStorageContract } from './storage-contract';

let fake: S3Fake;
let store: S3Storage;
beforeAll(async () => {
  fake = await startS3Fake();
  store = new S3Storage(fake.config);
});
afterAll(async () => {
  store?.close();
  await fake?.close();
});

fileStorageContract('S3-compatible (s3rver)', () => store);

describe('S3 storage specifics', () => {
  it('when a file is put, then it is one object in the bucket named by the bare key', async () => {
    const before = await fake.listKeys();
    const key = await store.put(Buffer.from('object'));
    const after = await fake.listKeys();
    expect(after.filter((k) => !before.includes(k))).toEqual([key]);
  });

  it('when the bucket does not exist, then put fails loudly instead of answering a key', async () => {
    const lost = new S3Storage({ ...fake.config, bucket: 'no-such-bucket-here' });
    await expect(lost.put(Buffer.from('x'))).rejects.toThrow();
    lost.close();
  });
});

describe('photos with the app configured for S3', () => {
  let t: TestApp;
  let f: Fixture;
  beforeAll(async () => {
    t = await createTestApp({ storage: fake.config });
    f = await buildFixture(t);
  });
  afterAll(async () => {
    await t?.close();
  });

  it('when a photo is uploaded on a record, then its bytes land in the bucket, nothing under the data dir, and a signed-in user gets them back', async () => {
    const auth = authFor(t);
    const made = (await request(t.app).post(`/api/jobs/${f.jobId}/systems`).set(auth).send(recordBody(f)).expect(201)).body;
    const png = tinyPng();
    const before = await fake.listKeys();
    const res = await request(t.app)
      .post(`/api/jobs/${f.jobId}/attachments`)
      .set(auth)
      .field('kind', 'nameplate')
      .field('systemId', String(made.id))
      .attach('file', png, 'plate.png')
      .expect(201);
    expect(res.body.storageKey).toBeUndefined();

    const added = (await fake.listKeys()).filter((k) => !before.includes(k));
    expect(added).toHaveLength(1);
    expect(added[0]).toMatch(STORAGE_KEY_PATTERN);
    expect(Buffer.compare((await store.get(added[0])) as Buffer, png)).toBe(0);
    expect(existsSync(path.join(t.ctx.config.dataDir, 'files'))).toBe(false);

    const got = await request(t.app).get(res.body.url).set(authFor(t, 'estimator')).buffer(true).expect(200);
    expect(got.headers['content-type']).toBe('image/png');
    expect(Buffer.compare(got.body as Buffer, png)).toBe(0);
    await request(t.app).get(res.body.url).expect(401);
  });

  it('when an uploaded photo is not an image, then 415 and no object is added to the bucket', async () => {
    const before = await fake.listKeys();
    await request(t.app)
      .post(`/api/jobs/${f.jobId}/attachments`)
      .set(authFor(t))
      .attach('file', randomBytes(64), { filename: 'plate.png', contentType: 'image/png' })
      .expect(415);
    expect(await fake.listKeys()).toEqual(before);
  });
});
