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
import { authFor, buildFixture, type Fixture } from '../systems/system-fixtures';

let mail: LocalMailService;
let mailDir: string;
let t: TestApp;
let f: Fixture;
let jobId: number;
beforeAll(async () => {
  mailDir = mkdtempSync(path.join(os.tmpdir(), 'tandem-proposal-'));
  mail = await startLocalMailService({ dataDir: mailDir, port: 0, from: 'office@bramblewood.invalid' });
  t = await createTestApp({ smtp: mail.smtp, shopName: 'Bramblewood Heating & Air' });
  f = await buildFixture(t);
  jobId = (
    await request(t.app)
      .post('/api/jobs')
      .set(authFor(t, 'estimator'))
      .send({ customerName: 'Ines Marlow', siteAddress: '12 Fern Row', state: 'GA' })
      .expect(201)
  ).body.id;
  const base = {
    outdoor: { id: f.outdoorId },
    indoorCoil: { id: f.coilId },
    laborHours: 6,
    laborRateCents: 9500,
    markupPct: 35,
    taxRatePct: 7,
  };
  const lines = [
    { kind: 'line-set', description: 'Line set 3/8 × 7/8', quantity: 25, unitPriceCents: 450 },
    { kind: 'fee', description: 'Permit', quantity: 1, unitPriceCents: 7500 },
  ];
  await request(t.app)
    .post(`/api/jobs/${jobId}/options`)
    .set(authFor(t, 'estimator'))
    .send({ ...base, name: 'Keep the air handler', lines })
    .expect(201);
  await request(t.app)
    .post(`/api/jobs/${jobId}/options`)
    .set(authFor(t, 'estimator'))
    .send({ ...base, name: 'Coil only, no extras' })
    .expect(201);
});
afterAll(async () => {
  await t.close();
  await mail.close();
  rmSync(mailDir, { recursive: true, force: true });
});

const messages = () => readdirSync(mail.dir).filter((n) => n.endsWith('.eml'));

describe('proposal', () => {
  it('when the proposal PDF is fetched, then it holds both option names, their prices, the verdicts and the safety note', async () => {
    const res = await request(t.app)
      .get(`/api/jobs/${jobId}/proposal.pdf`)
      .query({ existingSeer2: 10, existingHspf2: 6.8 })
      .set(authFor(t, 'estimator'))
      .buffer(true)
      .expect(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    const { text } = await pdfText(res.body as Buffer);
    expect(text).toContain('Keep the air handler');
    expect(text).toContain('Coil only, no extras');
    // $6,811.26: the first option's total worked by hand in options-api.test.ts (35 % markup, 7 % tax on materials).
    expect(text).toContain('$6,811.26');
    expect(text).toMatch(/Compatib/);
    expect(text).toContain('authority having jurisdiction');
    expect(text).toContain('signature');
  });

  it('when a tech asks for the proposal, then 403; a job with no options, then 409', async () => {
    await request(t.app).get(`/api/jobs/${jobId}/proposal.pdf`).set(authFor(t, 'tech')).expect(403);
    const empty = (
      await request(t.app)
        .post('/api/jobs')
        .set(authFor(t, 'estimator'))
        .send({ customerName: 'Ada Quell', siteAddress: '3 Moss Ln', state: 'OH' })
        .expect(201)
    ).body.id;
    const res = await request(t.app).get(`/api/jobs/${empty}/proposal.pdf`).set(authFor(t, 'estimator')).expect(409);
    expect(res.body.error.code).toBe('no-options');
  });

  it('when the proposal is sent, then the local mail service keeps it with the PDF and the outbox records it against the job', async () => {
    const before = messages().length;
    const sent = await request(t.app)
      .post(`/api/jobs/${jobId}/proposal/send`)
      .set(authFor(t, 'estimator'))
      .send({ to: 'ines.marlow@example.test' })
      .expect(200);
    expect(sent.body).toMatchObject({ to: 'ines.marlow@example.test', messageId: expect.any(String), emailId: expect.any(Number) });
    const files = messages();
    expect(files.length).toBe(before + 1);
    const parsed = await simpleParser(readFileSync(path.join(mail.dir, files.sort().at(-1)!)));
    expect(parsed.subject).toContain('12 Fern Row');
    expect(parsed.attachments[0]).toMatchObject({ contentType: 'application/pdf', filename: `proposal-job-${jobId}.pdf` });
    expect((await pdfText(parsed.attachments[0].content)).text).toContain('Coil only, no extras');
    const outbox = await request(t.app).get('/api/outbox').set(authFor(t, 'admin')).expect(200);
    expect(outbox.body.items[0]).toMatchObject({ id: sent.body.emailId, jobId, systemId: null, status: 'sent' });
  });

  it('when the proposal went out under a minute ago, then a second send asks first (409) and goes only with confirm', async () => {
    const before = messages().length;
    const again = await request(t.app)
      .post(`/api/jobs/${jobId}/proposal/send`)
      .set(authFor(t, 'admin'))
      .send({ to: 'ines.marlow@example.test' })
      .expect(409);
    expect(again.body.error).toMatchObject({ code: 'recently-sent', details: { to: 'ines.marlow@example.test', confirmWith: { confirm: true } } });
    expect(messages().length).toBe(before);
    await request(t.app)
      .post(`/api/jobs/${jobId}/proposal/send`)
      .set(authFor(t, 'admin'))
      .send({ to: 'ines.marlow@example.test', confirm: true })
      .expect(200);
    expect(messages().length).toBe(before + 1);
  });

  it('when the address is not an e-mail, then 422 and nothing is sent', async () => {
    const before = messages().length;
    await request(t.app).post(`/api/jobs/${jobId}/proposal/send`).set(authFor(t, 'estimator')).send({ to: 'not-an-address' }).expect(422);
    expect(messages().length).toBe(before);
  });
});

describe('proposal: a mail failure', () => {
  it('when the mail server can not be reached, then 502, the outbox records a failed attempt and no option changes', async () => {
    const app = await createTestApp({
      smtp: { host: '127.0.0.1', port: await closedPort(), tls: 'none', from: 'office@bramblewood.invalid' },
    });
    try {
      const fx = await buildFixture(app);
      const made = await request(app.app)
        .post(`/api/jobs/${fx.jobId}/options`)
        .set(authFor(app, 'estimator'))
        .send({ name: 'Only one', outdoor: { id: fx.outdoorId }, indoorCoil: { id: fx.coilId } })
        .expect(201);
      const res = await request(app.app)
        .post(`/api/jobs/${fx.jobId}/proposal/send`)
        .set(authFor(app, 'estimator'))
        .send({ to: 'ines.marlow@example.test' })
        .expect(502);
      expect(res.body.error).toMatchObject({ code: 'mail-failed' });
      const outbox = await request(app.app).get('/api/outbox').set(authFor(app, 'admin')).expect(200);
      expect(outbox.body.items[0]).toMatchObject({ jobId: fx.jobId, status: 'failed', hasAttachment: false });
      const after = await request(app.app).get(`/api/options/${made.body.id}`).set(authFor(app, 'estimator')).expect(200);
      expect(after.body).toMatchObject({ revision: 1, chosen: false });
    } finally {
      await app.close();
    }
  });
});
