import { EXTRA_LINE_KINDS, OptionInputSchema, type OptionInput, type OptionLine, type OptionLineInput, type OptionView } from '@/shared/schemas/options';
import { centsFromText } from './option-words';

type ExtraKind = (typeof EXTRA_LINE_KINDS)[number];

/** A part as the editor holds it: a catalog id with its model for the screen, and whether it stays. */
export interface DraftPart {
  /** A catalog part; or, for a part typed from its nameplate on an earlier save, its spec as saved. */
  id?: number;
  spec?: Record<string, unknown>;
  label: string;
  kept: boolean;
}

type PartRef = { id: number; kept?: boolean } | { spec: unknown; kept?: boolean } | undefined;

/** The part as the API takes it: by catalog id or by its saved spec. */
function partRef(p: DraftPart): { id: number; kept: boolean } | { spec: Record<string, unknown>; kept: boolean } {
  return p.id !== undefined ? { id: p.id, kept: p.kept } : { spec: p.spec ?? {}, kept: p.kept };
}

/** An extras line as typed; `snapshot` is the saved line it came from (its price is kept unless retyped). */
export interface DraftLine {
  kind: ExtraKind;
  description: string;
  model: string;
  quantity: string;
  /** Dollars; empty means "price it from the price list by model". */
  price: string;
  snapshot?: OptionLine;
}

export interface OptionDraft {
  name: string;
  outdoor?: DraftPart;
  indoorCoil?: DraftPart;
  airHandler?: DraftPart;
  lines: DraftLine[];
  laborHours: string;
  /** Dollars an hour; empty → the shop's rate. */
  laborRate: string;
  pricing: 'markup' | 'margin' | 'shop';
  pct: string;
  /** Percent; empty → the shop's rate. */
  taxRate: string;
  /** The option being edited (its revision and saved equipment lines), absent for a new one. */
  base?: Pick<OptionView, 'id' | 'revision' | 'lines' | 'input'>;
}

export const EXTRA_KIND_WORDS: Record<ExtraKind, string> = {
  'filter-drier': 'Filter-drier',
  'line-set': 'Line set (ft)',
  pad: 'Pad',
  disconnect: 'Disconnect',
  refrigerant: 'Refrigerant (lb)',
  material: 'Material',
  fee: 'Fee (not taxed)',
};

export const emptyLine = (kind: ExtraKind = 'material'): DraftLine => ({ kind, description: '', model: '', quantity: '1', price: '' });

export const emptyDraft = (): OptionDraft => ({ name: '', lines: [], laborHours: '', laborRate: '', pricing: 'shop', pct: '', taxRate: '' });

const dollars = (cents: number) => (cents / 100).toFixed(2);
const isExtra = (kind: string): kind is ExtraKind => (EXTRA_LINE_KINDS as readonly string[]).includes(kind);

/** The editor's starting point for a saved option: its parts, extras (prices as saved) and pricing. */
export function draftFromOption(o: OptionView): OptionDraft {
  const part = (ref: PartRef, summary?: { model: string; kept: boolean }): DraftPart | undefined => {
    if (!ref || !summary) return undefined;
    return 'id' in ref ? { id: ref.id, label: summary.model, kept: summary.kept } : { spec: ref.spec as Record<string, unknown>, label: summary.model, kept: summary.kept };
  };
  return {
    name: o.name,
    outdoor: { id: o.input.outdoor.id, label: o.parts.outdoor.model, kept: false },
    indoorCoil: part(o.input.indoorCoil, o.parts.indoorCoil),
    airHandler: part(o.input.airHandler, o.parts.airHandler),
    lines: o.lines
      .filter((l) => isExtra(l.kind))
      .map((l) => ({ kind: l.kind as ExtraKind, description: l.description, model: l.model ?? '', quantity: String(l.quantity), price: dollars(l.unitPriceCents), snapshot: l })),
    laborHours: String(o.laborHours),
    laborRate: dollars(o.laborRateCents),
    pricing: o.input.markupPct !== undefined ? 'markup' : o.input.targetMarginPct !== undefined ? 'margin' : 'shop',
    pct: String(o.input.markupPct ?? o.input.targetMarginPct ?? ''),
    taxRate: o.input.taxRatePct !== undefined ? String(o.input.taxRatePct) : '',
    base: o,
  };
}

/** A saved line sent back as it was, so the server keeps its snapshot price. */
function unchanged(l: OptionLine): OptionLineInput {
  return {
    kind: l.kind,
    description: l.description,
    ...(l.model ? { model: l.model } : {}),
    quantity: l.quantity,
    unitPriceCents: l.unitPriceCents,
    priceSource: l.priceSource,
    ...(l.distributor ? { distributor: l.distributor } : {}),
    ...(l.effectiveFrom ? { effectiveFrom: l.effectiveFrom } : {}),
    taxable: l.taxable,
  };
}

