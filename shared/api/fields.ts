import { z } from 'zod';
import { fieldSchema } from '../scenario/schema';
import { idParam } from './workspaces';

export const fieldBody = z.strictObject({
  crop: z.string().trim().min(1, 'Crop is required').max(120, 'Crop must be at most 120 characters'),
  plantingYear: z
    .number({ error: 'Planting year must be a year such as 2019' })
    .int('Planting year must be a whole year')
    .min(1900, 'Planting year must be 1900 or later')
    .max(2100, 'Planting year must be 2100 or earlier')
    .nullable()
    .default(null),
  notes: z.string().max(5000, 'Notes must be at most 5,000 characters').default(''),
  setting: fieldSchema,
});
export type FieldBody = z.infer<typeof fieldBody>;

export const fieldParams = z.strictObject({ workspaceId: idParam, fieldId: idParam });

export const fieldView = z.object({
  id: z.string(),
  name: z.string(),
  crop: z.string(),
  plantingYear: z.number().nullable(),
  notes: z.string(),
  setting: fieldSchema,
  updatedAt: z.string(),
});
export type FieldView = z.infer<typeof fieldView>;
