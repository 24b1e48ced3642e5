import { formatDollars } from '../../shared/estimates/money';
import { NO_RATED_SEER2, type EnergyQuery, type OptionView } from '../../shared/schemas/options';
import type { AppContext } from '../context';
import { requireJob } from '../jobs/jobs.service';
import { AppError } from '../lib/errors';
import { listOptions } from '../options/options.service';
import { PdfLayout, type Paper } from './pdf-layout';
import { dateTimeText, SAFETY_NOTE, SEVERITY_WORDS } from './report-text';
import { verdictWord } from './verdict-words';

const fig = (v: number | undefined) => (v === undefined ? '—' : String(v));

/** GET /api/jobs/:id/proposal.pdf: the job's options side by side, then one section per option. */
export async function renderProposal(ctx: AppContext, jobId: number, options: { paper: Paper; energy: EnergyQuery }) {
  const job = await requireJob(ctx, jobId);
  const { items, chosenOptionId } = await listOptions(ctx, jobId, options.energy);
  if (items.length === 0) throw new AppError('no-options', 'This job has no options yet: add at least one before making a proposal.', 409);
  const shopName = ctx.config.shopName ?? 'Tandem';
  const generatedAt = new Date().toISOString();
  const layout = new PdfLayout(options.paper, { title: `Proposal — ${job.customerName}`, author: shopName });
  const doc = layout.doc;
  doc.font('Inter-Bold').fontSize(15).text(shopName, layout.left, doc.y, { width: layout.width });
  doc.font('Inter-Medium').fontSize(10).text('Proposal: heating and cooling options', { width: layout.width });
  doc
    .font('Inter')
    .fontSize(8.5)
    .text(`Prepared ${dateTimeText(generatedAt)}`, { width: layout.width });
  doc.moveDown(0.4);
  const contact = [job.contactEmail, job.contactPhone].filter(Boolean).join(' · ');
  layout.paragraph(`Customer: ${job.customerName}${contact ? ` (${contact})` : ''}`, { bold: true });
  layout.paragraph(`Site: ${job.siteAddress} (${job.state})`);

  layout.heading('Your options side by side');
  const share = 0.7 / items.length;
  const columns = [
    { header: '', share: 0.3 },
    ...items.map((o) => ({ header: o.name + (o.id === chosenOptionId ? ' (chosen)' : ''), share })),
  ];
  const row = (label: string, cell: (o: OptionView) => string) => [label, ...items.map(cell)];
  layout.table(columns, [
    row('Price (tax included)', (o) => formatDollars(o.price.totalCents)),
    row('Outdoor unit', (o) => o.parts.outdoor.description),
    row('Indoor coil', (o) => o.parts.indoorCoil?.description ?? '—'),
    row('Air handler / furnace', (o) => o.parts.airHandler?.description ?? '—'),
    row('Compatibility check', (o) => verdictWord(o.check)),
    row('Rated SEER2 / EER2 / HSPF2', (o) => `${fig(o.efficiency.seer2)} / ${fig(o.efficiency.eer2)} / ${fig(o.efficiency.hspf2)}`),
    row('Regional minimum', (o) => (o.regional.meets === true ? 'Meets' : o.regional.meets === false ? 'Does not meet' : 'Not known')),
    row(
      'Rebate tiers met',
      (o) =>
        o.rebateTiers
          .filter((t) => t.met)
          .map((t) => t.name)
          .join(', ') || 'None',
    ),
    row('Energy cost a year (now → new)', (o) => {
      const e = o.energy;
      if (!e.cooling) return `Not worked out: ${e.notComputed ?? NO_RATED_SEER2}`;
      const now = e.cooling.existingCostCents + (e.heating?.existingCostCents ?? 0);
      const next = e.cooling.newCostCents + (e.heating?.newCostCents ?? 0);
      return `${formatDollars(now)} → ${formatDollars(next)}`;
    }),
    row('Saving a year / simple payback', (o) =>
      o.energy.annualSavingCents === null
        ? 'Not worked out'
        : `${formatDollars(o.energy.annualSavingCents)} / ${o.energy.paybackYears === null ? 'none' : `${o.energy.paybackYears} years`}`,
    ),
  ]);

  for (const o of items) {
    layout.heading(`${o.name}: ${formatDollars(o.price.totalCents)}`, 90);
    if (o.notes) layout.paragraph(o.notes);
    // The customer sees what is included and the selling prices, never the shop's cost of each line.
    layout.table(
      [
        { header: 'Included', share: 0.8 },
        { header: 'Qty', share: 0.2 },
      ],
      [...o.lines.map((l) => [l.description, String(l.quantity)]), ['Installation labor', `${o.laborHours} h`]],
    );
    const p = o.price;
    layout.paragraph(
      `Equipment and materials ${formatDollars(p.materialSellCents)} · labor ${formatDollars(p.laborSellCents)} · sales tax ${p.taxRatePct} % on equipment and materials ${formatDollars(p.taxCents)} · total ${formatDollars(p.totalCents)}.`,
      { bold: true },
    );
    layout.paragraph(
      `Rated figures from ${o.efficiency.sourceText}. ${o.regional.minimum ? `Regional minimum (${o.regional.regionName}): SEER2 ${o.regional.minimum.seer2}${o.regional.minimum.eer2 ? `, EER2 ${o.regional.minimum.eer2}` : ''}${o.regional.minimum.hspf2 ? `, HSPF2 ${o.regional.minimum.hspf2}` : ''} — ${o.regional.minimum.basis}.` : ''}`,
    );
    const notable = o.check.findings.filter((f) => f.severity !== 'info');
    layout.paragraph(
      `Compatibility: ${verdictWord(o.check)}.${notable.length ? ' ' + notable.map((f) => `${SEVERITY_WORDS[f.severity]}: ${f.title}. ${f.detail}`).join(' ') : ''}`,
    );
    layout.paragraph(`Energy: ${o.energy.paybackText} ${o.energy.assumptions.join(' ')}`, { muted: true });
  }

  layout.heading('Safety and local codes', 90);
  layout.paragraph(SAFETY_NOTE);
  layout.paragraph(
    "Prices as of the date above; energy figures are estimates, not a guarantee of savings. Rebate tiers are the shop's list: check the program's current rules.",
    { muted: true },
  );
  layout.signatures(['Customer — option chosen, signature, date', `${shopName} — name, signature, date`]);
  const pdf = await layout.finish(
    (page, pages) => `${shopName} · ${job.customerName} · proposal · page ${page} of ${pages} · printed ${dateTimeText(generatedAt)}`,
  );
  return { pdf, fileName: `proposal-job-${jobId}.pdf`, job };
}
