import { z } from 'zod';
import type { AppContext } from '../context';
import { PART_SLOTS } from '../systems/system-types';
import type { SystemView } from '../systems/system-view';
import { PdfLayout, type Paper } from './pdf-layout';
import { loadReportData, type ReportData } from './report-data';
import {
  dateTimeText,
  fmt,
  PART_LABELS,
  ratingLine,
  READING_VERDICT_WORDS,
  regionalLine,
  SAFETY_NOTE,
  SEVERITY_WORDS,
  STATE_WORDS,
} from './report-text';
import { verdictWord } from './verdict-words';

export const ReportQuerySchema = z.object({
  paper: z.enum(['letter', 'a4']).default('letter'),
  revision: z.coerce.number().int().positive().optional(),
});

/** GET /api/systems/:id/report.pdf: the record's report (latest revision unless one is named). */
export async function renderSystemReport(ctx: AppContext, id: number, options: { paper: Paper; revision?: number }) {
  const data = await loadReportData(ctx, id, options.revision);
  const pdf = await drawReport(data, options.paper);
  return { pdf, fileName: `system-record-${id}-rev-${data.record.revision}.pdf`, revision: data.record.revision };
}

/** Draws the report: one page when the record fits, continued pages otherwise. */
export async function drawReport(data: ReportData, paper: Paper): Promise<Buffer> {
  const { record, job } = data;
  const layout = new PdfLayout(paper, { title: `Matched-system record — ${job.customerName}`, author: data.shopName });
  header(layout, data);
  layout.heading(`Result: ${verdictWord(record.check)}`);
  layout.paragraph(`As it stood for this revision: checked ${dateTimeText(record.savedAt)} with rules version ${record.rulesVersion}.`, {
    muted: true,
  });
  parts(layout, record);
  layout.paragraph(ratingLine(record));
  layout.paragraph(regionalLine(record));
  findings(layout, record);
  readings(layout, record);
  checklist(layout, record);
  layout.heading('Safety', data.photos.length > 0 ? 110 : 72);
  const photos = data.photos.map((p) => ({ data: p.data, caption: p.fileName }));
  layout.besideImages('Nameplate photos', photos, 76, () => {
    layout.paragraph(SAFETY_NOTE);
    layout.signatures(['Technician — name, signature, date', 'Customer — name, signature, date']);
  });
  const revisionText = `Revision ${record.revision}${record.status === 'final' ? '' : ' (draft)'}`;
  return layout.finish(
    (page, pages) =>
      `${data.shopName} · ${job.customerName} · ${revisionText} · page ${page} of ${pages} · printed ${dateTimeText(data.generatedAt)}`,
  );
}

function header(layout: PdfLayout, { shopName, job, record }: ReportData) {
  const doc = layout.doc;
  doc.font('Inter-Bold').fontSize(15).text(shopName, layout.left, doc.y, { width: layout.width });
  doc.font('Inter-Medium').fontSize(10).text('Matched-system record', { width: layout.width });
  const status =
    record.status === 'final'
      ? `Revision ${record.revision}, final — ${dateTimeText(record.finalizedAt ?? record.savedAt)}${record.finalizedBy ? ` by ${record.finalizedBy.name}` : ''}`
      : `Revision ${record.revision}, DRAFT — not final; saved ${dateTimeText(record.savedAt)}`;
  doc.font('Inter').fontSize(8.5).text(status, { width: layout.width });
  doc.moveDown(0.4);
  const contact = [job.contactEmail, job.contactPhone].filter(Boolean).join(' · ');
  layout.paragraph(`Customer: ${job.customerName}${contact ? ` (${contact})` : ''}`, { bold: true });
  const scope = record.request.scope === 'new-system' ? 'new system' : 'component replacement';
  layout.paragraph(
    `Site: ${job.siteAddress} (${job.state})${record.label ? ` — ${record.label}` : ''} · Scope: ${scope}${record.parts.installDate ? ` · install date ${record.parts.installDate}` : ''}`,
  );
}

