import { valueLabel } from './value-label';

/** Raw codes the schemas and the engine use, in the words a tech reads (any key). */
const CODE_WORDS: Record<string, string> = {
  // Where the indoor unit sits and which way the air goes.
  attic: 'Attic',
  'above-ceiling': 'Above a ceiling',
  closet: 'Closet',
  'utility-room': 'Utility room',
  basement: 'Basement',
  garage: 'Garage',
  crawlspace: 'Crawlspace',
  upflow: 'Upflow',
  downflow: 'Downflow',
  horizontal: 'Horizontal',
  'horizontal-left': 'Horizontal, air moving left',
  'horizontal-right': 'Horizontal, air moving right',
  'multi-position': 'Multi-position',
  // Kinds of equipment and metering.
  ac: 'Air conditioner',
  'heat-pump': 'Heat pump',
  'air-handler': 'Air handler',
  furnace: 'Furnace',
  txv: 'TXV',
  eev: 'EEV',
  piston: 'Piston',
  none: 'None',
  any: 'Any',
  'bi-flow': 'Bi-flow',
  'one-way': 'One-way',
  copper: 'Copper',
  aluminum: 'Aluminum',
  'new-system': 'New system',
  'component-replacement': 'Replacing a part',
  // Efficiency classes and DOE regions (10 CFR 430.32(c)).
  'split-ac': 'Split air conditioner',
  'split-heat-pump': 'Split heat pump',
  'single-package-ac': 'Packaged air conditioner',
  'single-package-heat-pump': 'Packaged heat pump',
  north: 'North',
  southeast: 'Southeast',
  southwest: 'Southwest',
  'under-45k': 'Under 45,000 Btu/h',
  '45k-and-over': '45,000 Btu/h and over',
};

/** A schema code as the words shown for it ("above-ceiling" → "Above a ceiling"); unknown codes come back as given. */
export function codeWords(code: string): string {
  return CODE_WORDS[code] ?? code;
}

/** Codes whose meaning depends on the key they sit under. */
const KEYED_WORDS: Record<string, Record<string, string>> = {
  limitSource: { unit: 'The outdoor unit’s instructions', default: 'The shop’s default' },
  source: { kit: 'Field-installed kit', coil: 'Fitted in the coil' },
  meteringSource: { kit: 'Field-installed kit', coil: 'Fitted in the coil' },
  method: { unit: 'The outdoor unit’s charge per foot', 'unit-scaled': 'The outdoor unit’s charge per foot, scaled to the tube size', 'tube-content': 'The liquid line’s refrigerant content' },
  dateBasis: { installation: 'Install date', manufacture: 'Manufacture date' },
};

/** Keys that hold internal ids: kept off the screen except on the "details for support" line. */
export function isInternalKey(key: string): boolean {
  return /ruleids?$/i.test(key) || key === 'missing';
}

/** A finding's or spec's value in plain words: codes mapped to words, lists ("a;b") joined, yes/no for booleans; null when empty. */
export function valueWords(key: string, value: unknown): string | null {
  if (value === null || value === undefined || value === '') return null;
  if (typeof value === 'boolean') return value ? 'Yes' : 'No';
  if (typeof value === 'number') return String(value);
  if (Array.isArray(value)) return value.map((v) => valueWords(key, v)).filter(Boolean).join(', ') || null;
  const text = String(value);
  const word = (code: string) => KEYED_WORDS[key]?.[code] ?? CODE_WORDS[code] ?? code;
  return text.includes(';') ? text.split(';').map((t) => word(t.trim())).join(', ') : word(text);
}

/** A record of figures (e.g. the regional minimum) as "Label value" pairs, ids and codes in words. */
export function figuresWords(record: Record<string, unknown>, skip: readonly string[] = []): string {
  return Object.entries(record)
    .filter(([k, v]) => !skip.includes(k) && !isInternalKey(k) && v !== undefined && v !== null && typeof v !== 'object')
    .map(([k, v]) => `${valueLabel(k)}: ${valueWords(k, v)}`)
    .join(' · ');
}
