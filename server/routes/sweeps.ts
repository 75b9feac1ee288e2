// Routes for sensitivity sweeps: parse → service → JSON (or CSV).
import { Router } from 'express';
import {
  sweepAnalysisQuery,
  sweepBody,
  sweepParametersQuery,
  sweepParams,
  sweepPointsQuery,
} from '../../shared/api/sweeps';
import { workspaceParams } from '../../shared/api/workspaces';
import type { AppContext } from '../context';
import { signedInUser } from '../http/current-user';
import { parse } from '../http/validate';
import {
  controlSweep,
  getSweep,
  launchSweep,
  previewSweep,
  resultsCsv,
  sweepAnalysis,
  sweepList,
  sweepParameterList,
  sweepPoints,
  sweepResults,
} from '../services/sweeps';

export function sweepRoutes(ctx: AppContext) {
  const r = Router();
  const { db } = ctx;
  const { settings } = ctx.sweeps;
  const W = '/workspaces/:workspaceId/sweeps';

  // The fixed paths come before /:sweepId, which would otherwise take them for an id.
  r.get(`${W}/parameters`, async (req, res) => {
    const { workspaceId } = parse(workspaceParams, req.params, 'path');
    const q = parse(sweepParametersQuery, req.query, 'query');
    res.json(await sweepParameterList(db, signedInUser(res).id, workspaceId, q.scenarioId, q.strategyId));
  });
  r.post(`${W}/preview`, async (req, res) => {
    const { workspaceId } = parse(workspaceParams, req.params, 'path');
    res.json(await previewSweep(db, settings, signedInUser(res).id, workspaceId, parse(sweepBody, req.body)));
  });
  r.get(W, async (req, res) => {
    const { workspaceId } = parse(workspaceParams, req.params, 'path');
    res.json(await sweepList(db, signedInUser(res).id, workspaceId));
  });
  r.post(W, async (req, res) => {
    const { workspaceId } = parse(workspaceParams, req.params, 'path');
    const body = parse(sweepBody, req.body);
    res.status(201).json(await launchSweep(db, settings, signedInUser(res).id, workspaceId, body));
  });
  r.get(`${W}/:sweepId`, async (req, res) => {
    const p = parse(sweepParams, req.params, 'path');
    res.json(await getSweep(db, signedInUser(res).id, p.workspaceId, p.sweepId));
  });
  for (const action of ['pause', 'resume', 'cancel'] as const) {
    r.post(`${W}/:sweepId/${action}`, async (req, res) => {
      const p = parse(sweepParams, req.params, 'path');
      res.json(await controlSweep(db, signedInUser(res).id, p.workspaceId, p.sweepId, action));
    });
  }
  r.get(`${W}/:sweepId/points`, async (req, res) => {
    const p = parse(sweepParams, req.params, 'path');
    const q = parse(sweepPointsQuery, req.query, 'query');
    res.json(await sweepPoints(db, signedInUser(res).id, p.workspaceId, p.sweepId, q));
  });
  r.get(`${W}/:sweepId/analysis`, async (req, res) => {
    const p = parse(sweepParams, req.params, 'path');
    const q = parse(sweepAnalysisQuery, req.query, 'query');
    res.json(await sweepAnalysis(db, signedInUser(res).id, p.workspaceId, p.sweepId, q.outcome));
  });
  r.get(`${W}/:sweepId/results.csv`, async (req, res) => {
    const p = parse(sweepParams, req.params, 'path');
    const results = await sweepResults(db, signedInUser(res).id, p.workspaceId, p.sweepId);
    res
      .type('text/csv')
      .attachment(`sweep-${p.sweepId.slice(0, 8)}-seed-${results.sweep.seed}.csv`)
      .send(resultsCsv(results));
  });
  r.get(`${W}/:sweepId/results.json`, async (req, res) => {
    const p = parse(sweepParams, req.params, 'path');
    const results = await sweepResults(db, signedInUser(res).id, p.workspaceId, p.sweepId);
    res.attachment(`sweep-${p.sweepId.slice(0, 8)}-seed-${results.sweep.seed}.json`).json(results);
  });
  return r;
}
