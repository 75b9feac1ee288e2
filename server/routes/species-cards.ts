// Species cards per profile, and their photos (multipart upload, JPEG or PNG, ≤ 5 MB).
import { Router, type RequestHandler, type Response } from 'express';
import multer from 'multer';
import { cardParams, photoParams, photoUploadFields, speciesCardBody } from '../../shared/api/species-cards';
import type { AppContext } from '../context';
import { signedInUser } from '../http/current-user';
import { parse } from '../http/validate';
import { AppError, invalid } from '../services/errors';
import { MAX_PHOTO_BYTES } from '../services/photos';
import { addPhoto, getCard, putCard, readPhoto, removeCard, removePhoto } from '../services/species-cards';
import { sendPhoto } from './photo-response';

const megabytes = MAX_PHOTO_BYTES / 1024 / 1024;

/** Multer keeps the file in memory (it is re-encoded before anything is stored); its limits become our errors. */
const photoUpload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: MAX_PHOTO_BYTES, files: 1, fields: 4, fieldSize: 2048 },
}).single('photo');

const receivePhoto: RequestHandler = (req, res, next) => {
  // Nothing is read from a caller who is not signed in.
  signedInUser(res);
  photoUpload(req, res, (err: unknown) => {
    if (!err) return next();
    if (err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE') {
      const message = `The photo is larger than ${megabytes} MB; choose a smaller file or export it at a lower resolution`;
      return next(new AppError(413, 'too_large', message, { photo: message }));
    }
    const message = err instanceof multer.MulterError ? err.message : 'The upload could not be read';
    next(invalid(`${message}. Send one file in the form field "photo" and a caption`, { photo: message }));
  });
};

export function speciesCardRoutes(ctx: AppContext) {
  const r = Router();
  const { db } = ctx;
  const user = (res: Response) => signedInUser(res).id;
  const base = '/workspaces/:workspaceId/profiles/:profileId/card';

  r.get(base, async (req, res) => {
    const p = parse(cardParams, req.params, 'path');
    res.json(await getCard(db, user(res), p.workspaceId, p.profileId));
  });
  r.put(base, async (req, res) => {
    const p = parse(cardParams, req.params, 'path');
    res.json(await putCard(db, user(res), p.workspaceId, p.profileId, parse(speciesCardBody, req.body)));
  });
  r.delete(base, async (req, res) => {
    const p = parse(cardParams, req.params, 'path');
    await removeCard(db, user(res), p.workspaceId, p.profileId);
    res.status(204).end();
  });
  r.post(`${base}/photos`, receivePhoto, async (req, res) => {
    const p = parse(cardParams, req.params, 'path');
    const { caption } = parse(photoUploadFields, { ...req.body });
    if (!req.file)
      throw invalid('Attach a JPEG or PNG photo in the form field "photo"', { photo: 'Choose a photo' });
    res
      .status(201)
      .json(await addPhoto(db, user(res), p.workspaceId, p.profileId, { bytes: req.file.buffer, caption }));
  });
  r.get(`${base}/photos/:photoId`, async (req, res) => {
    const p = parse(photoParams, req.params, 'path');
    sendPhoto(res, await readPhoto(db, user(res), p.workspaceId, p.profileId, p.photoId));
  });
  r.delete(`${base}/photos/:photoId`, async (req, res) => {
    const p = parse(photoParams, req.params, 'path');
    await removePhoto(db, user(res), p.workspaceId, p.profileId, p.photoId);
    res.status(204).end();
  });
  return r;
}
