import { z } from 'zod';
import { operations, type Operation } from './operations';

type JsonSchema = Record<string, unknown>;

const schemaOf = (s: z.ZodType, io: 'input' | 'output'): JsonSchema =>
  z.toJSONSchema(s, { io, unrepresentable: 'any', target: 'openapi-3.0' }) as JsonSchema;

/** Express ":name" segments become OpenAPI "{name}". */
export const openApiPath = (path: string) => path.replace(/:([A-Za-z]+)/g, '{$1}');

function parameters(op: Operation) {
  const out: JsonSchema[] = [];
  for (const [where, schema] of [
    ['path', op.params],
    ['query', op.query],
  ] as const) {
    if (!schema) continue;
    const js = schemaOf(schema, 'input') as { properties?: Record<string, JsonSchema>; required?: string[] };
    for (const [name, s] of Object.entries(js.properties ?? {})) {
      out.push({
        name,
        in: where,
        required: where === 'path' || (js.required ?? []).includes(name),
        schema: s,
      });
    }
  }
  return out;
}

const security = (op: Operation) =>
  op.access === 'public'
    ? []
    : op.access === 'session'
      ? [{ session: [] }]
      : [{ session: [] }, { token: [] }];

/** OpenAPI 3.0 document of the API, built from the operation list and the zod schemas. */
export function openApiDocument(version: string) {
  const paths: Record<string, Record<string, unknown>> = {};
  for (const op of operations) {
    const status = String(op.status ?? 200);
    const content =
      op.produces === 'text/csv'
        ? { 'text/csv': { schema: { type: 'string' } } }
        : op.produces === 'application/pdf'
          ? { 'application/pdf': { schema: { type: 'string', format: 'binary' } } }
          : op.produces === 'image'
            ? Object.fromEntries(
                ['image/jpeg', 'image/png'].map((t) => [t, { schema: { type: 'string', format: 'binary' } }]),
              )
            : op.response
              ? { 'application/json': { schema: schemaOf(op.response, 'output') } }
              : undefined;
    (paths[openApiPath(`/api${op.path}`)] ??= {})[op.method] = {
      tags: [op.tag],
      summary: op.summary,
      description:
        typeof op.access === 'object'
          ? `Needs the ${op.access.role} role (or higher) in the workspace.`
          : op.access === 'session'
            ? 'Needs a signed-in session.'
            : 'Open.',
      parameters: parameters(op),
      ...(op.upload
        ? {
            requestBody: {
              required: true,
              content: {
                'multipart/form-data': {
                  schema: {
                    type: 'object',
                    required: [op.upload.file, ...op.upload.fields],
                    properties: {
                      [op.upload.file]: { type: 'string', format: 'binary' },
                      ...Object.fromEntries(op.upload.fields.map((f) => [f, { type: 'string' }])),
                    },
                  },
                },
              },
            },
          }
        : {}),
      ...(op.body
        ? {
            requestBody: {
              required: true,
              content: { 'application/json': { schema: schemaOf(op.body, 'input') } },
            },
          }
        : {}),
      security: security(op),
      responses: {
        [status]: { description: 'Success', ...(content && status !== '204' ? { content } : {}) },
        default: { description: 'Error: { "error": { "code", "message", "fields"? } }' },
      },
    };
  }
  return {
    openapi: '3.0.3',
    info: {
      title: 'Seedwake API',
      version,
      description:
        'Seeded projections of weed seedbanks and plant stands. Errors are { "error": { "code", "message", "fields"? } }.',
    },
    servers: [{ url: '/' }],
    components: {
      securitySchemes: {
        session: {
          type: 'apiKey',
          in: 'cookie',
          name: 'seedwake.sid',
          description: 'Browser session; state-changing requests must carry our Origin.',
        },
        token: {
          type: 'http',
          scheme: 'bearer',
          description: 'Personal API token (swk_…) from the account page, scoped to one workspace and role.',
        },
      },
    },
    paths,
  };
}
