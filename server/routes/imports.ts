// Imports: upload → preview (POST /), apply (POST /:id/apply), list, detail, and CSV templates. Admin and planner.
import express from 'express';
import { importKindSchema, importListQuerySchema } from '../../shared/imports';
import { INVENTORY_IMPORT_ROLES } from '../../shared/permissions';
import { currentUser, requireRole } from '../auth/guards';
import { applyImport } from '../imports/apply';
import { ImportFileError, ImportNotFoundError } from '../imports/errors';
import { toDetail, toSummary } from '../imports/import-records';
import { getImportRow, listImportRows } from '../queries/imports/import-rows';
import { buildPreview } from '../imports/preview';
import { printablePreview } from '../imports/printable-preview';
import { recordPreview } from '../imports/record-preview';
import { isTemplateKind, templateFile } from '../imports/templates';
import { singleFileUpload } from '../imports/upload';
import { parseDefaultsField, parseMappingField } from '../imports/upload-options';
import type { RouteDeps } from './deps';

export function importsRouter({ db, config, now }: RouteDeps): express.Router {
  const router = express.Router();
  router.use(requireRole(...INVENTORY_IMPORT_ROLES));

  router.post('/', singleFileUpload(config.importMaxBytes), async (req, res) => {
    if (!req.file) throw new ImportFileError('NO_FILE', 'Send the file in the multipart field "file".');
    const fileName = req.file.originalname || 'upload';
    const kind = typeof req.body?.kind === 'string' ? req.body.kind : undefined;
    const defaults = parseDefaultsField(req.body?.defaults);
    const mapping = parseMappingField(req.body?.mapping);
    // Issues quote the file; a NUL or lone surrogate there is escaped so the preview can be stored.
    const result = printablePreview(await buildPreview(db, { fileName, bytes: req.file.buffer, requestedKind: kind, defaults, mapping }));
    const id = await recordPreview(db, { ...result, fileName, sizeBytes: req.file.size, userId: currentUser(req).id, now: now() });
    res.status(201).json({ id, kind: result.kind, fileName, preview: result.preview });
  });

  router.get('/', async (req, res) => {
    const page = importListQuerySchema.parse(req.query);
    res.json({ imports: (await listImportRows(db, page)).map(toSummary) });
  });

  router.get('/templates/:kind', (req, res) => {
    const kind = importKindSchema.safeParse(req.params.kind);
    if (!kind.success || !isTemplateKind(kind.data)) {
      throw new ImportFileError('UNKNOWN_TEMPLATE', `No CSV template "${req.params.kind}"; use csv-sites, csv-spans or csv-slices.`);
    }
    const { fileName, text } = templateFile(kind.data);
    res.type('text/csv').attachment(fileName).send(text);
  });

  router.get('/:id', async (req, res) => {
    const row = await getImportRow(db, req.params.id);
    if (!row) throw new ImportNotFoundError(req.params.id);
    res.json(toDetail(row));
  });

  router.post('/:id/apply', async (req, res) => {
    res.json(await applyImport(db, { id: req.params.id, userId: currentUser(req).id, now: now() }));
  });

  return router;
}
