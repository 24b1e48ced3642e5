import { readFile } from 'node:fs/promises';
import path from 'node:path';
import { Router } from 'express';
import multer from 'multer';
import { z } from 'zod';
import { IMPORT_KINDS, type ImportKind } from '../../shared/schemas/equipment';
import { DECIMAL_CONVENTIONS, MAX_STORED_ERRORS } from '../../shared/schemas/imports';
import { requireAuth, requireRole, currentUser } from '../auth/auth.middleware';
import type { AppContext } from '../context';
import { AppError, notFound } from '../lib/errors';
import { IdParamSchema, parseBody, parseParams } from '../lib/validate';
import { MAX_FILE_BYTES } from './csv-file';
import { fieldsOf, headerKey, toSnake } from './header-map';
import { errorsCsv } from './csv-export';
import { commitImport, getImport, importErrorPage, importErrors, listImports, revertImport, uploadImport } from './imports.service';

/** Templates live beside the demo catalog; the server runs from the project root. */
const TEMPLATES_DIR = path.resolve('catalog', 'templates');

const UploadFieldsSchema = z.object({
  kind: z.enum(IMPORT_KINDS, { error: `kind must be one of ${IMPORT_KINDS.join(', ')}` }),
  distributor: z.string().trim().max(120).optional(),
  dryRun: z.enum(['true', 'false'], { error: 'dryRun must be true or false' }).default('true'),
  mapping: z.string().max(20000).optional(),
  /** Price files: "point" (1,234.50), "comma" (1.234,50) or "auto" (read from the file, else the distributor's last). */
  decimalConvention: z.enum([...DECIMAL_CONVENTIONS, 'auto'], { error: 'decimalConvention must be point, comma or auto' }).default('auto'),
});

/** A canonical positive whole number in a query ("0x10", "1e1", "+3" are refused). */
const wholeNumber = (what: string, max: number) =>
  z
    .string()
    .regex(/^[1-9]\d{0,5}$/, { error: `${what} must be a whole number from 1 to ${max}` })
    .transform(Number)
    .pipe(z.number().max(max, { error: `${what} must be at most ${max}` }));

const ErrorPageSchema = z.object({
  page: wholeNumber('page', 100000).optional().default(1),
  pageSize: wholeNumber('pageSize', MAX_STORED_ERRORS).optional().default(50),
});

const NOT_CSV = /\.(xlsx|xlsm|xls|ods|numbers|pdf|zip|png|jpe?g|gif|docx?)$/i;
const TEXT_TYPES = /^(text\/|application\/(csv|vnd\.ms-excel|octet-stream|x-csv)$)/i;

/** A spreadsheet, image or archive is refused by name or type before it is read. */
function checkFileType(file: Express.Multer.File) {
  if (NOT_CSV.test(file.originalname) || (file.mimetype && !TEXT_TYPES.test(file.mimetype))) {
    throw new AppError('not-csv', `"${file.originalname}" is not a CSV file. Expected a CSV text file (save a spreadsheet as CSV first).`, 415);
  }
}

function parseMapping(kind: ImportKind, raw: string | undefined): Record<string, string> | undefined {
  if (raw === undefined || raw.trim() === '') return undefined;
  let value: unknown;
  try {
    value = JSON.parse(raw);
  } catch {
    throw new AppError('bad-parameters', 'mapping must be JSON such as {"Their header": "field"}.', 400);
  }
  const parsed = z.record(z.string(), z.string()).safeParse(value);
  if (!parsed.success) throw new AppError('bad-parameters', 'mapping must be JSON such as {"Their header": "field"}.', 400);
  const { fields } = fieldsOf(kind);
  const known = new Set(fields.map(headerKey));
  const unknown = Object.values(parsed.data).filter((f) => !known.has(headerKey(f)));
  if (unknown.length > 0) {
    throw new AppError('validation-failed', `mapping names fields that ${kind} files do not have: ${unknown.join(', ')}.`, 422, {
      knownFields: fields.map(toSnake),
    });
  }
  return parsed.data;
}

/** /api/imports: uploads, preview, commit, revert and history (admin only). */
export function importsRouter(ctx: AppContext): Router {
  const router = Router();
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: MAX_FILE_BYTES, files: 1, fields: 10 } });
  router.use(requireAuth(ctx), requireRole('admin'));

  router.get('/templates/:kind', async (req, res) => {
    const { kind } = parseParams(z.object({ kind: z.enum(IMPORT_KINDS) }), req.params);
    const csv = await readFile(path.join(TEMPLATES_DIR, `${kind}.csv`)).catch(() => {
      throw notFound('Template');
    });
    res.type('text/csv').attachment(`${kind}.csv`).send(csv);
  });

  router.post('/', upload.single('file'), async (req, res) => {
    const fields = parseBody(UploadFieldsSchema, req.body ?? {});
    if (!req.file) throw new AppError('validation-failed', 'Attach the CSV in the "file" field.', 422, [{ path: 'file', message: 'required' }]);
    checkFileType(req.file);
    const view = await uploadImport(ctx, {
      buffer: req.file.buffer,
      fileName: req.file.originalname || 'upload.csv',
      kind: fields.kind,
      distributor: fields.distributor,
      dryRun: fields.dryRun === 'true',
      mapping: parseMapping(fields.kind, fields.mapping),
      decimalConvention: fields.decimalConvention === 'auto' ? undefined : fields.decimalConvention,
      userId: currentUser(req).id,
    });
    res.status(201).json({ import: view });
  });

  router.get('/', async (_req, res) => {
    res.json({ imports: await listImports(ctx) });
  });
  router.get('/:id', async (req, res) => {
    const { id } = parseParams(IdParamSchema, req.params);
    res.json({ import: await getImport(ctx, id) });
  });
  router.get('/:id/errors', async (req, res) => {
    const { id } = parseParams(IdParamSchema, req.params);
    const { page, pageSize } = parseParams(ErrorPageSchema, req.query);
    res.json(await importErrorPage(ctx, id, page, pageSize));
  });
  router.get('/:id/errors.csv', async (req, res) => {
    const { id } = parseParams(IdParamSchema, req.params);
    const { errors } = await importErrors(ctx, id);
    res.type('text/csv').attachment(`import-${id}-rejected-rows.csv`).send(errorsCsv(errors));
  });
  router.post('/:id/commit', async (req, res) => {
    const { id } = parseParams(IdParamSchema, req.params);
    res.json({ import: await commitImport(ctx, id) });
  });
  router.post('/:id/revert', async (req, res) => {
    const { id } = parseParams(IdParamSchema, req.params);
    res.json({ import: await revertImport(ctx, id) });
  });
  return router;
}
