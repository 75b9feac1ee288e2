// Lessons and their class links; the public class-link routes (/class/:token) need no
// sign-in and reach only the lesson the token belongs to.
import { Router, type Response } from 'express';
import {
  classParams,
  classPhotoParams,
  lessonBody,
  lessonParams,
  replayBody,
} from '../../shared/api/lessons';
import { workspaceParams } from '../../shared/api/workspaces';
import type { AppContext } from '../context';
import { clientIp, signedInUser } from '../http/current-user';
import { parse } from '../http/validate';
import {
  classLesson,
  classPhoto,
  createClassLink,
  createLesson,
  getLesson,
  listLessonViews,
  removeLesson,
  replaceLesson,
  replayClass,
  replayLesson,
  revokeClassLink,
} from '../services/lessons';
import { sendPhoto } from './photo-response';

export function lessonRoutes(ctx: AppContext) {
  const r = Router();
  const { db } = ctx;
  const replays = { pool: ctx.projections.pool, limiter: ctx.replayLimiter };
  const user = (res: Response) => signedInUser(res).id;

  r.get('/workspaces/:workspaceId/lessons', async (req, res) => {
    res.json(await listLessonViews(db, user(res), parse(workspaceParams, req.params, 'path').workspaceId));
  });
  r.post('/workspaces/:workspaceId/lessons', async (req, res) => {
    const { workspaceId } = parse(workspaceParams, req.params, 'path');
    res.status(201).json(await createLesson(db, user(res), workspaceId, parse(lessonBody, req.body)));
  });
  r.get('/workspaces/:workspaceId/lessons/:lessonId', async (req, res) => {
    const p = parse(lessonParams, req.params, 'path');
    res.json(await getLesson(db, user(res), p.workspaceId, p.lessonId));
  });
  r.put('/workspaces/:workspaceId/lessons/:lessonId', async (req, res) => {
    const p = parse(lessonParams, req.params, 'path');
    res.json(await replaceLesson(db, user(res), p.workspaceId, p.lessonId, parse(lessonBody, req.body)));
  });
  r.delete('/workspaces/:workspaceId/lessons/:lessonId', async (req, res) => {
    const p = parse(lessonParams, req.params, 'path');
    await removeLesson(db, user(res), p.workspaceId, p.lessonId);
    res.status(204).end();
  });
  r.post('/workspaces/:workspaceId/lessons/:lessonId/link', async (req, res) => {
    const p = parse(lessonParams, req.params, 'path');
    res.status(201).json(await createClassLink(db, user(res), p.workspaceId, p.lessonId));
  });
  r.delete('/workspaces/:workspaceId/lessons/:lessonId/link', async (req, res) => {
    const p = parse(lessonParams, req.params, 'path');
    await revokeClassLink(db, user(res), p.workspaceId, p.lessonId);
    res.status(204).end();
  });
  r.post('/workspaces/:workspaceId/lessons/:lessonId/replay', async (req, res) => {
    const p = parse(lessonParams, req.params, 'path');
    const body = parse(replayBody, req.body);
    res.json(await replayLesson(db, replays, user(res), p.workspaceId, p.lessonId, clientIp(req), body));
  });

  r.get('/class/:token', async (req, res) => {
    res.json(await classLesson(db, parse(classParams, req.params, 'path').token));
  });
  r.post('/class/:token/replay', async (req, res) => {
    const { token } = parse(classParams, req.params, 'path');
    res.json(await replayClass(db, replays, token, clientIp(req), parse(replayBody, req.body)));
  });
  r.get('/class/:token/photos/:photoId', async (req, res) => {
    const p = parse(classPhotoParams, req.params, 'path');
    sendPhoto(res, await classPhoto(db, p.token, p.photoId));
  });
  return r;
}
