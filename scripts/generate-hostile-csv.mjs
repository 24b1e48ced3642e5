// Writes the hostile CSV corpus to tests/fixtures/hostile-csv/ (files + manifest.json). The files are
// committed; run `node scripts/generate-hostile-csv.mjs` again only to change the corpus. Each case
// states what the importer must answer when the file is committed directly (dryRun=false):
//   { status: 201, inserted }                          every row valid, all written
//   { status: 422, code: 'rows-rejected', rejectedRows | rejected }   nothing written, each bad line named
//   { status: 422 | 413 | 415, code }                  the file refused as a whole
// Expected values are worked out by hand from the file formats (see each case's note), never by running the importer.
// Over-limit files (over 20 MB, over 200,000 rows) are built at test time instead of committed.
import { mkdirSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { Buffer } from 'node:buffer';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const dir = path.join(root, 'tests/fixtures/hostile-csv');

const cases = [];
/** Adds a case: `body(m)` builds the file from m(i), a model name unique to this case. */
function add(slug, kind, body, expect, note) {
  const n = String(cases.length + 1).padStart(3, '0');
  const m = (i) => `H${n}-${i}`;
  const content = body(m);
  cases.push({ file: `${n}-${slug}.csv`, kind, ...(kind === 'prices' ? { distributor: `Hostile ${n}` } : {}), expect, note, content });
}
const text = (lines) => Buffer.from(lines.join('\n') + '\n', 'utf8');
const ok = (inserted) => ({ status: 201, inserted });
const rejected = (rows) => ({ status: 422, code: 'rows-rejected', rejectedRows: rows });
const refused = (status, code) => ({ status, code });
const P = 'prices';
const O = 'outdoor-units';
const OUT_HEADER = 'model,system_type,refrigerant,nominal_tons,phase,manufacture_date';
const outRow = (model, over = {}) => {
  const v = { system_type: 'ac', refrigerant: 'R-454B', nominal_tons: '3', phase: '1', manufacture_date: '2024-05-01', ...over };
  return [model, v.system_type, v.refrigerant, v.nominal_tons, v.phase, v.manufacture_date].map((c) => (/[",\s]/.test(c) ? `"${c.replace(/"/g, '""')}"` : c)).join(',');
};

// Encodings
add('enc-utf8', P, (m) => text(['model,price,description', `${m(1)},12.50,plain`, `${m(2)},13.00,plain`]), ok(2), 'plain UTF-8');
add('enc-utf8-bom', P, (m) => Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), text(['model,price', `${m(1)},12.50`, `${m(2)},13.00`])]), ok(2), 'UTF-8 with BOM');
add('enc-utf16le-bom-tabs', P, (m) => Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(`model\tprice\n${m(1)}\t12.50\n${m(2)}\t13.00\n`, 'utf16le')]), ok(2), 'spreadsheet "Unicode text": UTF-16LE with BOM, tab-separated');
add('enc-utf16be-bom', P, (m) => Buffer.concat([Buffer.from([0xfe, 0xff]), Buffer.from(`model,price\n${m(1)},12.50\n`, 'utf16le').swap16()]), ok(1), 'UTF-16BE with BOM');
add('enc-latin1', P, (m) => Buffer.from(`model,price,description\n${m(1)},12.50,Caf\xe9 r\xe9sum\xe9 \xfcber\n`, 'latin1'), ok(1), 'Latin-1 letters: not UTF-8, read as Windows-1252');
add('enc-cp1252-quotes', P, (m) => Buffer.from(`model,price,description\n${m(1)},12.50,\x93Quiet\x94 unit \x96 5\x80 off\n`, 'latin1'), ok(1), 'Windows-1252 curly quotes, dash and euro sign (0x80-0x9F)');
add('enc-utf16le-no-bom', P, (m) => Buffer.from(`model,price\n${m(1)},12.50\n`, 'utf16le'), refused(415, 'not-csv'), 'UTF-16 without BOM: NUL bytes every other byte');
add('enc-invalid-utf8', P, (m) => Buffer.concat([Buffer.from(`model,price,description\n${m(1)},12.50,bad `), Buffer.from([0xc3, 0x28]), Buffer.from(' seq\n')]), ok(1), 'an invalid UTF-8 sequence: read as Windows-1252');
add('enc-utf8-emoji', P, (m) => text(['model,price,description', `${m(1)},12.50,Quiet ❄️ unit — 𝟘 ñ`]), ok(1), 'astral and combining characters');
add('enc-utf32le-bom', P, (m) => Buffer.concat([Buffer.from([0xff, 0xfe, 0, 0]), Buffer.from([...`model,price\n${m(1)},1\n`].flatMap((c) => [c.charCodeAt(0), 0, 0, 0]))]), refused(415, 'not-csv'), 'UTF-32: NULs once read as UTF-16');

// Delimiters
add('delim-semicolon', P, (m) => text(['model;price', `${m(1)};12.50`, `${m(2)};13.00`]), ok(2), 'semicolon-separated');
add('delim-tab', P, (m) => text(['model\tprice', `${m(1)}\t12.50`, `${m(2)}\t13.00`]), ok(2), 'tab-separated');
add('delim-semicolon-decimal-comma', P, (m) => text(['model;price', `${m(1)};12,50`, `${m(2)};1.234,50`]), ok(2), 'semicolons with decimal commas (de-DE export)');
add('delim-pipe', P, (m) => text(['model|price', `${m(1)}|12.50`]), refused(422, 'no-usable-header'), 'pipes: the header is one unknown column');
add('delim-mixed', P, (m) => text(['model,price', `${m(1)};12.50`, `${m(2)},13.00`]), rejected([2]), 'header by commas, one row by semicolons: that row has no price');

// Quoting
add('quote-unclosed-last', P, (m) => text(['model,price', `${m(1)},12.50`, `${m(2)},"13.50`]), rejected([3]), 'the last cell opens a quote it never closes');
add('quote-unclosed-swallows', P, (m) => text(['model,price,description', `${m(1)},12.50,"oops`, `${m(2)},13.50,fine`, `${m(3)},14.00,ok`]), rejected([2]), 'an unclosed quote swallows every row after it: the row is refused, not stored with the others as its description');
add('quote-stray-in-unquoted', P, (m) => text(['model,price,description', `${m(1)},12.50,he said "hi"`]), ok(1), 'quotes inside an unquoted cell are plain characters (RFC 4180 leniency)');
add('quote-text-after-closing', P, (m) => text(['model,price,description', `${m(1)},12.50,"abc"def`, `${m(2)},13.00,x`]), rejected([2]), 'text after a closing quote (malformed), the rest read into it');
add('quote-escaped', P, () => text(['model,price', '"QX ""big"" 1",12.50']), ok(1), 'doubled quotes inside a quoted cell (RFC 4180 §2.7)');
add('quote-multiline-cell', P, (m) => text(['model,price,description', `${m(1)},12.50,"line one`, `line two"`, `${m(2)},abc,x`]), rejected([4]), 'a quoted cell spanning two lines: the next row is line 4');
add('crlf-endings', P, (m) => Buffer.from(`model,price\r\n${m(1)},12.50\r\n${m(2)},abc\r\n`), rejected([3]), 'CRLF line ends');
add('cr-only-endings', P, (m) => Buffer.from(`model,price\r${m(1)},12.50\r${m(2)},abc\r`), rejected([3]), 'lone CR line ends (old spreadsheet exports)');
add('blank-lines-between', P, (m) => text(['model,price', '', `${m(1)},1`, '', '', `${m(2)},abc`]), rejected([6]), 'blank lines are skipped but counted in line numbers');
add('trailing-delimiters', P, (m) => text(['model,price', `${m(1)},12.50,,,`]), ok(1), 'empty trailing cells are ignored');
add('extra-cells', P, (m) => text(['model,price,description', `${m(1)},12.50,desc,EXTRA`]), rejected([2]), 'more cells than the header names');
add('fewer-cells', P, (m) => text(['model,price', m(1)]), rejected([2]), 'the price cell is missing');

// Huge fields and rows
add('huge-price-cell', P, (m) => text(['model,price', `${m(1)},${'9'.repeat(19000)}`]), rejected([2]), 'a 19 KB price: not a price, value echoed cut short');
add('huge-description', P, (m) => text(['model,price,description', `${m(1)},12.50,${'d'.repeat(100000)}`]), rejected([2]), 'a 100 KB description: over 300 characters');
add('huge-row-5000-cells', P, (m) => text(['model,price', `${m(1)},12.50,${Array.from({ length: 5000 }, (_, i) => `c${i}`).join(',')}`]), rejected([2]), '5,000 cells in one row');
add('model-81-chars', P, () => text(['model,price', `${'M'.repeat(81)},12.50`]), rejected([2]), 'model longer than 80 characters');
add('model-80-chars', P, () => text(['model,price', `${'N'.repeat(79)}8,12.50`]), ok(1), 'model of exactly 80 characters');
add('huge-header-cell', P, (m) => text([`model,price,${'h'.repeat(19000)}`, `${m(1)},12.50,x`]), ok(1), 'a 19 KB unknown header: ignored column');
add('many-valid-rows', P, (m) => text(['model,price', ...Array.from({ length: 5000 }, (_, i) => `${m(i)},${(i % 900) + 1}.25`)]), ok(5000), '5,000 valid rows');
add('many-bad-rows', P, (m) => text(['model,price', ...Array.from({ length: 1000 }, (_, i) => `${m(i)},${'x'.repeat(300)}`)]), { status: 422, code: 'rows-rejected', rejected: 1000 }, '1,000 bad rows: 500 errors kept, total exact');

// Formulas (CSV injection): models and descriptions are text and kept; prices are not numbers
add('formula-model-equals', P, () => text(['model,price', '"=HYPERLINK(""http://x.invalid"",""y"")",12.50']), ok(1), 'a model starting with = is text (neutralised on export)');
add('formula-model-plus', P, () => text(['model,price', '+QA1,12.50']), ok(1), 'a model starting with +');
add('formula-model-minus', P, () => text(['model,price', '-QA2,12.50']), ok(1), 'a model starting with -');
add('formula-model-at', P, () => text(['model,price', '@QA3(A1),12.50']), ok(1), 'a model starting with @');
add('formula-price-equals', P, (m) => text(['model,price', `${m(1)},=1+2`]), rejected([2]), 'a formula is not a price');
add('formula-price-plus', P, (m) => text(['model,price', `${m(1)},+12.50`]), rejected([2]), 'a leading + is not part of a price');
add('formula-price-minus', P, (m) => text(['model,price', `${m(1)},-12.50`]), rejected([2]), 'a negative price');
add('formula-price-at', P, (m) => text(['model,price', `${m(1)},@12`]), rejected([2]), '@ is not part of a price');
add('formula-description-tab-cr', P, (m) => text(['model,price,description', `${m(1)},12.50,"\t=cmd"`, `${m(2)},13.00,"\r=cmd"`]), ok(2), 'tab and CR before a formula in text cells');
add('formula-dde', P, (m) => text(['model,price,description', `${m(1)},12.50,"=cmd|' /C calc'!A0"`]), ok(1), 'a DDE payload in a description is text');

// NULs and control characters
add('nul-in-cell', P, (m) => Buffer.from(`model,price\n${m(1)},12\u000050\n`), refused(415, 'not-csv'), 'a NUL byte');
add('nul-at-end', P, (m) => Buffer.from(`model,price\n${m(1)},12.50\n\u0000`), refused(415, 'not-csv'), 'a trailing NUL byte');
add('nul-only', P, () => Buffer.alloc(64, 0), refused(415, 'not-csv'), 'only NUL bytes');
add('control-chars-many', P, (m) => Buffer.from(`model,price\n${m(1)},12.50\n${'\u0001\u0002\u0003'.repeat(50)}\n`), refused(415, 'not-csv'), 'many control characters');
add('control-char-single', P, (m) => text(['model,price,description', `${m(1)},12.50,a bell \u0007 in a long enough description to stay under one percent of the text`]), ok(1), 'one control character in text: under the 1% share');

// Impossible numbers (equipment): one good row, then the bad one on line 3
for (const [slug, tons] of [
  ['hex', '0x3'], ['exponent', '1e1'], ['infinity', 'Infinity'], ['nan', 'NaN'], ['inner-space', ' 3 4'], ['decimal-comma', '2,5'],
  ['negative', '-1'], ['overflow', '1e309'], ['arabic-digit', '٣'], ['two-points', '3.0.0'], ['binary', '0b11'], ['word', 'three'], ['too-large', '26'],
]) {
  add(`tons-${slug}`, O, (m) => text([OUT_HEADER, outRow(m(1)), outRow(m(2), { nominal_tons: tons })]), rejected([3]), `nominal_tons "${tons}" is not a plain number in 0.5-25`);
}
add('tons-valid-forms', O, (m) => text([OUT_HEADER, outRow(m(1), { nominal_tons: '3' }), outRow(m(2), { nominal_tons: ' 2.5 ' }), outRow(m(3), { nominal_tons: '+4' }), outRow(m(4), { nominal_tons: '.5' })]), ok(4), 'plain decimals with sign, padding and no leading zero');
add('phase-hex', O, (m) => text([OUT_HEADER, outRow(m(1)), outRow(m(2), { phase: '0x3' })]), rejected([3]), 'phase "0x3" is not 3');

// Impossible prices
for (const [slug, price, note] of [
  ['exponent', '1e3', 'exponent'], ['hex', '0x10', 'hex'], ['zero', '0', 'zero'], ['over-million', '1000000.01', 'over the 1,000,000.00 cap'],
  ['three-decimals', '12.345', 'three decimals'], ['ambiguous-alone', '"1,234"', 'grouping comma or decimal comma: nothing in the file says'],
  ['euro-sign', '€12', 'a currency sign other than $'], ['parentheses', '(12.50)', 'accounting negative'], ['infinity', 'Infinity', 'a word'],
]) {
  add(`price-${slug}`, P, (m) => text(['model,price', `${m(1)},${price}`]), rejected([2]), note);
}
add('price-ambiguous-resolved', P, (m) => text(['model,price', `${m(1)},"1,234"`, `${m(2)},"2,500.00"`]), ok(2), '"2,500.00" shows the decimal point, so "1,234" is 1,234.00');
add('price-mixed-minority', P, (m) => text(['model,price', `${m(1)},12.50`, `${m(2)},7.25`, `${m(3)},"3,10"`]), rejected([4]), 'two decimal points and one decimal comma: the comma row is refused');
add('price-decimal-comma-only', P, (m) => text(['model,price', `${m(1)},"12,50"`]), ok(1), 'a decimal comma decides the file');
add('price-space-grouped-comma', P, (m) => text(['model,price', `${m(1)}," 1 234,00 "`]), ok(1), 'fr-FR: space grouping and decimal comma');
add('price-swiss', P, (m) => text(['model,price', `${m(1)},1'234.50`]), ok(1), "de-CH: apostrophe grouping");
add('price-currency-forms', P, (m) => text(['model,price', `${m(1)},"$1,234.50"`, `${m(2)},USD 12.00`, `${m(3)},12.00 USD`]), ok(3), 'dollar sign and USD before or after');
add('price-nbsp-grouped', P, (m) => text(['model,price', `${m(1)},"1\u00a0234,50"`]), ok(1), 'no-break space grouping with a decimal comma');
add('price-ambiguous-dot-alone', P, (m) => text(['model,price', `${m(1)},1.234`]), rejected([2]), '1.234: decimal point with three decimals or grouping point');

// Impossible dates
for (const d of ['2025-02-30', '2025-13-45', '2023-02-29', '2025-04-31', '0000-00-00', '2025/01/01', '01-02-2025', '2025-1-1']) {
  add(`date-${d.replace(/\//g, '_')}`, P, (m) => text(['model,price,effective_from', `${m(1)},12.50,${d}`]), rejected([2]), `effective date ${d} is not a real YYYY-MM-DD day`);
}
add('date-leap-day', P, (m) => text(['model,price,effective_from', `${m(1)},12.50,2024-02-29`]), ok(1), '2024 is a leap year (Gregorian rule)');
add('date-padded', P, (m) => text(['model,price,effective_from', `${m(1)},12.50," 2025-01-01 "`]), ok(1), 'spaces around a real date');
add('equipment-date-feb-30', O, (m) => text([OUT_HEADER, outRow(m(1)), outRow(m(2), { manufacture_date: '2025-02-30' })]), rejected([3]), 'manufacture date 2025-02-30');
add('equipment-date-month-13', O, (m) => text([OUT_HEADER, outRow(m(1)), outRow(m(2), { manufacture_date: '2025-13-45' })]), rejected([3]), 'manufacture date 2025-13-45');

// Headers
add('header-duplicate', P, (m) => text(['model,model,price', `${m(1)},${m(2)},12.50`]), ok(1), 'a field named twice: the first column feeds it');
add('header-missing-price', P, (m) => text(['model,description', `${m(1)},x`]), refused(422, 'no-usable-header'), 'no price column');
add('header-only', P, () => text(['model,price']), refused(422, 'empty-file'), 'a header and no rows');
add('empty', P, () => Buffer.alloc(0), refused(422, 'empty-file'), 'zero bytes');
add('whitespace-only', P, () => Buffer.from(' \n\t\n  \r\n'), refused(422, 'empty-file'), 'only blanks');
add('header-blank-cells', P, (m) => text([',model,,price,', `,${m(1)},,12.50,`]), ok(1), 'blank header cells are ignored columns');
add('header-aliases', P, (m) => text(['MODEL NUMBER,Net Price', `${m(1)},12.50`]), ok(1), 'known aliases in another case');
add('header-after-blank-line', P, (m) => text(['', 'model,price', `${m(1)},12.50`]), ok(1), 'a blank first line');
add('no-header', P, (m) => text([`${m(1)},12.50`, `${m(2)},13.00`]), refused(422, 'no-usable-header'), 'data where the header should be');
add('header-bom-and-spaces', P, (m) => Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), text([' model , price ', `${m(1)},12.50`])]), ok(1), 'BOM and spaces around header names');

// Models that normalise to nothing, or to another row
add('model-punctuation', P, () => text(['model,price', '-./,12.50']), rejected([2]), 'no letter or digit');
add('model-stars', P, () => text(['model,price', '***,12.50']), rejected([2]), 'no letter or digit');
add('model-slash', O, () => text([OUT_HEADER, outRow('/')]), rejected([2]), 'no letter or digit');
add('model-normalised-duplicate', P, () => text(['model,price', 'QD-1,12.50', 'qd 1,13.00']), rejected([3]), 'the same model once normalised');

// Injection-looking text is only text
add('sql-in-model', P, () => text(['model,price', `"QS1'; DROP TABLE price_entries;--",12.50`]), ok(1), 'SQL metacharacters stay data');
add('shell-in-description', P, (m) => text(['model,price,description', `${m(1)},12.50,$(rm -rf /) \`id\``]), ok(1), 'shell metacharacters stay data');
add('html-in-model', P, () => text(['model,price', '<script>QH1</script>,12.50']), ok(1), 'markup stays data');
add('bidi-override-model', P, () => text(['model,price', '\u202eQB1,12.50']), ok(1), 'a right-to-left override character');

// Binary files named .csv
const binary = (slug, bytes, note) => add(`binary-${slug}`, P, () => Buffer.from(bytes), refused(415, 'not-csv'), note);
binary('pdf', [...Buffer.from('%PDF-1.7\n%\xe2\xe3\n1 0 obj\n', 'latin1')], 'a PDF');
binary('xlsx-zip', [0x50, 0x4b, 0x03, 0x04, 0x14, 0, 0, 0, ...Buffer.from('[Content_Types].xml')], 'an .xlsx (ZIP)');
binary('png', [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 0x0d, 0x49, 0x48, 0x44, 0x52], 'a PNG');
binary('jpeg', [0xff, 0xd8, 0xff, 0xe0, 0, 0x10, 0x4a, 0x46, 0x49, 0x46], 'a JPEG');
binary('gif', [...Buffer.from('GIF89a'), 1, 0, 1, 0, 0x80, 0, 0], 'a GIF');
binary('xls-ole', [0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1, 0, 0, 0, 0], 'an old .xls');
binary('gzip', [0x1f, 0x8b, 0x08, 0, 0, 0, 0, 0, 0, 3], 'a gzip file');
binary('elf', [0x7f, 0x45, 0x4c, 0x46, 2, 1, 1, 0], 'a program');
binary('sqlite', [...Buffer.from('SQLite format 3\u0000'), 0x10, 0], 'a database file');
binary('random', Array.from({ length: 2048 }, (_, i) => (i * 197 + 13) % 256), 'random bytes');

// Other kinds
add('rated-punctuation-model', 'rated-combinations', () => text(['outdoor_model,indoor_model', '-./,QR-1']), rejected([2]), 'outdoor model with no letter or digit');
add('rated-duplicate', 'rated-combinations', () => text(['outdoor_model,indoor_model', 'QR-2,QR-3', 'qr 2,qr-3']), rejected([3]), 'the same combination once normalised');

rmSync(dir, { recursive: true, force: true });
mkdirSync(dir, { recursive: true });
for (const c of cases) writeFileSync(path.join(dir, c.file), c.content);
const manifest = cases.map(({ content: _content, ...c }) => c);
writeFileSync(path.join(dir, 'manifest.json'), `${JSON.stringify({ note: 'Written by scripts/generate-hostile-csv.mjs; what each file must give when committed directly (dryRun=false).', cases: manifest }, null, 1)}\n`);
console.log(`wrote ${cases.length} files to ${path.relative(root, dir)} (${readdirSync(dir).length - 1} on disk)`);
