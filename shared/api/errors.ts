import { z } from 'zod';

/** The one error body every API route answers with. */
export const apiErrorSchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    fields: z.record(z.string(), z.string()).optional(),
  }),
});
export type ApiError = z.infer<typeof apiErrorSchema>;

export const errorCodes = [
  'invalid',
  'malformed_json',
  'unauthenticated',
  'forbidden',
  'not_found',
  'conflict',
  'gone',
  'too_large',
  'rate_limited',
  'csrf',
  'internal',
] as const;
export type ErrorCode = (typeof errorCodes)[number];
