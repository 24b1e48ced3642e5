// autocannon ships no types here; the options and result fields used are documented in its README.
// eslint-disable-next-line @typescript-eslint/ban-ts-comment
// @ts-ignore
import autocannon from 'autocannon';
import { startBenchServer } from './bench-server';
import { percentile, round, type Measure } from './measure';

const CONNECTIONS = 20;
const DURATION_S = 10;
const PDF_RUNS = 25;

interface CannonResult {
  latency: { p99: number; p50: number };
  requests: { average: number };
  non2xx: number;
  errors: number;
}

const cannon = (opts: Record<string, unknown>) =>
  autocannon({ connections: CONNECTIONS, duration: DURATION_S, ...opts }) as Promise<CannonResult>;

/**
 * jobs.record-save.p99-ms: POST /api/jobs/:id/systems (the check re-run, prices, a write-locked insert)
 * under 20 connections, against POST /api/checks with the same parts in the same run as baseline. Every
 * request makes a new record, so the 20 connections never contend for one record.
 * jobs.record-edit.p99-ms: PATCH /api/systems/:id under 20 connections, each editing a record of its own
 * from the revision its last save answered (20 techs saving their own records: no 409 expected).
 * jobs.report-pdf.ms: median time of GET /api/systems/:id/report.pdf for a full record, one at a time.
 */
export async function run(): Promise<Measure[]> {
  const { child, info } = await startBenchServer<{
    saveCpuMs: number;
    patchCpuMs: number;
    pdfCpuMs: number;
    ownRecords: { id: number; revision: number }[];
    port: number;
    token: string;
    jobId: number;
    recordId: number;
    body: Record<string, unknown>;
  }>('jobs-server.ts');
  try {
    const { port, token, jobId, recordId, body, saveCpuMs, patchCpuMs, pdfCpuMs, ownRecords } = info;
    const base = `http://127.0.0.1:${port}`;
    const headers = { Authorization: `Bearer ${token}`, 'Content-Type': 'application/json' };
    const payload = JSON.stringify(body);
    const { serials: _s, checklist: _c, ...checkBody } = body;
    const saveUrl = `${base}/api/jobs/${jobId}/systems`;
    const probe = await fetch(saveUrl, { method: 'POST', headers, body: payload });
    if (probe.status !== 201) throw new Error(`POST ${saveUrl} answered ${probe.status}: ${await probe.text()}`);

    await cannon({ url: saveUrl, method: 'POST', headers, body: payload, duration: 3 });
    const check = await cannon({ url: `${base}/api/checks`, method: 'POST', headers, body: JSON.stringify(checkBody) });
    const save = await cannon({ url: saveUrl, method: 'POST', headers, body: payload });
    const edit = await cannon({ url: base, requests: [ownRecordEdit(ownRecords, headers)] });

    const pdfUrl = `${base}/api/systems/${recordId}/report.pdf`;
    const times: number[] = [];
    for (let i = 0; i < PDF_RUNS + 3; i++) {
      const started = performance.now();
      const res = await fetch(pdfUrl, { headers: { Authorization: headers.Authorization } });
      const bytes = (await res.arrayBuffer()).byteLength;
      if (res.status !== 200 || bytes < 1000) throw new Error(`report answered ${res.status} with ${bytes} bytes`);
      if (i >= 3) times.push(performance.now() - started); // the first three warm fonts and code
    }
    const failures = save.non2xx + save.errors;
    const editFailures = edit.non2xx + edit.errors;
    const note = `${CONNECTIONS} connections × ${DURATION_S} s on loopback after a 3 s warm-up; server in its own process`;
    return [
      {
        id: 'jobs.record-save.p99-ms',
        value: save.latency.p99,
        unit: 'ms',
        baseline: check.latency.p99,
        ratio: round(save.latency.p99 / Math.max(check.latency.p99, 1), 2),
        note: `${note}; ${round(save.requests.average, 0)} saves/s; ${round(saveCpuMs, 1)} ms CPU per save in-process (20 in flight); baseline POST /api/checks p99 with the same parts; target < 50${failures ? `; ${failures} failed requests` : ''}`,
      },
      {
        id: 'jobs.record-edit.p99-ms',
        value: edit.latency.p99,
        unit: 'ms',
        baseline: check.latency.p99,
        ratio: round(edit.latency.p99 / Math.max(check.latency.p99, 1), 2),
        note: `${note}; each connection PATCHes its own record from the revision it last saved; ${round(edit.requests.average, 0)} saves/s; ${round(patchCpuMs, 1)} ms CPU per save in-process (20 in flight); baseline POST /api/checks p99; target < 50${editFailures ? `; ${editFailures} failed requests` : ''}`,
      },
      {
        id: 'jobs.report-pdf.ms',
        value: round(percentile(times, 50), 1),
        unit: 'ms',
        note: `median of ${PDF_RUNS} sequential GET report.pdf (3 readings, 10 findings, checklist, one 640×480 photo), after 3 warm-up renders; ${round(pdfCpuMs, 1)} ms CPU per render in-process; p95 ${round(percentile(times, 95), 1)} ms; target < 300`,
      },
    ];
  } finally {
    child.kill('SIGTERM');
  }
}

/**
 * One autocannon request that PATCHes a record no other connection is editing: it takes a record from
 * the pool, names the revision the last save of that record answered, and puts it back when answered.
 * (autocannon resets a connection's context between rounds, so the records live in the pool.)
 */
function ownRecordEdit(records: { id: number; revision: number }[], headers: Record<string, string>) {
  const pool = records.map((r) => ({ ...r }));
  return {
    method: 'PATCH',
    setupRequest(req: Record<string, unknown>, context: Record<string, unknown>) {
      const record = pool.shift();
      if (!record) throw new Error('more connections than records');
      context.record = record;
      return {
        ...req,
        path: `/api/systems/${record.id}`,
        headers,
        body: JSON.stringify({ revision: record.revision, serials: { outdoor: `BJ2611A${String(record.revision).padStart(5, '0')}` } }),
      };
    },
    onResponse(status: number, _body: string, context: Record<string, unknown>) {
      const record = context.record as { id: number; revision: number };
      if (status === 200) record.revision += 1; // a save answers revision n+1
      pool.push(record);
    },
  };
}
