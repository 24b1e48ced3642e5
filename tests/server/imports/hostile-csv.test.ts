import { readFileSync } from 'node:fs';
import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../helpers/test-app';

/**
 * The hostile CSV corpus (tests/fixtures/hostile-csv, written by scripts/generate-hostile-csv.mjs):
 * each file committed directly must give what the manifest says, never a 5xx, never a partial
 * commit; every rejection names its line and a reason; a refused upload changes no table.
 */

interface Case {
  file: string;
  kind: string;
  distributor?: string;
  note: string;
  expect: { status: number; code?: string; inserted?: number; rejectedRows?: number[]; rejected?: number };
}
const DIR = path.resolve(__dirname, '../../fixtures/hostile-csv');
const { cases } = JSON.parse(readFileSync(path.join(DIR, 'manifest.json'), 'utf8')) as { cases: Case[] };
const TABLES = ['outdoor_units', 'indoor_coils', 'air_handlers', 'metering_devices', 'rated_combinations', 'price_entries', 'distributors', 'imports', 'import_changes'];

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

async function counts(): Promise<Record<string, number>> {
  const out: Record<string, number> = {};
  for (const table of TABLES) out[table] = ((await t.ctx.dataSource.query(`SELECT COUNT(*) AS n FROM ${table}`)) as { n: number }[])[0].n;
  return out;
}

function upload(c: Pick<Case, 'kind' | 'distributor'>, bytes: Buffer, dryRun: boolean, fileName = 'upload.csv') {
  const req = request(t.app).post('/api/imports').set('Authorization', `Bearer ${t.tokenFor('admin')}`).field('kind', c.kind).field('dryRun', String(dryRun));
  if (c.distributor) req.field('distributor', c.distributor);
  return req.attach('file', bytes, { filename: fileName, contentType: 'text/csv' });
}

const table = (kind: string) => (kind === 'prices' ? 'price_entries' : kind.replace(/-/g, '_'));

describe('hostile CSV corpus', () => {
  it('holds at least 100 files', () => {
    expect(cases.length).toBeGreaterThanOrEqual(100);
  });

  it.each(cases.map((c) => [c.file, c] as const))('when %s is committed, then it answers as the manifest says', async (_file, c) => {
    const bytes = readFileSync(path.join(DIR, c.file));
    const before = await counts();
    const res = await upload(c, bytes, false, c.file);
    expect(res.status, `${c.note}: ${JSON.stringify(res.body).slice(0, 300)}`).toBe(c.expect.status);
    const after = await counts();
    if (res.status === 201) {
      expect(res.body.import.counts).toMatchObject({ inserted: c.expect.inserted, rejected: 0 });
      expect(after[table(c.kind)] - before[table(c.kind)]).toBe(c.expect.inserted);
      expect(after.imports).toBe(before.imports + 1);
      return;
    }
    // Refused: nothing written anywhere, and the error has our shape.
    expect(after).toEqual(before);
    expect(res.body.error).toMatchObject({ code: c.expect.code, message: expect.any(String) });
    if (c.expect.code !== 'rows-rejected') return;
    const details = res.body.error.details as { errors: { row: number; column: string; value: string; message: string }[]; errorsTotal: number; counts: { rejected: number } };
    for (const e of details.errors) {
      expect(e.row).toBeGreaterThanOrEqual(2);
      expect(e.message.trim().length).toBeGreaterThan(0);
      expect(e.value.length).toBeLessThanOrEqual(80);
    }
    if (c.expect.rejectedRows) expect([...new Set(details.errors.map((e) => e.row))]).toEqual(c.expect.rejectedRows);
    if (c.expect.rejected !== undefined) {
      expect(details.counts.rejected).toBe(c.expect.rejected);
      expect(details.errors.length).toBeLessThanOrEqual(500);
    }
    // As a preview the same file is stored with the same rejected lines, and still writes no catalog row.
    const preview = await upload(c, bytes, true, c.file);
    expect(preview.status).toBe(201);
    expect(preview.body.import.counts.rejected).toBe(details.counts.rejected);
    const afterPreview = await counts();
    expect({ ...afterPreview, imports: 0, distributors: 0 }).toEqual({ ...before, imports: 0, distributors: 0 });
  });

  it('when a file is just over 20 MB, then it is a 413 and nothing changes', async () => {
    const line = 'QL-000000,12.50\n';
    const bytes = Buffer.alloc(20 * 1024 * 1024 + 1, line);
    const before = await counts();
    const res = await upload({ kind: 'prices', distributor: 'Over Size' }, bytes, false);
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('too-large');
    expect(await counts()).toEqual(before);
  });

  it('when a file has 200,001 rows, then it is a 413 and nothing changes', async () => {
    const rows = Array.from({ length: 200_001 }, (_, i) => `R${i},1`);
    const before = await counts();
    const res = await upload({ kind: 'prices', distributor: 'Over Rows' }, Buffer.from(`model,price\n${rows.join('\n')}\n`), false);
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('too-many-rows');
    expect(await counts()).toEqual(before);
  });
});
