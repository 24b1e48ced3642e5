// Writes the demo catalog (catalog/demo/*.csv) and the import templates (catalog/templates/*.csv).
// Deterministic: a seeded PRNG, so running it again gives the same files. Every brand, model and
// company here is invented. Values are plausible for the trade, not taken from any product.
import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';

const root = path.resolve(import.meta.dirname, '..');
const demoDir = path.join(root, 'catalog', 'demo');
const templateDir = path.join(root, 'catalog', 'templates');
mkdirSync(demoDir, { recursive: true });
mkdirSync(templateDir, { recursive: true });

// mulberry32: small, seeded, good enough for demo data.
let seed = 0x7a4d3e11;
function rand() {
  seed |= 0;
  seed = (seed + 0x6d2b79f5) | 0;
  let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
  t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
  return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
}
const between = (a, b, digits = 1) => Number((a + rand() * (b - a)).toFixed(digits));
const pick = (list) => list[Math.floor(rand() * list.length)];

function toCsv(header, rows) {
  const cell = (v) => {
    if (v === undefined || v === null) return '';
    const s = Array.isArray(v) ? v.join(';') : typeof v === 'boolean' ? (v ? 'yes' : 'no') : String(v);
    return /[",\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
  };
  return [header.join(','), ...rows.map((r) => header.map((h) => cell(r[h])).join(','))].join('\n') + '\n';
}
const write = (dir, name, text) => writeFileSync(path.join(dir, name), text);

const BREAKERS = [15, 20, 25, 30, 35, 40, 45, 50, 60, 70, 80];
const mocpFor = (mca, factor = 1.7) => BREAKERS.find((b) => b >= mca * factor) ?? 90;
const REF_CODE = { 'R-410A': '41', 'R-32': '32', 'R-454B': '4B', 'R-22': '22' };
// Suction line by size, common practice (no source): 3/4 to 2.5 tons, 7/8 to 3.5, 1-1/8 above.
const suctionFor = (tons) => (tons <= 2.5 ? 0.75 : tons <= 3.5 ? 0.875 : 1.125);

// ---- outdoor units ----
const OUTDOOR_HEADER = ['model', 'brand', 'description', 'system_type', 'refrigerant', 'nominal_tons', 'cooling_btuh', 'seer2', 'eer2', 'hspf2',
  'metering_required', 'piston_size_in', 'liquid_line_od_in', 'suction_line_od_in', 'allowed_liquid_od_in', 'allowed_suction_od_in',
  'max_line_length_ft', 'max_lift_ft', 'factory_charge_oz', 'charged_line_length_ft', 'charge_per_ft_oz', 'mca_amps', 'mocp_amps',
  'voltage', 'phase', 'start_assist', 'manufacture_date', 'target_subcooling_f'];
const TONS = [1.5, 2, 2.5, 3, 3.5, 4, 5];
const PISTONS = { 1.5: 0.055, 2: 0.063, 2.5: 0.068, 3: 0.074, 3.5: 0.08, 4: 0.086, 5: 0.093 };
const outdoor = [];
function addOutdoor(brand, prefix, systemType, refrigerant, tons, legacy = false) {
  const hp = systemType === 'heat-pump';
  const mca = Number((tons * 5.6 + 2 + rand() * 1.5).toFixed(1));
  const chargePerTon = refrigerant === 'R-32' ? 30 : 38;
  const size = String(Math.round(tons * 12)).padStart(3, '0');
  const suction = suctionFor(tons);
  outdoor.push({
    model: `${prefix}${hp ? 'H' : 'A'}${size}-${REF_CODE[refrigerant]}${legacy ? 'L' : ''}`,
    brand,
    description: `${tons}-ton ${hp ? 'heat pump' : 'air conditioner'}, ${refrigerant}${legacy ? ' (legacy, field replacement data)' : ''}`,
    system_type: systemType,
    refrigerant,
    nominal_tons: tons,
    cooling_btuh: Math.round((tons * 12000 * between(0.96, 1.0, 3)) / 100) * 100,
    seer2: legacy ? between(10.5, 12, 1) : between(13.4, 17.5, 1),
    eer2: legacy ? between(9, 10, 1) : between(10.6, 12.8, 1),
    hspf2: hp ? (legacy ? between(6.1, 6.6, 1) : between(7.2, 8.6, 1)) : undefined,
    metering_required: hp ? 'txv' : legacy ? 'any' : pick(['txv', 'txv', 'any']),
    piston_size_in: !hp ? PISTONS[tons] : undefined,
    liquid_line_od_in: 0.375,
    suction_line_od_in: suction,
    allowed_liquid_od_in: [0.25, 0.375],
    allowed_suction_od_in: suction === 0.75 ? [0.625, 0.75, 0.875] : suction === 0.875 ? [0.75, 0.875, 1.125] : [0.875, 1.125],
    max_line_length_ft: pick([75, 100, 150]),
    max_lift_ft: 50,
    factory_charge_oz: Math.round(tons * chargePerTon + between(5, 20, 0)),
    charged_line_length_ft: 15,
    charge_per_ft_oz: refrigerant === 'R-32' ? 0.5 : 0.6,
    mca_amps: mca,
    mocp_amps: mocpFor(mca),
    voltage: '208/230',
    phase: 1,
    start_assist: legacy || tons >= 4 ? rand() < 0.5 : false,
    manufacture_date: legacy ? `200${Math.floor(between(5, 9, 0))}-0${Math.floor(between(1, 9, 0))}-15` : `2025-0${Math.floor(between(1, 9, 0))}-01`,
    target_subcooling_f: hp || rand() < 0.8 ? pick([9, 10, 10, 11]) : undefined,
  });
}
const BRANDS = [
  { brand: 'Northvale', prefix: 'NV' },
  { brand: 'Corrin Air', prefix: 'CR' },
];
for (const refrigerant of ['R-410A', 'R-32', 'R-454B'])
  for (const systemType of ['ac', 'heat-pump'])
    for (const tons of TONS) addOutdoor(BRANDS[systemType === 'ac' ? 0 : 1].brand, BRANDS[systemType === 'ac' ? 0 : 1].prefix, systemType, refrigerant, tons);
for (const [systemType, tons] of [['ac', 2], ['ac', 3], ['ac', 4], ['heat-pump', 2.5], ['heat-pump', 3.5]]) addOutdoor('Old Meridian', 'OM', systemType, 'R-22', tons, true);

// ---- indoor coils ----
const COIL_HEADER = ['model', 'brand', 'description', 'configuration', 'cased', 'material', 'min_tons', 'max_tons', 'refrigerants', 'metering_type',
  'metering_refrigerant', 'metering_bidirectional', 'metering_bleed', 'piston_size_in', 'a2l_listed', 'leak_sensor', 'width_in',
  'liquid_conn_od_in', 'suction_conn_od_in', 'manufacture_date'];
const BANDS = [
  { code: 'A', min: 1.5, max: 2, width: 14.5 },
  { code: 'B', min: 2, max: 3, width: 17.5 },
  { code: 'C', min: 3, max: 4, width: 21 },
  { code: 'D', min: 4, max: 5, width: 24.5 },
];
const COIL_VARIANTS = [
  { code: 'T41', refrigerants: ['R-410A'], metering: 'txv', mref: 'R-410A', cased: true, material: 'aluminum' },
  { code: 'T41U', refrigerants: ['R-410A'], metering: 'txv', mref: 'R-410A', cased: false, material: 'aluminum' },
  { code: 'T41B', refrigerants: ['R-410A'], metering: 'txv', mref: 'R-410A', cased: true, material: 'copper', bidir: true },
  { code: 'T22', refrigerants: ['R-22'], metering: 'txv', mref: 'R-22', cased: true, material: 'copper', legacy: true },
  { code: 'T22U', refrigerants: ['R-22'], metering: 'txv', mref: 'R-22', cased: false, material: 'copper', legacy: true },
  { code: 'P41', refrigerants: ['R-410A', 'R-22'], metering: 'piston', cased: true, material: 'copper', piston: true },
  { code: 'T4B', refrigerants: ['R-454B'], metering: 'txv', mref: 'R-454B', cased: true, material: 'aluminum', a2l: true, sensor: true, bidir: true },
  { code: 'T4BU', refrigerants: ['R-454B'], metering: 'txv', mref: 'R-454B', cased: false, material: 'aluminum', a2l: true, sensor: false },
  { code: 'T32', refrigerants: ['R-32'], metering: 'txv', mref: 'R-32', cased: true, material: 'aluminum', a2l: true, sensor: true, bidir: true },
  { code: 'E3', refrigerants: ['R-410A', 'R-32', 'R-454B'], metering: 'eev', cased: true, material: 'aluminum', a2l: true, sensor: true, bidir: true },
  { code: 'N2', refrigerants: ['R-410A', 'R-454B'], metering: 'none', cased: false, material: 'aluminum', a2l: true, sensor: true },
];
const coils = [];
for (const band of BANDS)
  for (const v of COIL_VARIANTS)
    for (const configuration of ['multi-position', 'horizontal']) {
      const mid = (band.min + band.max) / 2;
      coils.push({
        model: `BH-${v.code}${band.code}${configuration === 'horizontal' ? 'H' : 'M'}`,
        brand: 'Bellhaven',
        description: `${v.cased ? 'Cased' : 'Uncased'} ${v.material} ${configuration} coil, ${band.min}-${band.max} tons, ${v.metering === 'none' ? 'no metering device (field kit)' : v.metering.toUpperCase()}${v.mref ? ` for ${v.mref}` : ''}${v.sensor ? ', leak sensor' : ''}`,
        configuration,
        cased: v.cased,
        material: v.material,
        min_tons: band.min,
        max_tons: band.max,
        refrigerants: v.refrigerants,
        metering_type: v.metering,
        metering_refrigerant: v.mref,
        metering_bidirectional: v.metering === 'none' ? undefined : Boolean(v.bidir || v.piston),
        metering_bleed: v.metering === 'txv' ? rand() < 0.3 : undefined,
        piston_size_in: v.piston ? PISTONS[mid] ?? PISTONS[band.max] : undefined,
        a2l_listed: Boolean(v.a2l),
        leak_sensor: Boolean(v.sensor),
        width_in: band.width,
        liquid_conn_od_in: 0.375,
        suction_conn_od_in: suctionFor(band.max),
        manufacture_date: v.legacy ? '2009-04-01' : '2025-02-01',
      });
    }

// ---- air handlers and furnaces ----
const AH_HEADER = ['model', 'brand', 'description', 'kind', 'min_tons', 'max_tons', 'airflow_cfm', 'width_in', 'refrigerants', 'a2l_listed',
  'heat_kit_kw', 'mca_amps', 'mocp_amps', 'voltage'];
const airHandlers = [];
const AH_SETS = [
  { code: '41', refrigerants: ['R-410A'], a2l: false },
  { code: 'A2', refrigerants: ['R-32', 'R-454B'], a2l: true },
  { code: 'MX', refrigerants: ['R-410A', 'R-32', 'R-454B'], a2l: true },
];
for (const band of BANDS)
  for (const set of AH_SETS) {
    const kw = band.max <= 2 ? 5 : band.max <= 3 ? 8 : 10;
    const mca = Number(((kw * 1000) / 240 * 1.25 + 4).toFixed(1));
    airHandlers.push({
      model: `CR-AH${set.code}${band.code}`,
      brand: 'Corrin Air',
      description: `Multi-position air handler ${band.min}-${band.max} tons, ${kw} kW heat kit, for ${set.refrigerants.join(' / ')}`,
      kind: 'air-handler',
      min_tons: band.min,
      max_tons: band.max,
      airflow_cfm: band.max * 400,
      width_in: band.width,
      refrigerants: set.refrigerants,
      a2l_listed: set.a2l,
      heat_kit_kw: kw,
      mca_amps: mca,
      mocp_amps: mocpFor(mca, 1.1),
      voltage: '208/230',
    });
  }
for (const band of BANDS)
  for (const [suffix, a2l] of [['S', false], ['X', true]]) {
    airHandlers.push({
      model: `OM-GF${band.code}${suffix}-${band.max * 20}`,
      brand: 'Old Meridian',
      description: `Gas furnace, ${band.width}" cabinet, blower for ${band.min}-${band.max} tons${a2l ? ', accepts a leak-sensor signal' : ''}`,
      kind: 'furnace',
      min_tons: band.min,
      max_tons: band.max,
      airflow_cfm: band.max * 400,
      width_in: band.width,
      a2l_listed: a2l,
      mca_amps: between(9, 13, 1),
      mocp_amps: 15,
      voltage: '115',
    });
  }

// ---- metering kits ----
const KIT_HEADER = ['model', 'brand', 'description', 'type', 'refrigerant', 'min_tons', 'max_tons', 'bidirectional', 'bleed', 'piston_size_in'];
const kits = [];
for (const refrigerant of ['R-410A', 'R-32', 'R-454B', 'R-22'])
  for (const [min, max] of [[1.5, 3], [3, 5]])
    kits.push({
      model: `BH-TXK-${REF_CODE[refrigerant]}-${max * 12}`,
      brand: 'Bellhaven',
      description: `Field TXV kit for ${refrigerant}, ${min}-${max} tons${refrigerant === 'R-22' ? ' (legacy service part)' : ''}`,
      type: 'txv',
      refrigerant,
      min_tons: min,
      max_tons: max,
      bidirectional: refrigerant !== 'R-22',
      bleed: false,
    });
for (const tons of [2, 3, 4, 5])
  kits.push({ model: `BH-PK-${Math.round(PISTONS[tons] * 1000)}`, brand: 'Bellhaven', description: `Piston kit ${PISTONS[tons]} in, about ${tons} tons, R-410A`, type: 'piston', refrigerant: 'R-410A', min_tons: tons, max_tons: tons, bidirectional: true, piston_size_in: PISTONS[tons] });
kits.push({ model: 'BH-EVK-4B', brand: 'Bellhaven', description: 'Electronic expansion valve kit for R-454B, 1.5-5 tons', type: 'eev', refrigerant: 'R-454B', min_tons: 1.5, max_tons: 5, bidirectional: true });

// ---- rated combinations ----
const RC_HEADER = ['outdoor_model', 'indoor_model', 'air_handler_model', 'cooling_btuh', 'seer2', 'eer2', 'hspf2', 'reference'];
const rated = [];
let certificate = 240100;
for (const unit of outdoor) {
  const fits = coils.filter((c) => c.refrigerants.includes(unit.refrigerant) && c.min_tons <= unit.nominal_tons && unit.nominal_tons <= c.max_tons
    && (c.metering_type !== 'txv' || c.metering_refrigerant === unit.refrigerant) && c.metering_type !== 'none'
    && (unit.system_type !== 'heat-pump' || c.metering_bidirectional));
  const furnaces = airHandlers.filter((a) => a.kind === 'furnace' && a.min_tons <= unit.nominal_tons && unit.nominal_tons <= a.max_tons && (a.a2l_listed || ['R-410A', 'R-22'].includes(unit.refrigerant)));
  for (const coil of fits.slice(0, 4)) {
    const furnace = rand() < 0.5 ? furnaces[0] : undefined;
    rated.push({
      outdoor_model: unit.model,
      indoor_model: coil.model,
      air_handler_model: furnace?.model,
      cooling_btuh: Math.round((unit.cooling_btuh * between(0.95, 1.02, 3)) / 100) * 100,
      seer2: Number((unit.seer2 + between(-0.6, 0.9, 1)).toFixed(1)),
      eer2: Number((unit.eer2 + between(-0.4, 0.5, 1)).toFixed(1)),
      hspf2: unit.hspf2 ? Number((unit.hspf2 + between(-0.2, 0.3, 1)).toFixed(1)) : undefined,
      reference: `TR-${certificate++}`,
    });
  }
}

// ---- prices: two invented distributors, different headers ----
const priced = [...outdoor, ...coils, ...airHandlers, ...kits];
const basePrice = (item) =>
  item.nominal_tons ? 1400 + item.nominal_tons * 520 + (item.system_type === 'heat-pump' ? 600 : 0)
    : item.metering_type ? 380 + item.max_tons * 120 + (item.cased ? 140 : 0) + (item.leak_sensor ? 90 : 0)
      : item.kind ? 900 + (item.max_tons ?? 3) * 210 + (item.heat_kit_kw ?? 0) * 30
        : 95 + (item.type === 'eev' ? 260 : item.type === 'txv' ? 110 : 0);
const harbor = [];
const ridge = [];
for (const item of priced) {
  const base = basePrice(item);
  if (rand() < 0.85) harbor.push({ model: item.model, price: (base * between(0.95, 1.08, 3)).toFixed(2), effective_from: '2025-01-06', description: item.description });
  if (rand() < 0.7) ridge.push({ 'Item Code': item.model, 'Net Each': `$${(base * between(0.93, 1.1, 3)).toLocaleString('en-US', { minimumFractionDigits: 2, maximumFractionDigits: 2 })}`, Starts: '2025-02-03', 'Item Description': item.description });
}
// A scheduled increase (future-dated: not current until then) and a part the catalog does not list.
for (const row of harbor.slice(0, 5)) harbor.push({ ...row, price: (Number(row.price) * 1.06).toFixed(2), effective_from: '2031-01-05' });
harbor.push({ model: 'HS-MISC-TAPE', price: '12.40', effective_from: '2025-01-06', description: 'Foil tape, 2 in (not a catalog item)' });

write(demoDir, 'outdoor-units.csv', toCsv(OUTDOOR_HEADER, outdoor));
write(demoDir, 'indoor-coils.csv', toCsv(COIL_HEADER, coils));
write(demoDir, 'air-handlers.csv', toCsv(AH_HEADER, airHandlers));
write(demoDir, 'metering-devices.csv', toCsv(KIT_HEADER, kits));
write(demoDir, 'rated-combinations.csv', toCsv(RC_HEADER, rated));
write(demoDir, 'prices-harbor-supply.csv', toCsv(['model', 'price', 'effective_from', 'description'], harbor));
// The second distributor's export: its own headers, "$1,234.50" prices, a UTF-8 BOM and Windows line endings.
write(demoDir, 'prices-ridgeline-parts.csv', '\uFEFF' + toCsv(['Item Code', 'Net Each', 'Starts', 'Item Description'], ridge).replace(/\n/g, '\r\n'));

// Templates: the header and two example rows per kind.
write(templateDir, 'outdoor-units.csv', toCsv(OUTDOOR_HEADER, outdoor.filter((u) => u.nominal_tons === 3 && u.refrigerant === 'R-454B')));
write(templateDir, 'indoor-coils.csv', toCsv(COIL_HEADER, [coils[0], coils.find((c) => c.model.startsWith('BH-T4BB'))]));
write(templateDir, 'air-handlers.csv', toCsv(AH_HEADER, [airHandlers[4], airHandlers.find((a) => a.kind === 'furnace')]));
write(templateDir, 'metering-devices.csv', toCsv(KIT_HEADER, kits.slice(4, 6)));
write(templateDir, 'rated-combinations.csv', toCsv(RC_HEADER, rated.slice(0, 2)));
write(templateDir, 'prices.csv', toCsv(['model', 'price', 'effective_from', 'description', 'currency'], [
  { model: outdoor[3].model, price: '2969.00', effective_from: '2025-01-06', description: outdoor[3].description, currency: 'USD' },
  { model: coils[0].model, price: '$1,234.50', effective_from: '2025-03-01', description: coils[0].description, currency: 'USD' },
]));

console.log(`outdoor ${outdoor.length}, coils ${coils.length}, air handlers ${airHandlers.length}, kits ${kits.length}, rated ${rated.length}, prices ${harbor.length} + ${ridge.length}`);
