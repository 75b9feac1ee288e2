// Routes for scenarios and their projections (runs).
import { Router } from 'express';
import { launchBody, scenarioBody, scenarioParams } from '../../shared/api/scenarios';
import { batchParams, listProjectionsQuery, projectionParams } from '../../shared/api/projections';
import { workspaceParams } from '../../shared/api/workspaces';
import type { AppContext } from '../context';
import { signedInUser } from '../http/current-user';
import { parse } from '../http/validate';
import { replicatesCsv } from '../services/replicates-csv';
import {
  cancelProjection,
  getBatch,
  getProjection,
  launch,
  projectionSnapshot,
  recentProjections,
  rerunBatch,
} from '../services/projections';
import {
  createScenario,
  getScenario,
  listScenarioViews,
  removeScenario,
  replaceScenario,
} from '../services/scenarios';

export function projectionRoutes(ctx: AppContext) {
  const r = Router();
  const { db } = ctx;
  const { pool, runner } = ctx.projections;

  r.get('/workspaces/:workspaceId/scenarios', async (req, res) => {
    res.json(
      await listScenarioViews(
        db,
        signedInUser(res).id,
        parse(workspaceParams, req.params, 'path').workspaceId,
      ),
    );
  });
  r.post('/workspaces/:workspaceId/scenarios', async (req, res) => {
    const { workspaceId } = parse(workspaceParams, req.params, 'path');
    res
      .status(201)
      .json(await createScenario(db, signedInUser(res).id, workspaceId, parse(scenarioBody, req.body)));
  });
  r.get('/workspaces/:workspaceId/scenarios/:scenarioId', async (req, res) => {
    const p = parse(scenarioParams, req.params, 'path');
    res.json(await getScenario(db, signedInUser(res).id, p.workspaceId, p.scenarioId));
  });
  r.put('/workspaces/:workspaceId/scenarios/:scenarioId', async (req, res) => {
    const p = parse(scenarioParams, req.params, 'path');
    res.json(
      await replaceScenario(
        db,
        signedInUser(res).id,
        p.workspaceId,
        p.scenarioId,
        parse(scenarioBody, req.body),
      ),
    );
  });
  r.delete('/workspaces/:workspaceId/scenarios/:scenarioId', async (req, res) => {
    const p = parse(scenarioParams, req.params, 'path');
    await removeScenario(db, signedInUser(res).id, p.workspaceId, p.scenarioId);
    res.status(204).end();
  });
  r.post('/workspaces/:workspaceId/scenarios/:scenarioId/runs', async (req, res) => {
    const p = parse(scenarioParams, req.params, 'path');
    const body = parse(launchBody, req.body);
    res.status(202).json(await launch(db, runner, signedInUser(res).id, p.workspaceId, p.scenarioId, body));
  });

  r.get('/workspaces/:workspaceId/projections', async (req, res) => {
    const { workspaceId } = parse(workspaceParams, req.params, 'path');
    const q = parse(listProjectionsQuery, req.query, 'query');
    res.json(await recentProjections(db, signedInUser(res).id, workspaceId, q.limit, q.scenarioId));
  });
  r.get('/workspaces/:workspaceId/projections/:projectionId', async (req, res) => {
    const p = parse(projectionParams, req.params, 'path');
    res.json(await getProjection(db, signedInUser(res).id, p.workspaceId, p.projectionId));
  });
  r.post('/workspaces/:workspaceId/projections/:projectionId/cancel', async (req, res) => {
    const p = parse(projectionParams, req.params, 'path');
    res.json(await cancelProjection(db, runner, signedInUser(res).id, p.workspaceId, p.projectionId));
  });
  r.get('/workspaces/:workspaceId/projections/:projectionId/replicates.csv', async (req, res) => {
    const p = parse(projectionParams, req.params, 'path');
    const scenario = await projectionSnapshot(db, signedInUser(res).id, p.workspaceId, p.projectionId);
    const csv = await replicatesCsv(pool, scenario);
    res
      .type('text/csv')
      .attachment(`projection-${p.projectionId.slice(0, 8)}-seed-${scenario.seed}-replicates.csv`)
      .send(csv);
  });
  r.post('/workspaces/:workspaceId/batches/:batchId/rerun', async (req, res) => {
    const p = parse(batchParams, req.params, 'path');
    res.status(202).json(await rerunBatch(db, runner, signedInUser(res).id, p.workspaceId, p.batchId));
  });
  r.get('/workspaces/:workspaceId/batches/:batchId', async (req, res) => {
    const p = parse(batchParams, req.params, 'path');
    res.json(await getBatch(db, signedInUser(res).id, p.workspaceId, p.batchId));
  });
  return r;
}
