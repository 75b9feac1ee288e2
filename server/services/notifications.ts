import { randomUUID } from 'node:crypto';
import type { Logger } from 'pino';
import type {
  NotificationList,
  NotificationSettings,
  NotificationView,
} from '../../shared/api/notifications';
import type { Database } from '../db/client';
import {
  countUnread,
  findNotification,
  findNotificationSettings,
  insertNotificationOnce,
  listBatchOutcomes,
  listNotifications,
  markRead,
  saveNotificationSettings,
  type NotificationRow,
} from '../db/queries/notifications';
import { findProjectionById } from '../db/queries/projections';
import { findUserById } from '../db/queries/users';
import { projectionsMail } from '../mail/templates';
import { notFound } from './errors';
import { queueMail } from './mail';

const toView = (r: NotificationRow): NotificationView => ({
  id: r.id,
  kind: r.kind as NotificationView['kind'],
  title: r.title,
  body: r.body,
  link: r.link,
  createdAt: r.createdAt.toISOString(),
  readAt: r.readAt ? r.readAt.toISOString() : null,
});

export async function notificationsOf(db: Database, userId: string): Promise<NotificationList> {
  const [rows, unread] = await Promise.all([listNotifications(db, userId, 30), countUnread(db, userId)]);
  return { unread, items: rows.map(toView) };
}

export async function readNotification(db: Database, userId: string, id: string) {
  if (await markRead(db, userId, id, new Date())) return;
  // Reading a notice twice is fine; someone else's notice is not found.
  if (!(await findNotification(db, userId, id))) throw notFound('Notice');
}

export async function settingsOf(db: Database, userId: string): Promise<NotificationSettings> {
  return { email: (await findNotificationSettings(db, userId))?.email ?? true };
}

export async function changeSettings(db: Database, userId: string, email: boolean) {
  await saveNotificationSettings(db, userId, email, new Date());
  return { email };
}

export type LongWork = { replicateYears: number; seconds: number };

const plural = (n: number, one: string, many = `${one}s`) =>
  `${n.toLocaleString('en-GB')} ${n === 1 ? one : many}`;

/**
 * Tells the person who launched projections that they ended, once per launch (a launch is
 * one projection per strategy plus the baseline, run together), when the launch was long:
 * replicates × years summed over it reach `long.replicateYears`, or it ran longer than
 * `long.seconds`. The in-app notice always; the e-mail unless they turned it off.
 */
export function projectionNotifier(
  db: Database,
  logger: Logger,
  options: { origin: string; long: LongWork },
) {
  return async (projectionId: string) => {
    const one = await findProjectionById(db, projectionId);
    if (!one?.createdBy) return;
    const batch = await listBatchOutcomes(db, one.batchId);
    if (batch.some((p) => p.status === 'queued' || p.status === 'running')) return;
    const count = (s: string) => batch.filter((p) => p.status === s).length;
    const [done, failed, cancelled] = [count('done'), count('failed'), count('cancelled')];
    if (done + failed === 0) return;
    const work = batch.reduce((sum, p) => sum + p.replicates * (p.years || 0), 0);
    const starts = batch.flatMap((p) => (p.startedAt ? [p.startedAt.getTime()] : []));
    const ends = batch.flatMap((p) => (p.finishedAt ? [p.finishedAt.getTime()] : []));
    const seconds = starts.length && ends.length ? (Math.max(...ends) - Math.min(...starts)) / 1000 : 0;
    if (work < options.long.replicateYears && seconds <= options.long.seconds) return;

    const user = await findUserById(db, one.createdBy);
    if (!user) return;
    const name = batch[0].scenarioName ?? batch[0].label;
    const title = failed ? `Projections failed: ${name}` : `Projections finished: ${name}`;
    const parts = [
      done ? `${done} finished` : '',
      failed ? `${failed} failed` : '',
      cancelled ? `${cancelled} cancelled` : '',
    ].filter(Boolean);
    const lines = [
      `The ${plural(batch.length, 'projection')} you launched for “${name}” have ended: ${parts.join(', ')} (${plural(work, 'replicate-year')} in all, run time ${Math.round(seconds)} s).`,
      ...batch
        .filter((p) => p.status === 'failed')
        .map((p) => `${p.label} failed: ${p.error ?? 'no reason recorded'}`),
    ];
    const link = `/w/${one.workspaceId}/batches/${one.batchId}`;
    await db.transaction(async (tx) => {
      const added = await insertNotificationOnce(tx, {
        id: randomUUID(),
        userId: user.id,
        kind: failed ? 'projections_failed' : 'projections_done',
        subject: `batch:${one.batchId}`,
        title,
        body: lines.join('\n'),
        link,
        createdAt: new Date(),
        readAt: null,
      });
      if (!added || (await findNotificationSettings(tx, user.id))?.email === false) return;
      await queueMail(
        tx,
        user.email,
        projectionsMail({
          name: user.name,
          title,
          lines,
          link: `${options.origin}${link}`,
          settingsLink: `${options.origin}/account`,
        }),
      );
    });
    logger.info({ batch: one.batchId, user: user.id }, 'projection notice sent');
  };
}