/** One extras line for the API: a retyped price is "typed"; an untouched saved price keeps its snapshot. */
export function lineInput(line: DraftLine): OptionLineInput | string {
  const quantity = Number(line.quantity.replace(',', '.'));
  if (!(quantity > 0)) return `${EXTRA_KIND_WORDS[line.kind]}: enter a quantity above 0`;
  const model = line.model.trim();
  const description = line.description.trim() || EXTRA_KIND_WORDS[line.kind];
  const s = line.snapshot;
  const priceText = line.price.trim();
  if (s && priceText === dollars(s.unitPriceCents) && model === (s.model ?? '')) return { ...unchanged(s), description, quantity };
  if (priceText === '') {
    if (!model) return `${description}: type a price, or a model to price it from the price list`;
    return { kind: line.kind, description, model, quantity };
  }
  const cents = centsFromText(priceText);
  if (cents === undefined) return `${description}: the price is not a sum of money`;
  return { kind: line.kind, description, ...(model ? { model } : {}), quantity, unitPriceCents: cents, priceSource: 'typed' };
}

const optionalNumber = (text: string, scale = 1): number | undefined | null => {
  const t = text.trim().replace(/[$,%\s]/g, '');
  if (t === '') return undefined;
  const n = Number(t);
  return Number.isFinite(n) ? n * scale : null;
};

/**
 * The editor's draft as the API's option input, validated by the shared schema; or the problems in words.
 * Equipment lines of parts that did not change keep their saved prices; a changed part is priced afresh.
 */
export function buildOptionInput(draft: OptionDraft): { input: OptionInput } | { problems: string[] } {
  const problems: string[] = [];
  if (!draft.outdoor) problems.push('Pick the new outdoor unit.');
  const extras = draft.lines.map(lineInput);
  for (const e of extras) if (typeof e === 'string') problems.push(e);
  const base = draft.base;
  const sameId = (a: PartRef, b?: DraftPart) => !!a && !!b && 'id' in a && a.id === b.id;
  const keptEquipment = (base?.lines ?? []).filter(
    (l) =>
      (l.kind === 'outdoor-unit' && sameId(base?.input.outdoor, draft.outdoor)) ||
      (l.kind === 'indoor-coil' && sameId(base?.input.indoorCoil, draft.indoorCoil) && !draft.indoorCoil?.kept) ||
      (l.kind === 'air-handler' && sameId(base?.input.airHandler, draft.airHandler) && !draft.airHandler?.kept) ||
      (l.kind === 'metering' && !!base?.input.metering),
  );
  const laborHours = optionalNumber(draft.laborHours);
  const laborRateCents = optionalNumber(draft.laborRate, 100);
  const pct = optionalNumber(draft.pct);
  const taxRatePct = optionalNumber(draft.taxRate);
  if (laborHours === null) problems.push('Labor hours must be a number.');
  if (laborRateCents === null) problems.push('The labor rate must be a sum of money.');
  if (pct === null || (draft.pricing !== 'shop' && pct === undefined)) problems.push(`Enter the ${draft.pricing === 'margin' ? 'target margin' : 'markup'} in percent.`);
  if (taxRatePct === null) problems.push('The tax rate must be a number (percent).');
  if (problems.length || !draft.outdoor) return { problems };

  const raw = {
    name: draft.name,
    outdoor: { id: draft.outdoor.id ?? 0 },
    ...(draft.indoorCoil ? { indoorCoil: partRef(draft.indoorCoil) } : {}),
    ...(draft.airHandler ? { airHandler: partRef(draft.airHandler) } : {}),
    ...(base?.input.metering ? { metering: base.input.metering } : {}),
    lines: [...keptEquipment.map(unchanged), ...(extras as OptionLineInput[])],
    ...(laborHours !== undefined ? { laborHours } : {}),
    ...(laborRateCents !== undefined ? { laborRateCents: Math.round(laborRateCents as number) } : {}),
    ...(draft.pricing === 'markup' ? { markupPct: pct } : draft.pricing === 'margin' ? { targetMarginPct: pct } : {}),
    ...(taxRatePct !== undefined ? { taxRatePct } : {}),
  };
  const parsed = OptionInputSchema.safeParse(raw);
  if (!parsed.success) return { problems: parsed.error.issues.map((i) => `${i.path.join('.') || 'option'}: ${i.message}`) };
  return { input: parsed.data };
}
