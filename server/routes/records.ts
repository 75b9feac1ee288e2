// Field records: templates, preview and import of uploads (multipart, CSV, at most 10 MB),
// the stored originals, the estimates and their adoption.
import { Router, type RequestHandler, type Response } from 'express';
import multer from 'multer';
import {
  adoptBody,
  recordsParams,
  strategySourcesParams,
  templateParams,
  uploadFields,
  uploadParams,
} from '../../shared/api/records';
import { recordTemplate, templateFilename } from '../../shared/records/template';
import type { AppContext } from '../context';
import { signedInUser } from '../http/current-user';
import { parse } from '../http/validate';
import { requireRole } from '../services/access';
import { adoptEstimate, listAdoptionViews, stepSourceNotes } from '../services/adoptions';
import { AppError, invalid } from '../services/errors';
import {
  getFieldEstimates,
  importRecords,
  listUploadViews,
  MAX_UPLOAD_BYTES,
  previewRecords,
  removeUpload,
  uploadOriginal,
  type UploadedFile,
} from '../services/records';

const megabytes = MAX_UPLOAD_BYTES / 1024 / 1024;

/** Multer keeps the file in memory (it is checked, hashed and stored whole); its limits become our errors. */
const fileUpload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: MAX_UPLOAD_BYTES, files: 1, fields: 4, fieldSize: 1024 },
  // Browsers send UTF-8 file names without saying so; busboy would read them as Latin-1.
  defParamCharset: 'utf8',
}).single('file');

/** Served as stored when it is a text type a spreadsheet would send; anything else is served as bytes. */
const servedTypes = new Set([
  'text/csv',
  'text/plain',
  'text/tab-separated-values',
  'application/vnd.ms-excel',
  'application/csv',
]);

export function recordRoutes(ctx: AppContext) {
  const r = Router();
  const { db } = ctx;
  const user = (res: Response) => signedInUser(res).id;
  const base = '/workspaces/:workspaceId/fields/:fieldId/records';

  // Only an editor's file is read at all: the role is checked before multer takes the body.
  const receiveFile: RequestHandler = async (req, res, next) => {
    const p = parse(recordsParams, req.params, 'path');
    await requireRole(db, user(res), p.workspaceId, 'editor');
    fileUpload(req, res, (err: unknown) => {
      if (!err) return next();
      if (err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE') {
        const message = `The file is larger than ${megabytes} MB; split it into smaller files (for example one per year or per trial)`;
        return next(new AppError(413, 'too_large', message, { file: message }));
      }
      const message = err instanceof multer.MulterError ? err.message : 'The upload could not be read';
      next(
        invalid(`${message}. Send one CSV file in the form field "file" with the field "kind"`, {
          file: message,
        }),
      );
    });
  };

  const received = (req: {
    file?: Express.Multer.File;
    body?: unknown;
  }): { file: UploadedFile; fields: ReturnType<typeof uploadFields.parse> } => {
    const fields = parse(uploadFields, { ...(req.body as object) });
    if (!req.file)
      throw invalid('Attach the CSV file in the form field "file"', { file: 'Choose a CSV file' });
    return {
      fields,
      file: { bytes: req.file.buffer, filename: req.file.originalname, contentType: req.file.mimetype },
    };
  };

  r.get('/records/templates/:kind', (req, res) => {
    const { kind } = parse(templateParams, req.params, 'path');
    res.attachment(templateFilename(kind)).type('text/csv; charset=utf-8').send(recordTemplate(kind));
  });
  r.post(`${base}/preview`, receiveFile, async (req, res) => {
    const p = parse(recordsParams, req.params, 'path');
    const { file, fields } = received(req);
    res.json(await previewRecords(db, user(res), p.workspaceId, p.fieldId, file, fields));
  });
  r.post(`${base}/uploads`, receiveFile, async (req, res) => {
    const p = parse(recordsParams, req.params, 'path');
    const { file, fields } = received(req);
    res.status(201).json(await importRecords(db, user(res), p.workspaceId, p.fieldId, file, fields));
  });
  r.get(`${base}/uploads`, async (req, res) => {
    const p = parse(recordsParams, req.params, 'path');
    res.json(await listUploadViews(db, user(res), p.workspaceId, p.fieldId));
  });
  r.get(`${base}/uploads/:uploadId/file`, async (req, res) => {
    const p = parse(uploadParams, req.params, 'path');
    const original = await uploadOriginal(db, user(res), p.workspaceId, p.fieldId, p.uploadId);
    const type = original.contentType.split(';')[0].trim().toLowerCase();
    res
      .attachment(original.filename)
      .set({
        'Content-Type': servedTypes.has(type) ? original.contentType : 'application/octet-stream',
        ETag: `"${original.sha256}"`,
        // RFC 9530: the checksum of the bytes as sent, so a script can verify the download.
        'Repr-Digest': `sha-256=:${Buffer.from(original.sha256, 'hex').toString('base64')}:`,
      })
      .send(original.bytes);
  });
  r.delete(`${base}/uploads/:uploadId`, async (req, res) => {
    const p = parse(uploadParams, req.params, 'path');
    await removeUpload(db, user(res), p.workspaceId, p.fieldId, p.uploadId);
    res.status(204).end();
  });
  r.get(`${base}/estimates`, async (req, res) => {
    const p = parse(recordsParams, req.params, 'path');
    res.json(await getFieldEstimates(db, user(res), p.workspaceId, p.fieldId));
  });
  r.get(`${base}/adoptions`, async (req, res) => {
    const p = parse(recordsParams, req.params, 'path');
    res.json(await listAdoptionViews(db, user(res), p.workspaceId, p.fieldId));
  });
  r.post(`${base}/adoptions`, async (req, res) => {
    const p = parse(recordsParams, req.params, 'path');
    res
      .status(201)
      .json(await adoptEstimate(db, user(res), p.workspaceId, p.fieldId, parse(adoptBody, req.body)));
  });
  r.get('/workspaces/:workspaceId/strategies/:strategyId/sources', async (req, res) => {
    const p = parse(strategySourcesParams, req.params, 'path');
    res.json(await stepSourceNotes(db, user(res), p.workspaceId, p.strategyId));
  });
  return r;
}
