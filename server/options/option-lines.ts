import { lineExtendedCents } from '../../shared/estimates/option-price';
import type { Pairing } from '../../shared/rules/types';
import { normalizeModel } from '../../shared/schemas/fields';
import { EQUIPMENT_LINE_KINDS, type OptionLine, type OptionLineInput } from '../../shared/schemas/options';
import { currentPricesBatch } from '../catalog/prices.service';
import { pickBestPrice } from '../coils/best-price';
import type { AppContext } from '../context';
import { AppError } from '../lib/errors';
import type { StoredLine } from './option.entity';

type EquipmentKind = (typeof EQUIPMENT_LINE_KINDS)[number];
const SLOT_OF: Record<EquipmentKind, 'outdoor' | 'indoorCoil' | 'airHandler' | 'metering'> = {
  'outdoor-unit': 'outdoor',
  'indoor-coil': 'indoorCoil',
  'air-handler': 'airHandler',
  metering: 'metering',
};
const EQUIPMENT_WORDS: Record<EquipmentKind, string> = {
  'outdoor-unit': 'Outdoor unit',
  'indoor-coil': 'Indoor coil',
  'air-handler': 'Air handler / furnace',
  metering: 'Metering kit',
};
const KIND_WORDS: Record<string, string> = {
  'filter-drier': 'Filter-drier',
  'line-set': 'Line set',
  pad: 'Equipment pad',
  disconnect: 'Disconnect',
  refrigerant: 'Refrigerant (lb)',
  material: 'Material',
  fee: 'Fee',
};

const isEquipment = (kind: string): kind is EquipmentKind => (EQUIPMENT_LINE_KINDS as readonly string[]).includes(kind);

/**
 * The option's lines before pricing: the given lines, plus one equipment line for every NEW catalog part
 * that has no line of its kind; an equipment line for a part that is now kept or gone is dropped.
 */
export function withEquipmentLines(lines: OptionLineInput[], pairing: Pairing): OptionLineInput[] {
  const out: OptionLineInput[] = [];
  for (const line of lines) {
    if (!isEquipment(line.kind)) {
      out.push(line);
      continue;
    }
    const part = pairing[SLOT_OF[line.kind]];
    if (!part || part.kept) continue;
    // A line naming another model belongs to a part that was swapped: the new part gets a fresh line.
    if (line.model && part.spec.model && normalizeModel(line.model) !== normalizeModel(part.spec.model)) continue;
    out.push(line);
  }
  for (const kind of EQUIPMENT_LINE_KINDS) {
    const part = pairing[SLOT_OF[kind]];
    if (!part || part.kept || part.id === undefined || out.some((l) => l.kind === kind)) continue;
    const spec = part.spec as { model?: string; brand?: string };
    out.unshift({
      kind,
      model: spec.model,
      quantity: 1,
      description: `${EQUIPMENT_WORDS[kind]} ${[spec.brand, spec.model].filter(Boolean).join(' ')}`.trim(),
    });
  }
  return out.sort(
    (a, b) =>
      Number(isEquipment(b.kind)) - Number(isEquipment(a.kind)) ||
      EQUIPMENT_LINE_KINDS.indexOf(a.kind as EquipmentKind) - EQUIPMENT_LINE_KINDS.indexOf(b.kind as EquipmentKind),
  );
}

/**
 * Prices the lines for saving: a given price stays (the snapshot); a line without one takes today's best price
 * of its model. `pathOf` names a line in an error as the estimator sent it.
 */
export async function priceLines(
  ctx: AppContext,
  lines: OptionLineInput[],
  pathOf: (line: OptionLineInput) => string,
): Promise<StoredLine[]> {
  const models = lines.filter((l) => l.unitPriceCents === undefined && l.model).map((l) => l.model!);
  const prices = models.length ? await currentPricesBatch(ctx, models) : new Map();
  const problems: { path: string; message: string }[] = [];
  const stored = lines.map((line): StoredLine => {
    const base = {
      kind: line.kind,
      description:
        line.description?.trim() ||
        [KIND_WORDS[line.kind] ?? EQUIPMENT_WORDS[line.kind as EquipmentKind], line.model].filter(Boolean).join(' '),
      model: line.model,
      quantity: line.quantity,
      taxable: line.taxable ?? line.kind !== 'fee',
    };
    if (line.unitPriceCents !== undefined) {
      const fromList = line.priceSource === 'price-list';
      return {
        ...base,
        unitPriceCents: line.unitPriceCents,
        priceSource: fromList ? 'price-list' : 'typed',
        distributor: fromList ? line.distributor : undefined,
        effectiveFrom: fromList ? line.effectiveFrom : undefined,
      };
    }
    const best = line.model ? pickBestPrice(prices.get(normalizeModel(line.model))) : undefined;
    if (!best) {
      problems.push({
        path: `${pathOf(line)}.unitPriceCents`,
        message: line.model ? `no current price for ${line.model}: type a price` : 'type a price (or name a model on a price list)',
      });
      return { ...base, unitPriceCents: 0, priceSource: 'typed' };
    }
    return {
      ...base,
      unitPriceCents: best.priceCents,
      priceSource: 'price-list',
      distributor: best.distributor,
      effectiveFrom: best.effectiveFrom,
    };
  });
  if (problems.length) throw new AppError('validation-failed', 'Some lines have no price.', 422, problems);
  return stored.map(dropUndefined);
}

function dropUndefined<T extends object>(o: T): T {
  return Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as T;
}

/** A stored line as the estimator would send it back (keeps its snapshot). */
export function toInputLine(line: StoredLine): OptionLineInput {
  return { ...line };
}

/** The view of the saved lines: extended amounts and today's best price beside the snapshot. */
export async function viewLines(ctx: AppContext, lines: StoredLine[]): Promise<OptionLine[]> {
  const models = lines.filter((l) => l.model).map((l) => l.model!);
  const prices = models.length ? await currentPricesBatch(ctx, models) : new Map();
  return lines.map((line) => {
    const best = line.model ? (pickBestPrice(prices.get(normalizeModel(line.model))) ?? null) : undefined;
    const differs = line.priceSource === 'price-list' && (best === null || best === undefined || best.priceCents !== line.unitPriceCents);
    return {
      ...line,
      extendedCents: lineExtendedCents(line.quantity, line.unitPriceCents),
      currentPriceDiffers: differs,
      ...(best !== undefined ? { currentPrice: best } : {}),
    };
  });
}
