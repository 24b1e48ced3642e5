import { writeFileSync } from 'node:fs';
import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { R410A_TXV_ON_TARGET } from '../../helpers/charge-readings';
import { createTestApp, type TestApp } from '../../helpers/test-app';
import { tinyPng } from './images';
import { pdfText } from './pdf-text';
import { authFor, buildFixture, recordBody, type Fixture } from './system-fixtures';

let t: TestApp;
let f: Fixture;
beforeAll(async () => {
  t = await createTestApp({ shopName: 'Bramblewood Heating & Air' });
  f = await buildFixture(t);
});
afterAll(async () => {
  await t.close();
});

const auth = (role: 'tech' | 'admin' = 'tech') => authFor(t, role);

const getPdf = (url: string) =>
  request(t.app)
    .get(url)
    .set(auth())
    .buffer(true)
    .parse((res, cb) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => cb(null, Buffer.concat(chunks)));
    });

// Optional: keep the rendered PDFs to look at them with pdftoppm (REPORT_OUT=/some/dir).
const keep = (name: string, pdf: Buffer) => process.env.REPORT_OUT && writeFileSync(path.join(process.env.REPORT_OUT, name), pdf);

// Right on target (tests/helpers/charge-readings.ts): 10 °F superheat, 10 °F subcooling.
const charge = { ...R410A_TXV_ON_TARGET, indoorWbF: 63, outdoorDbF: 88 };

describe('GET /api/systems/:id/report.pdf', () => {
  it('when a full record is reported, then the PDF parses and states the shop, models, serials, superheat, checklist and the safety note on one page', async () => {
    // Installed 2024-11-20: before the 2025-01-01 GWP-700 date for new R-410A split systems (40 CFR 84.54, values.json REG-03).
    const made = (
      await request(t.app)
        .post(`/api/jobs/${f.jobId}/systems`)
        .set(auth())
        .send(recordBody(f, { installDate: '2024-11-20' }))
        .expect(201)
    ).body;
    await request(t.app).post(`/api/systems/${made.id}/readings`).set(auth()).send({ label: 'Final charge', charge }).expect(201);
    await request(t.app)
      .post(`/api/systems/${made.id}/readings`)
      .set(auth())
      .send({
        evacuation: { finalMicrons: 380, decayMicrons: 640, holdMinutes: 10 },
        pressureTest: { pressurePsig: 300, holdMinutes: 30, dropPsig: 0 },
      })
      .expect(201);
    await request(t.app)
      .post(`/api/jobs/${f.jobId}/attachments`)
      .set(auth())
      .field('kind', 'nameplate')
      .field('systemId', String(made.id))
      .attach('file', tinyPng(), 'outdoor-plate.png')
      .expect(201);
    await request(t.app)
      .post(`/api/systems/${made.id}/finalize`)
      .set(auth())
      .send({ revision: 1, openItemsReason: 'Float switch on order' })
      .expect(200);

    const res = await getPdf(`/api/systems/${made.id}/report.pdf`).expect(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    const pdf = res.body as Buffer;
    keep('report-letter.pdf', pdf);
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    const { text, pages } = await pdfText(pdf);
    for (const expected of [
      'Bramblewood Heating & Air',
      'Odile Franz',
      '7 Cinder Hill Rd',
      'QX-HP36-B',
      'QX-CL36-B',
      'QX2611A04471',
      'QC2610B00913',
      'QX-REF-0042',
    ]) {
      expect(text).toContain(expected);
    }
    expect(text).toMatch(/Superheat 10\.\d °F/);
    // 10 °F target subcooling when the unit gives none (common practice, no source)
    expect(text).toMatch(/Subcooling (9\.\d|10\.\d) °F \(target 10\.0 °F\)/);
    expect(text).toContain('Revision 1, final');
    expect(text).toContain('Float switch on order');
    // Southeast split heat pump minimum 14.3 SEER2 (10 CFR 430.32(c), values.json EFF-06)
    expect(text).toMatch(/Regional minimum \(Southeast\): SEER2 14\.3/);
    expect(text).toContain('licensed and certified people only');
    expect(text).toContain('authority having jurisdiction');
    expect(text).toContain('Customer — name, signature, date');
    expect(pages).toBe(1);
  });

  it('when A4 is asked for, then the page is A4; a draft says so; an earlier revision names its number', async () => {
    const made = (await request(t.app).post(`/api/jobs/${f.jobId}/systems`).set(auth()).send(recordBody(f)).expect(201)).body;
    await request(t.app).patch(`/api/systems/${made.id}`).set(auth()).send({ revision: 1, label: 'Basement' }).expect(200);
    const a4 = (await getPdf(`/api/systems/${made.id}/report.pdf?paper=a4`).expect(200)).body as Buffer;
    keep('report-a4.pdf', a4);
    // A4 is 595.28 × 841.89 pt (ISO 216 at 72 pt per inch); Letter is 612 × 792 pt.
    expect(a4.toString('latin1')).toMatch(/MediaBox \[0 0 595\.2\d* 841\.8\d*\]/);
    const { text } = await pdfText(a4);
    expect(text).toContain('Revision 2, DRAFT');
    const first = await pdfText((await getPdf(`/api/systems/${made.id}/report.pdf?revision=1`).expect(200)).body as Buffer);
    expect(first.text).toContain('Revision 1, DRAFT');
    await request(t.app).get(`/api/systems/${made.id}/report.pdf?paper=legal`).set(auth()).expect(400);
    await request(t.app).get(`/api/systems/${made.id}/report.pdf`).expect(401);
  });
});
