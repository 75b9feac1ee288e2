import { Router } from 'express';
import {
  addMemberBody,
  changeRoleBody,
  createWorkspaceBody,
  memberParams,
  workspaceParams,
} from '../../shared/api/workspaces';
import type { AppContext } from '../context';
import { clientIp, signedInUser } from '../http/current-user';
import { parse } from '../http/validate';
import {
  addMember,
  changeRole,
  createWorkspace,
  getWorkspace,
  listWorkspaces,
  members,
  removeMember,
} from '../services/workspaces';

export function workspaceRoutes(ctx: AppContext) {
  const r = Router();
  const { db } = ctx;

  r.get('/workspaces', async (_req, res) => {
    res.json(await listWorkspaces(db, signedInUser(res).id));
  });

  r.post('/workspaces', async (req, res) => {
    const body = parse(createWorkspaceBody, req.body);
    res.status(201).json(await createWorkspace(db, signedInUser(res).id, body.name));
  });

  r.get('/workspaces/:workspaceId', async (req, res) => {
    const { workspaceId } = parse(workspaceParams, req.params, 'path');
    res.json(await getWorkspace(db, signedInUser(res).id, workspaceId));
  });

  r.get('/workspaces/:workspaceId/members', async (req, res) => {
    const { workspaceId } = parse(workspaceParams, req.params, 'path');
    res.json(await members(db, signedInUser(res).id, workspaceId));
  });

  r.post('/workspaces/:workspaceId/members', async (req, res) => {
    const { workspaceId } = parse(workspaceParams, req.params, 'path');
    const body = parse(addMemberBody, req.body);
    res.status(201).json(await addMember(db, signedInUser(res).id, workspaceId, body, clientIp(req)));
  });

  r.patch('/workspaces/:workspaceId/members/:userId', async (req, res) => {
    const { workspaceId, userId } = parse(memberParams, req.params, 'path');
    const { role } = parse(changeRoleBody, req.body);
    res.json(await changeRole(db, signedInUser(res).id, workspaceId, userId, role, clientIp(req)));
  });

  r.delete('/workspaces/:workspaceId/members/:userId', async (req, res) => {
    const { workspaceId, userId } = parse(memberParams, req.params, 'path');
    await removeMember(db, signedInUser(res).id, workspaceId, userId, clientIp(req));
    res.status(204).end();
  });

  return r;
}
