import { z } from 'zod';
import { emailSchema, roleSchema, userView } from './auth';

export const idParam = z.string().regex(/^[0-9a-f-]{36}$/i, 'Not a valid id');

export const workspaceParams = z.strictObject({ workspaceId: idParam });
export const memberParams = z.strictObject({ workspaceId: idParam, userId: idParam });

export const createWorkspaceBody = z.strictObject({
  name: z.string().trim().min(1, 'Name is required').max(120, 'Name must be at most 120 characters'),
});
export type CreateWorkspaceBody = z.infer<typeof createWorkspaceBody>;

export const addMemberBody = z.strictObject({ email: emailSchema, role: roleSchema });
export type AddMemberBody = z.infer<typeof addMemberBody>;

export const changeRoleBody = z.strictObject({ role: roleSchema });
export type ChangeRoleBody = z.infer<typeof changeRoleBody>;

export const memberView = z.object({ user: userView, role: roleSchema, joinedAt: z.string() });
export type MemberView = z.infer<typeof memberView>;

export const workspaceView = z.object({
  id: z.string(),
  name: z.string(),
  personal: z.boolean(),
  role: roleSchema,
});
export type WorkspaceView = z.infer<typeof workspaceView>;
