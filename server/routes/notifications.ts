import { Router } from 'express';
import { notificationParams, notificationSettingsBody } from '../../shared/api/notifications';
import type { AppContext } from '../context';
import { signedInUser } from '../http/current-user';
import { parse } from '../http/validate';
import { changeSettings, notificationsOf, readNotification, settingsOf } from '../services/notifications';

export function notificationRoutes(ctx: AppContext) {
  const r = Router();
  const { db } = ctx;

  r.get('/notifications', async (_req, res) => {
    res.json(await notificationsOf(db, signedInUser(res).id));
  });
  r.post('/notifications/:notificationId/read', async (req, res) => {
    const user = signedInUser(res);
    const { notificationId } = parse(notificationParams, req.params, 'path');
    await readNotification(db, user.id, notificationId);
    res.status(204).end();
  });
  r.get('/account/notifications', async (_req, res) => {
    res.json(await settingsOf(db, signedInUser(res).id));
  });
  r.patch('/account/notifications', async (req, res) => {
    const user = signedInUser(res);
    const { email } = parse(notificationSettingsBody, req.body);
    res.json(await changeSettings(db, user.id, email));
  });
  return r;
}
