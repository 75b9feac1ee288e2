import { afterAll, describe, expect, it } from 'vitest';
import type { Express } from 'express';
import { operations } from '../../../server/openapi/operations';
import { browserLike, testApp } from '../../support/test-app';

const t = testApp();
afterAll(() => t.close());

type Layer = {
  name: string;
  route?: { path: string; methods: Record<string, boolean> };
  handle: { stack?: Layer[] };
};

/** Every method + path Express serves under /api, read from its router stack. */
function servedRoutes(app: Express) {
  const api = (app as unknown as { router: { stack: Layer[] } }).router.stack.find(
    (l) => l.name === 'router',
  )!;
  const found: string[] = [];
  const walk = (stack: Layer[]) => {
    for (const layer of stack) {
      if (layer.route)
        for (const m of Object.keys(layer.route.methods)) found.push(`${m} ${layer.route.path}`);
      else if (layer.handle.stack) walk(layer.handle.stack);
    }
  };
  walk(api.handle.stack!);
  return found.sort();
}

describe('the API reference', () => {
  it('lists exactly the routes the server serves', () => {
    expect(operations.map((o) => `${o.method} ${o.path}`).sort()).toEqual(servedRoutes(t.app));
  });

  it('serves an OpenAPI 3.0 document with every body schema and the bearer scheme', async () => {
    const res = await browserLike(t.app).get('/api/openapi.json');
    expect(res.status).toBe(200);
    expect(res.body.openapi).toBe('3.0.3');
    const post = res.body.paths['/api/workspaces/{workspaceId}/scenarios/{scenarioId}/runs'].post;
    expect(post.responses['202']).toBeDefined();
    const fieldBody =
      res.body.paths['/api/workspaces/{workspaceId}/fields'].post.requestBody.content['application/json']
        .schema;
    expect(fieldBody.properties.setting.properties.areaHa.type).toBe('number');
    expect(res.body.components.securitySchemes.token.scheme).toBe('bearer');
  });

  it('serves a readable page', async () => {
    const res = await browserLike(t.app).get('/api/docs');
    expect(res.status).toBe(200);
    expect(res.text).toContain('POST /api/workspaces/{workspaceId}/scenarios/{scenarioId}/runs');
  });
});
