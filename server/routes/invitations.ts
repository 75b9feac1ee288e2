import { Router } from 'express';
import { createInvitationBody, invitationParams, invitationTokenParams } from '../../shared/api/invitations';
import { workspaceParams } from '../../shared/api/workspaces';
import type { AppContext } from '../context';
import { clientIp, signedInUser } from '../http/current-user';
import { linkOrigin } from '../http/origin';
import { parse } from '../http/validate';
import {
  acceptInvitation,
  invite,
  listInvitations,
  lookUpInvitation,
  resendInvitation,
  revokeInvitation,
} from '../services/invitations';

export function invitationRoutes(ctx: AppContext) {
  const r = Router();
  const { db } = ctx;
  const limits = ctx.linkLimiters;

  r.get('/workspaces/:workspaceId/invitations', async (req, res) => {
    const { workspaceId } = parse(workspaceParams, req.params, 'path');
    res.json(await listInvitations(db, signedInUser(res).id, workspaceId));
  });

  r.post('/workspaces/:workspaceId/invitations', async (req, res) => {
    const user = signedInUser(res);
    const { workspaceId } = parse(workspaceParams, req.params, 'path');
    const body = parse(createInvitationBody, req.body);
    await limits.invitationsPerUser.consume(user.id);
    res
      .status(201)
      .json(await invite(db, user, workspaceId, body, linkOrigin(ctx.config, req), clientIp(req)));
  });

  r.post('/workspaces/:workspaceId/invitations/:invitationId/resend', async (req, res) => {
    const user = signedInUser(res);
    const p = parse(invitationParams, req.params, 'path');
    await limits.invitationsPerUser.consume(user.id);
    res.json(
      await resendInvitation(
        db,
        user,
        p.workspaceId,
        p.invitationId,
        linkOrigin(ctx.config, req),
        clientIp(req),
      ),
    );
  });

  r.delete('/workspaces/:workspaceId/invitations/:invitationId', async (req, res) => {
    const p = parse(invitationParams, req.params, 'path');
    await revokeInvitation(db, signedInUser(res).id, p.workspaceId, p.invitationId, clientIp(req));
    res.status(204).end();
  });

  // The link's own endpoints: public (the secret is the credential), limited per address.
  r.get('/invitations/:token', async (req, res) => {
    await limits.linksPerAddress.consume(clientIp(req));
    const { token } = parse(invitationTokenParams, req.params, 'path');
    res.json(await lookUpInvitation(db, token));
  });

  r.post('/invitations/:token/accept', async (req, res) => {
    const user = signedInUser(res);
    await limits.linksPerAddress.consume(clientIp(req));
    const { token } = parse(invitationTokenParams, req.params, 'path');
    res.json(await acceptInvitation(db, user, token, clientIp(req)));
  });

  return r;
}
