import { Router } from 'express';
import { shareParams } from '../../shared/api/shares';
import { batchParams } from '../../shared/api/projections';
import { workspaceParams } from '../../shared/api/workspaces';
import type { AppContext } from '../context';
import { signedInUser } from '../http/current-user';
import { parse } from '../http/validate';
import { share, sharedWithMe, sharesOf, unshare } from '../services/shares';
import { batchReport } from '../services/reports';
import { reportQuery } from '../../shared/api/shares';

export function shareRoutes(ctx: AppContext) {
  const r = Router();
  const { db } = ctx;
  r.get('/workspaces/:workspaceId/batches/:batchId/shares', async (req, res) => {
    const p = parse(batchParams, req.params, 'path');
    res.json(await sharesOf(db, signedInUser(res).id, p.workspaceId, p.batchId));
  });
  r.put('/workspaces/:workspaceId/batches/:batchId/shares/:userId', async (req, res) => {
    const p = parse(shareParams, req.params, 'path');
    res.json(await share(db, signedInUser(res).id, p.workspaceId, p.batchId, p.userId));
  });
  r.delete('/workspaces/:workspaceId/batches/:batchId/shares/:userId', async (req, res) => {
    const p = parse(shareParams, req.params, 'path');
    await unshare(db, signedInUser(res).id, p.workspaceId, p.batchId, p.userId);
    res.status(204).end();
  });
  r.get('/workspaces/:workspaceId/batches/:batchId/report.pdf', async (req, res) => {
    const p = parse(batchParams, req.params, 'path');
    const { units } = parse(reportQuery, req.query, 'query');
    const pdf = await batchReport(db, signedInUser(res).id, p.workspaceId, p.batchId, units);
    res
      .type('application/pdf')
      .attachment(`seedwake-report-${p.batchId.slice(0, 8)}.pdf`)
      .send(pdf);
  });
  r.get('/workspaces/:workspaceId/shared-with-me', async (req, res) => {
    const { workspaceId } = parse(workspaceParams, req.params, 'path');
    res.json(await sharedWithMe(db, signedInUser(res).id, workspaceId));
  });
  return r;
}
