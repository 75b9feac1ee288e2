import { Router } from 'express';
import { openApiDocument } from '../openapi/document';
import { referencePage } from '../openapi/page';

const VERSION = '0.1.0';

export function referenceRoutes() {
  const r = Router();
  // Built once: the operations and schemas do not change while the server runs.
  let doc: unknown;
  let page: string;
  r.get('/openapi.json', (_req, res) => {
    res.json((doc ??= openApiDocument(VERSION)));
  });
  r.get('/docs', (_req, res) => {
    res.type('html').send((page ??= referencePage(VERSION)));
  });
  return r;
}
