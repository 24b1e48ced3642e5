/**
 * A finding's value key in plain words with its unit: "mcaAmps" → "MCA (A)",
 * "lineLengthFt" → "Line length (ft)". Keys carry their unit as a suffix (DESIGN.md §2).
 */
const UNITS: [suffix: string, unit: string][] = [
  ['SqFt', 'sq ft'],
  ['Amps', 'A'],
  ['Tons', 'tons'],
  ['Btuh', 'Btu/h'],
  ['Cfm', 'CFM'],
  ['Psig', 'psig'],
  ['Cents', '¢'],
  ['Kw', 'kW'],
  ['Kg', 'kg'],
  ['Oz', 'oz'],
  ['Ft', 'ft'],
  ['In', 'in'],
  ['V', 'V'],
  ['F', '°F'],
  ['C', '°C'],
];
const ACRONYMS: Record<string, string> = {
  mca: 'MCA',
  mocp: 'MOCP',
  seer2: 'SEER2',
  eer2: 'EER2',
  hspf2: 'HSPF2',
  awg: 'AWG',
  cfm: 'CFM',
  lfl: 'LFL',
  a2l: 'A2L',
  txv: 'TXV',
  ocpd: 'OCPD',
  od: 'OD',
  id: 'id',
};

export function valueLabel(key: string): string {
  let base = key;
  let unit = '';
  for (const [suffix, u] of UNITS) {
    // Only a suffix after a lower-case letter or digit is a unit ("liftFt", not "Ft" alone).
    if (key.length > suffix.length && key.endsWith(suffix) && /[a-z0-9]/.test(key[key.length - suffix.length - 1])) {
      base = key.slice(0, -suffix.length);
      unit = u;
      break;
    }
  }
  const words = base
    .replace(/([a-z0-9])([A-Z])/g, '$1 $2')
    .split(' ')
    .map((w) => ACRONYMS[w.toLowerCase()] ?? w.toLowerCase());
  const text = words.join(' ');
  const sentence = text.charAt(0).toUpperCase() + text.slice(1);
  return unit ? `${sentence} (${unit})` : sentence;
}