function parts(layout: PdfLayout, record: SystemView) {
  layout.heading('Equipment');
  const serials = record.serials as Record<string, string | undefined>;
  const rows = PART_SLOTS.flatMap((slot) => {
    const part = record.parts[slot];
    if (!part) return [];
    const spec = part.spec as {
      brand?: string;
      model?: string;
      refrigerant?: string;
      refrigerants?: string[];
      nominalTons?: number;
      minTons?: number;
      maxTons?: number;
    };
    const ref = spec.refrigerant ?? spec.refrigerants?.join(', ') ?? '';
    const size =
      spec.nominalTons !== undefined
        ? `${spec.nominalTons} ton`
        : spec.minTons !== undefined
          ? `${spec.minTons}–${spec.maxTons ?? spec.minTons} ton`
          : '';
    return [
      [
        PART_LABELS[slot],
        [spec.brand, spec.model ?? '(model not given)'].filter(Boolean).join(' '),
        serials[slot] ?? '—',
        [ref, size].filter(Boolean).join(' · '),
        part.kept ? 'Kept' : 'New',
      ],
    ];
  });
  layout.table(
    [
      { header: 'Part', share: 0.18 },
      { header: 'Brand and model', share: 0.3 },
      { header: 'Serial number', share: 0.2 },
      { header: 'Refrigerant · size', share: 0.22 },
      { header: 'New / kept', share: 0.1 },
    ],
    rows,
  );
}

function findings(layout: PdfLayout, record: SystemView) {
  layout.heading('Findings');
  // "Facts not given" notes are listed in one line: they say what was not checked, not what is wrong.
  const missing = record.check.findings.filter((f) => f.severity === 'info' && typeof f.values.missing === 'string');
  const shown = record.check.findings.filter((f) => !missing.includes(f));
  if (shown.length === 0) layout.paragraph('No findings.');
  else {
    layout.table(
      [
        { header: 'Severity', share: 0.09 },
        { header: 'Finding', share: 0.65 },
        { header: 'Basis', share: 0.26 },
      ],
      shown.map((f) => [
        SEVERITY_WORDS[f.severity],
        `${f.title}: ${f.detail}${f.fix && f.severity !== 'info' ? ` Fix: ${f.fix}` : ''}`,
        f.basis.citation,
      ]),
    );
  }
  if (missing.length > 0) {
    // Short forms (no parenthetical examples) keep a full record on one page.
    const facts = [...new Set(missing.map((f) => String(f.values.missing).replace(/\s*\([^)]*\)/g, '')))];
    layout.paragraph(`Not checked for want of facts: ${facts.join('; ')}.`, { muted: true, size: 7.5 });
  }
}

function readings(layout: PdfLayout, record: SystemView) {
  layout.heading('Start-up readings');
  if (record.readings.length === 0) {
    layout.paragraph('No readings recorded.', { muted: true });
    return;
  }
  const rows = record.readings.map((r) => {
    const c = r.results.charge;
    const input = r.input.charge;
    const lines: string[] = [];
    if (c && input) {
      lines.push(
        `Superheat ${fmt(c.superheatF, '°F')}${target(c.targetSuperheatF)} · Subcooling ${fmt(c.subcoolingF, '°F')}${target(c.targetSubcoolingF)} — ${READING_VERDICT_WORDS[c.verdict] ?? c.verdict}`,
        `Suction ${fmt(input.suctionPsig, 'psig')} / ${fmt(input.suctionLineF, '°F')}, liquid ${fmt(input.liquidPsig, 'psig')} / ${fmt(input.liquidLineF, '°F')}; outdoor ${fmt(input.outdoorDbF, '°F')}, indoor WB ${fmt(input.indoorWbF, '°F')}`,
      );
    }
    if (r.results.evacuation) lines.push(`Evacuation: ${r.results.evacuation.message}`);
    if (r.results.pressureTest) lines.push(`Nitrogen test: ${r.results.pressureTest.message}`);
    return [`${dateTimeText(r.takenAt)}${r.label ? `\n${r.label}` : ''}${r.takenBy ? `\n${r.takenBy.name}` : ''}`, lines.join('\n')];
  });
  layout.table(
    [
      { header: 'Taken', share: 0.2 },
      { header: 'Readings and results', share: 0.8 },
    ],
    rows,
  );
}

const target = (valueF: number | undefined) => (valueF === undefined ? '' : ` (target ${fmt(valueF, '°F')})`);

function checklist(layout: PdfLayout, record: SystemView) {
  layout.heading('Checklist');
  layout.table(
    [
      { header: 'State', share: 0.07 },
      { header: 'Item', share: 0.35 },
      { header: 'Why', share: 0.58 },
    ],
    record.checklist.map((row) => [STATE_WORDS[row.state], row.note ? `${row.title} — ${row.note}` : row.title, row.reason]),
  );
  if (record.openItemsReason) layout.paragraph(`Finalized with items open: ${record.openItemsReason}`, { bold: true });
}
