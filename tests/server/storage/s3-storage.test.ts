import { randomBytes } from 'node:crypto';
import { existsSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startLocalMailService, type LocalMailService } from '../../../server/mail/local-mail-service';
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

  it('when the bucket does not exist, then the start-up check names it and put fails instead of answering a key', async () => {
    await expect(store.verify()).resolves.toBeUndefined();
    const lost = new S3Storage({ ...fake.config, bucket: 'no-such-bucket-here' });
    try {
      await expect(lost.verify()).rejects.toThrow(/bucket "no-such-bucket-here" is not reachable.*HTTP 404/);
      await expect(lost.put(Buffer.from('x'))).rejects.toThrow();
    } finally {
      lost.close();
    }
  });
});

describe('photos with the app configured for S3', () => {
  let t: TestApp;
  let f: Fixture;
  let mail: LocalMailService;
  let mailDir: string;
  beforeAll(async () => {
    mailDir = mkdtempSync(path.join(os.tmpdir(), 'tandem-mail-'));
    mail = await startLocalMailService({ dataDir: mailDir, port: 0 });
    t = await createTestApp({ storage: fake.config, smtp: mail.smtp });
    f = await buildFixture(t);
  });
  afterAll(async () => {
    await t?.close();
    await mail?.close();
    if (mailDir) rmSync(mailDir, { recursive: true, force: true });
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

  it('when a report is e-mailed, then the PDF as sent is kept as an object in the bucket and the outbox serves it from there', async () => {
    const made = (await request(t.app).post(`/api/jobs/${f.jobId}/systems`).set(authFor(t)).send(recordBody(f)).expect(201)).body;
    const before = await fake.listKeys();
    const sent = await request(t.app)
      .post(`/api/systems/${made.id}/send`)
      .set(authFor(t))
      .send({ to: 'odile.franz@example.test' })
      .expect(200);
    const added = (await fake.listKeys()).filter((k) => !before.includes(k));
    expect(added).toHaveLength(1);
    const stored = (await store.get(added[0])) as Buffer;
    // "%PDF-": the PDF header line (ISO 32000-1 §7.5.2).
    expect(stored.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const pdf = await request(t.app).get(`/api/outbox/${sent.body.id}/attachment`).set(authFor(t, 'admin')).buffer(true).expect(200);
    expect(Buffer.compare(pdf.body as Buffer, stored)).toBe(0);
    // The demo mail service is a separate thing: it keeps its .eml copies on local disk.
    expect(readdirSync(mail.dir).filter((n) => n.endsWith('.eml'))).toHaveLength(1);
  });
});
