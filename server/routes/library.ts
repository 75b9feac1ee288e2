// Routes for the objects a scenario is made of: species profiles, fields and strategies.
import { Router } from 'express';
import { fieldBody, fieldParams } from '../../shared/api/fields';
import { profileBody, profileParams } from '../../shared/api/profiles';
import { strategyBody, strategyParams } from '../../shared/api/strategies';
import { workspaceParams } from '../../shared/api/workspaces';
import type { AppContext } from '../context';
import { signedInUser } from '../http/current-user';
import { parse } from '../http/validate';
import {
  copyProfile,
  createProfile,
  getProfile,
  listProfileViews,
  removeProfile,
  replaceProfile,
} from '../services/profiles';
import { createField, getField, listFieldViews, removeField, replaceField } from '../services/fields';
import {
  createStrategy,
  getStrategy,
  listStrategyViews,
  removeStrategy,
  replaceStrategy,
} from '../services/strategies';

export function libraryRoutes(ctx: AppContext) {
  const r = Router();
  const { db } = ctx;
  const ws = (req: { params: unknown }) => parse(workspaceParams, req.params, 'path').workspaceId;

  r.get('/workspaces/:workspaceId/profiles', async (req, res) => {
    res.json(await listProfileViews(db, signedInUser(res).id, ws(req)));
  });
  r.post('/workspaces/:workspaceId/profiles', async (req, res) => {
    const workspaceId = ws(req);
    res
      .status(201)
      .json(await createProfile(db, signedInUser(res).id, workspaceId, parse(profileBody, req.body)));
  });
  r.get('/workspaces/:workspaceId/profiles/:profileId', async (req, res) => {
    const p = parse(profileParams, req.params, 'path');
    res.json(await getProfile(db, signedInUser(res).id, p.workspaceId, p.profileId));
  });
  r.put('/workspaces/:workspaceId/profiles/:profileId', async (req, res) => {
    const p = parse(profileParams, req.params, 'path');
    res.json(
      await replaceProfile(
        db,
        signedInUser(res).id,
        p.workspaceId,
        p.profileId,
        parse(profileBody, req.body),
      ),
    );
  });
  r.post('/workspaces/:workspaceId/profiles/:profileId/copy', async (req, res) => {
    const p = parse(profileParams, req.params, 'path');
    res.status(201).json(await copyProfile(db, signedInUser(res).id, p.workspaceId, p.profileId));
  });
  r.delete('/workspaces/:workspaceId/profiles/:profileId', async (req, res) => {
    const p = parse(profileParams, req.params, 'path');
    await removeProfile(db, signedInUser(res).id, p.workspaceId, p.profileId);
    res.status(204).end();
  });

  r.get('/workspaces/:workspaceId/fields', async (req, res) => {
    res.json(await listFieldViews(db, signedInUser(res).id, ws(req)));
  });
  r.post('/workspaces/:workspaceId/fields', async (req, res) => {
    const workspaceId = ws(req);
    res
      .status(201)
      .json(await createField(db, signedInUser(res).id, workspaceId, parse(fieldBody, req.body)));
  });
  r.get('/workspaces/:workspaceId/fields/:fieldId', async (req, res) => {
    const p = parse(fieldParams, req.params, 'path');
    res.json(await getField(db, signedInUser(res).id, p.workspaceId, p.fieldId));
  });
  r.put('/workspaces/:workspaceId/fields/:fieldId', async (req, res) => {
    const p = parse(fieldParams, req.params, 'path');
    res.json(
      await replaceField(db, signedInUser(res).id, p.workspaceId, p.fieldId, parse(fieldBody, req.body)),
    );
  });
  r.delete('/workspaces/:workspaceId/fields/:fieldId', async (req, res) => {
    const p = parse(fieldParams, req.params, 'path');
    await removeField(db, signedInUser(res).id, p.workspaceId, p.fieldId);
    res.status(204).end();
  });

  r.get('/workspaces/:workspaceId/strategies', async (req, res) => {
    res.json(await listStrategyViews(db, signedInUser(res).id, ws(req)));
  });
  r.post('/workspaces/:workspaceId/strategies', async (req, res) => {
    const workspaceId = ws(req);
    res
      .status(201)
      .json(await createStrategy(db, signedInUser(res).id, workspaceId, parse(strategyBody, req.body)));
  });
  r.get('/workspaces/:workspaceId/strategies/:strategyId', async (req, res) => {
    const p = parse(strategyParams, req.params, 'path');
    res.json(await getStrategy(db, signedInUser(res).id, p.workspaceId, p.strategyId));
  });
  r.put('/workspaces/:workspaceId/strategies/:strategyId', async (req, res) => {
    const p = parse(strategyParams, req.params, 'path');
    res.json(
      await replaceStrategy(
        db,
        signedInUser(res).id,
        p.workspaceId,
        p.strategyId,
        parse(strategyBody, req.body),
      ),
    );
  });
  r.delete('/workspaces/:workspaceId/strategies/:strategyId', async (req, res) => {
    const p = parse(strategyParams, req.params, 'path');
    await removeStrategy(db, signedInUser(res).id, p.workspaceId, p.strategyId);
    res.status(204).end();
  });
  return r;
}
