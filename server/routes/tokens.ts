import { Router } from 'express';
import { createTokenBody, tokenParams } from '../../shared/api/tokens';
import type { AppContext } from '../context';
import { signedInUser } from '../http/current-user';
import { parse } from '../http/validate';
import { createToken, revokeToken, tokensOf } from '../services/tokens';

export function tokenRoutes(ctx: AppContext) {
  const r = Router();
  r.get('/account/tokens', async (_req, res) => {
    res.json(await tokensOf(ctx.db, signedInUser(res).id));
  });
  r.post('/account/tokens', async (req, res) => {
    res.status(201).json(await createToken(ctx.db, signedInUser(res).id, parse(createTokenBody, req.body)));
  });
  r.delete('/account/tokens/:tokenId', async (req, res) => {
    await revokeToken(ctx.db, signedInUser(res).id, parse(tokenParams, req.params, 'path').tokenId);
    res.status(204).end();
  });
  return r;
}
