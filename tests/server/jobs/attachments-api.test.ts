import { createHash } from 'node:crypto';
import { readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { useFixtureApp } from '../../helpers/fixture-app';
import type { TestApp } from '../../helpers/test-app';
import { jpegHead, tinyPng } from '../systems/images';
import { authFor, recordBody, type Fixture } from '../systems/system-fixtures';

let t: TestApp, f: Fixture;
useFixtureApp((app, fixture) => ([t, f] = [app, fixture]));

const auth = (role: 'tech' | 'estimator' | 'admin' = 'tech') => authFor(t, role);
const upload = (data: Buffer, name: string, fields: Record<string, string> = {}) => {
  const req = request(t.app).post(`/api/jobs/${f.jobId}/attachments`).set(auth());
  for (const [k, v] of Object.entries(fields)) req.field(k, v);
  return req.attach('file', data, name);
};
const filesOnDisk = () => {
  const root = path.join(t.ctx.config.dataDir, 'files');
  try {
    return readdirSync(root).flatMap((d) => readdirSync(path.join(root, d)).map((n) => path.join(root, d, n)));
  } catch {
    return [];
  }
};

// File signatures: PNG 89 50 4E 47 0D 0A 1A 0A (PNG spec §5.2); JPEG FF D8 FF (ITU T.81 SOI marker);
// WebP "RIFF....WEBP" (RFC 9649); HEIC an ISO BMFF "ftyp" box with brand "heic" (ISO/IEC 23008-12).
const webp = Buffer.concat([
  Buffer.from('RIFF'),
  Buffer.from([0x1a, 0, 0, 0]),
  Buffer.from('WEBPVP8 '),
  Buffer.from([0x0e, 0, 0, 0, 0x30, 0x01, 0, 0x9d, 0x01, 0x2a, 1, 0, 1, 0, 0, 0, 0, 0]),
]);
const heic = Buffer.concat([
  Buffer.from([0, 0, 0, 0x18]),
  Buffer.from('ftypheic'),
  Buffer.from([0, 0, 0, 0]),
  Buffer.from('mif1heic'),
  Buffer.alloc(16),
]);

describe('POST /api/jobs/:id/attachments', () => {
  it('when a PNG nameplate photo is sent, then 201 with type, size and sha256 from the bytes, and only signed-in users can fetch it', async () => {
    const png = tinyPng();
    const made = (await request(t.app).post(`/api/jobs/${f.jobId}/systems`).set(auth()).send(recordBody(f)).expect(201)).body;
    const res = await upload(png, 'plate.png', { kind: 'nameplate', systemId: String(made.id) }).expect(201);
    expect(res.body).toMatchObject({
      jobId: f.jobId,
      systemId: made.id,
      kind: 'nameplate',
      contentType: 'image/png',
      sizeBytes: png.length,
      fileName: 'plate.png',
    });
    expect(res.body.sha256).toBe(createHash('sha256').update(png).digest('hex'));
    expect(res.body.storageKey).toBeUndefined();

    const got = await request(t.app).get(res.body.url).set(auth('estimator')).buffer(true).expect(200);
    expect(got.headers['content-type']).toBe('image/png');
    expect(Buffer.compare(got.body as Buffer, png)).toBe(0);
    await request(t.app).get(res.body.url).expect(401);
    const record = await request(t.app).get(`/api/systems/${made.id}`).set(auth()).expect(200);
    expect(record.body.attachments.map((a: { id: number }) => a.id)).toEqual([res.body.id]);
  });

  it('when the bytes are JPEG, WebP or HEIC, then the type comes from the bytes whatever the name says', async () => {
    expect((await upload(jpegHead(), 'photo.png').expect(201)).body.contentType).toBe('image/jpeg');
    expect((await upload(webp, 'x.jpg').expect(201)).body).toMatchObject({ contentType: 'image/webp', fileName: 'x.webp' });
    expect((await upload(heic, 'IMG_0042.HEIC').expect(201)).body.contentType).toBe('image/heic');
  });

  it('when the bytes are not a photo, then 415 even with an image name and type, and nothing is stored', async () => {
    const before = filesOnDisk().length;
    const res = await request(t.app)
      .post(`/api/jobs/${f.jobId}/attachments`)
      .set(auth())
      .attach('file', Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"></svg>'), { filename: 'plate.png', contentType: 'image/png' })
      .expect(415);
    expect(res.body.error.code).toBe('unsupported-type');
    await upload(Buffer.from('%PDF-1.7\n'), 'plate.jpg').expect(415);
    expect(filesOnDisk().length).toBe(before);
  });

  it('when the file is over 10 MB, then 413; with no file, 422; on an unknown job, 404', async () => {
    const big = Buffer.concat([tinyPng(), Buffer.alloc(10 * 1024 * 1024)]);
    const res = await upload(big, 'big.png').expect(413);
    expect(res.body.error.code).toBe('too-large');
    await request(t.app).post(`/api/jobs/${f.jobId}/attachments`).set(auth()).field('kind', 'nameplate').expect(422);
    await request(t.app).post('/api/jobs/999999/attachments').set(auth()).attach('file', tinyPng(), 'a.png').expect(404);
    await request(t.app).post(`/api/jobs/${f.jobId}/attachments`).attach('file', tinyPng(), 'a.png').expect(401);
  });

  it('when the name carries a path, then it is reduced to a display name and the file sits under a random key in the data dir', async () => {
    const res = await upload(tinyPng(), '../../../etc/passwd.png').expect(201);
    expect(res.body.fileName).toBe('passwd.png');
    const odd = await upload(tinyPng(), '..\\..\\win\\..png').expect(201);
    expect(odd.body.fileName).toBe('photo.png');
    const root = path.join(t.ctx.config.dataDir, 'files');
    for (const file of filesOnDisk()) {
      expect(path.relative(root, file)).toMatch(/^[0-9a-f]{2}[\\/][0-9a-f]{32}$/);
      expect(statSync(file).isFile()).toBe(true);
    }
    await request(t.app).get('/api/attachments/..%2F..%2Ftest.sqlite').set(auth()).expect(400);
  });

  it('when the linked record is final or on another job, then 409 or 422', async () => {
    const made = (await request(t.app).post(`/api/jobs/${f.jobId}/systems`).set(auth()).send(recordBody(f)).expect(201)).body;
    await request(t.app).post(`/api/systems/${made.id}/finalize`).set(auth()).send({ revision: 1, openItemsReason: 'Test' }).expect(200);
    await upload(tinyPng(), 'a.png', { kind: 'nameplate', systemId: String(made.id) }).expect(409);
    const other = await request(t.app)
      .post('/api/jobs')
      .set(auth())
      .send({ customerName: 'Pim Aalders', siteAddress: '2 Heron Ct', state: 'OH' })
      .expect(201);
    const res = await request(t.app)
      .post(`/api/jobs/${other.body.id}/attachments`)
      .set(auth())
      .field('systemId', String(made.id))
      .attach('file', tinyPng(), 'a.png')
      .expect(422);
    expect(res.body.error.details[0].path).toBe('systemId');
    await upload(tinyPng(), 'a.png', { kind: 'selfie' }).expect(422);
  });
});
