import { openApiDocument } from './document';

const esc = (s: string) =>
  s.replace(/[&<>"]/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;' })[c]!);

/** A plain, readable reference page rendered on the server from the OpenAPI document. */
export function referencePage(version: string) {
  const doc = openApiDocument(version);
  const byTag = new Map<string, string[]>();
  for (const [path, methods] of Object.entries(doc.paths)) {
    for (const [method, op] of Object.entries(methods) as [
      string,
      { tags: string[]; summary: string; description: string; requestBody?: unknown; parameters: unknown[] },
    ][]) {
      const body = op.requestBody
        ? `<details><summary>Request body schema</summary><pre>${esc(JSON.stringify(Object.values((op.requestBody as { content: Record<string, { schema: unknown }> }).content)[0].schema, null, 2))}</pre></details>`
        : '';
      const html = `<section><h3><code>${method.toUpperCase()} ${esc(path)}</code></h3><p>${esc(op.summary)}. ${esc(op.description)}</p>${body}</section>`;
      byTag.set(op.tags[0], [...(byTag.get(op.tags[0]) ?? []), html]);
    }
  }
  const sections = [...byTag].map(([tag, ops]) => `<h2>${esc(tag)}</h2>${ops.join('')}`).join('');
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Seedwake API reference</title>
<style>body{font:16px/1.5 system-ui,sans-serif;max-width:60rem;margin:2rem auto;padding:0 1rem;color:#241a13;background:#fbf8f2}h1,h2{font-family:Georgia,serif}h2{border-bottom:3px solid #c08a3e;padding-bottom:.2rem;margin-top:2.5rem}code{font-size:.95rem}pre{background:#f5efe4;padding:.75rem;overflow:auto;font-size:.8rem}section{margin:1rem 0}</style></head>
<body><h1>Seedwake API reference</h1><p>Machine-readable: <a href="/api/openapi.json">/api/openapi.json</a> (OpenAPI 3.0). Scripts authenticate with a personal API token from the account page: <code>Authorization: Bearer swk_…</code>. Errors are <code>{ "error": { "code", "message", "fields"? } }</code>.</p>${sections}</body></html>`;
}
