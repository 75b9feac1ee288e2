import { z } from 'zod';
import { idParam } from './workspaces';

/**
 * A launch of projections is "long" — worth a notice and an e-mail — when its replicates
 * times years, summed over the launch, reach this many, or when it ran longer than this.
 */
export const LONG_PROJECTIONS = { replicateYears: 20_000, seconds: 10 };

export const notificationKinds = ['projections_done', 'projections_failed'] as const;

export const notificationView = z.object({
  id: z.string(),
  kind: z.enum(notificationKinds),
  title: z.string(),
  body: z.string(),
  /** A path inside the app. */
  link: z.string().nullable(),
  createdAt: z.string(),
  readAt: z.string().nullable(),
});
export type NotificationView = z.infer<typeof notificationView>;

export const notificationList = z.object({
  unread: z.number().int(),
  items: z.array(notificationView),
});
export type NotificationList = z.infer<typeof notificationList>;

export const notificationParams = z.strictObject({ notificationId: idParam });

export const notificationSettings = z.object({ email: z.boolean() });
export type NotificationSettings = z.infer<typeof notificationSettings>;

export const notificationSettingsBody = z.strictObject({
  email: z.boolean({ error: 'Choose whether to get these e-mails (true or false)' }),
});
export type NotificationSettingsBody = z.infer<typeof notificationSettingsBody>;
