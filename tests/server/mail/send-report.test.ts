import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { simpleParser } from 'mailparser';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startLocalMailService, type LocalMailService } from '../../../server/mail/local-mail-service';
import { closedPort } from '../../helpers/closed-port';
import { createTestApp, type TestApp } from '../../helpers/test-app';
import { pdfText } from '../systems/pdf-text';
import { authFor, buildFixture, recordBody, type Fixture } from '../systems/system-fixtures';

let mail: LocalMailService;
let mailDir: string;
let t: TestApp;
let f: Fixture;
beforeAll(async () => {
  mailDir = mkdtempSync(path.join(os.tmpdir(), 'tandem-mail-'));
  mail = await startLocalMailService({ dataDir: mailDir, port: 0, from: 'office@bramblewood.invalid' });
  t = await createTestApp({ smtp: mail.smtp, shopName: 'Bramblewood Heating & Air' });
  f = await buildFixture(t);
});
afterAll(async () => {
  await t.close();
  await mail.close();
  rmSync(mailDir, { recursive: true, force: true });
});

const auth = (role: 'tech' | 'estimator' | 'admin' = 'tech') => authFor(t, role);
const newRecord = async (app = t, fx = f) =>
  (await request(app.app).post(`/api/jobs/${fx.jobId}/systems`).set(authFor(app)).send(recordBody(fx)).expect(201)).body;
const messages = () => readdirSync(mail.dir).filter((n) => n.endsWith('.eml'));

describe('POST /api/systems/:id/send', () => {
  it('when a tech sends the report, then the local mail service keeps the message with the PDF attached and the outbox lists it', async () => {
    const made = await newRecord();
    const before = messages().length;
    const sent = await request(t.app)
      .post(`/api/systems/${made.id}/send`)
      .set(auth('tech'))
      .send({ to: 'odile.franz@example.test' })
      .expect(200);
    expect(sent.body).toMatchObject({
      systemId: made.id,
      revision: 1,
      to: 'odile.franz@example.test',
      status: 'sent',
      messageId: expect.any(String),
      hasAttachment: true,
    });

    const files = messages();
    expect(files.length).toBe(before + 1);
    const parsed = await simpleParser(readFileSync(path.join(mail.dir, files.sort().at(-1)!)));
    expect(parsed.subject).toContain('7 Cinder Hill Rd');
    expect(parsed.from?.text).toContain('office@bramblewood.invalid');
    expect(parsed.text).toContain('authority having jurisdiction');
    expect(parsed.messageId).toBe(sent.body.messageId);
    expect(parsed.attachments).toHaveLength(1);
    expect(parsed.attachments[0]).toMatchObject({ contentType: 'application/pdf', filename: `system-record-${made.id}-rev-1.pdf` });
    const { text } = await pdfText(parsed.attachments[0].content);
    expect(text).toContain('QX2611A04471');

    const outbox = await request(t.app).get('/api/outbox').set(auth('admin')).expect(200);
    expect(outbox.body.items[0]).toMatchObject({
      id: sent.body.id,
      to: 'odile.franz@example.test',
      status: 'sent',
      subject: parsed.subject,
    });
    const pdf = await request(t.app).get(`/api/outbox/${sent.body.id}/attachment`).set(auth('admin')).buffer(true).expect(200);
    expect(pdf.headers['content-type']).toBe('application/pdf');
    expect(Buffer.compare(pdf.body as Buffer, parsed.attachments[0].content)).toBe(0);
    await request(t.app).get('/api/outbox').set(auth('tech')).expect(403);
    await request(t.app).get('/api/outbox').expect(401);
  });

  it('when the same report is sent again within a minute, then 409 asks first, and confirm sends it', async () => {
    const made = await newRecord();
    await request(t.app).post(`/api/systems/${made.id}/send`).set(auth()).send({ to: 'odile.franz@example.test' }).expect(200);
    const count = messages().length;
    const again = await request(t.app)
      .post(`/api/systems/${made.id}/send`)
      .set(auth())
      .send({ to: 'odile.franz@example.test' })
      .expect(409);
    expect(again.body.error).toMatchObject({ code: 'recently-sent', details: { to: 'odile.franz@example.test' } });
    expect(messages().length).toBe(count);
    await request(t.app)
      .post(`/api/systems/${made.id}/send`)
      .set(auth())
      .send({ to: 'odile.franz@example.test', confirm: true })
      .expect(200);
    expect(messages().length).toBe(count + 1);
  });

  it('when the address is bad or the record unknown, then 422 or 404', async () => {
    const made = await newRecord();
    const bad = await request(t.app).post(`/api/systems/${made.id}/send`).set(auth()).send({ to: 'not an address' }).expect(422);
    expect(bad.body.error.details.map((d: { path: string }) => d.path)).toEqual(['to']);
    await request(t.app).post('/api/systems/999999/send').set(auth()).send({ to: 'a@example.test' }).expect(404);
  });
});

describe('a mail failure', () => {
  it('when the mail server can not be reached, then 502 with the error shape, the attempt is recorded and nothing else changes', async () => {
    const app = await createTestApp({
      smtp: { host: '127.0.0.1', port: await closedPort(), tls: 'none', from: 'office@bramblewood.invalid' },
    });
    try {
      const fx = await buildFixture(app);
      const made = await newRecord(app, fx);
      const res = await request(app.app)
        .post(`/api/systems/${made.id}/send`)
        .set(authFor(app))
        .send({ to: 'odile.franz@example.test' })
        .expect(502);
      expect(res.body.error).toMatchObject({ code: 'mail-failed', message: expect.any(String) });
      expect(JSON.stringify(res.body)).not.toMatch(/at .*\.ts:\d+/);

      const outbox = await request(app.app).get('/api/outbox').set(authFor(app, 'admin')).expect(200);
      expect(outbox.body.items).toHaveLength(1);
      expect(outbox.body.items[0]).toMatchObject({
        status: 'failed',
        hasAttachment: false,
        messageId: null,
        error: expect.stringMatching(/ECONNREFUSED|connect/i),
      });
      await request(app.app).get(`/api/outbox/${outbox.body.items[0].id}/attachment`).set(authFor(app, 'admin')).expect(404);

      const after = await request(app.app).get(`/api/systems/${made.id}`).set(authFor(app)).expect(200);
      expect(after.body).toMatchObject({ status: 'draft', revision: 1, revisions: [expect.objectContaining({ revision: 1 })] });
      // A failed attempt does not count as a send: the next try is not asked to confirm.
      await request(app.app).post(`/api/systems/${made.id}/send`).set(authFor(app)).send({ to: 'odile.franz@example.test' }).expect(502);
    } finally {
      await app.close();
    }
  });

  it('when no mail server is configured, then 503 says so', async () => {
    const app = await createTestApp();
    try {
      const fx = await buildFixture(app);
      const made = await newRecord(app, fx);
      const res = await request(app.app).post(`/api/systems/${made.id}/send`).set(authFor(app)).send({ to: 'a@example.test' }).expect(503);
      expect(res.body.error.code).toBe('mail-not-configured');
    } finally {
      await app.close();
    }
  });
});
