import { z } from 'zod';
import { idParam } from './workspaces';

/**
 * One row of a look-alikes table: a feature, how this species shows it and how the
 * look-alike does (e.g. leaf width, leaf margin), so two species are told apart feature
 * by feature.
 */
export const lookAlikeRow = z.strictObject({
  feature: z
    .string()
    .trim()
    .min(1, 'Name the feature, e.g. "leaf margin"')
    .max(120, 'At most 120 characters'),
  thisSpecies: z
    .string()
    .trim()
    .min(1, 'Say how this species shows the feature')
    .max(300, 'At most 300 characters'),
  lookAlike: z
    .string()
    .trim()
    .min(1, 'Say how the look-alike shows the feature')
    .max(300, 'At most 300 characters'),
  lookAlikeName: z.string().trim().min(1, 'Name the look-alike').max(120, 'At most 120 characters'),
});
export type LookAlikeRow = z.infer<typeof lookAlikeRow>;

/** What a person enters on a species card; life form and status are their words, not ours. */
export const speciesCardBody = z.strictObject({
  identificationNotes: z
    .string()
    .max(5000, 'Identification notes must be at most 5,000 characters')
    .default(''),
  lookAlikes: z.array(lookAlikeRow).max(30, 'At most 30 look-alike rows').default([]),
  lifeForm: z.string().trim().max(120, 'Life form must be at most 120 characters').default(''),
  status: z.string().trim().max(200, 'Status must be at most 200 characters').default(''),
});
export type SpeciesCardBody = z.infer<typeof speciesCardBody>;

export const cardParams = z.strictObject({ workspaceId: idParam, profileId: idParam });
export const photoParams = z.strictObject({ workspaceId: idParam, profileId: idParam, photoId: idParam });

/** The text field sent beside the file in a photo upload (multipart/form-data). */
export const photoUploadFields = z.strictObject({
  caption: z
    .string({ error: 'Describe the photo in a caption (it is read out to people who cannot see it)' })
    .trim()
    .min(1, 'Describe the photo in a caption (it is read out to people who cannot see it)')
    .max(200, 'A caption must be at most 200 characters'),
});

export const photoView = z.object({
  id: z.string(),
  caption: z.string(),
  contentType: z.enum(['image/jpeg', 'image/png']),
  width: z.number(),
  height: z.number(),
  bytes: z.number(),
  /** SHA-256 of the stored (resized, metadata-free) image. */
  sha256: z.string(),
});
export type PhotoView = z.infer<typeof photoView>;

export const speciesCardView = z.object({
  profileId: z.string(),
  identificationNotes: z.string(),
  lookAlikes: z.array(lookAlikeRow),
  lifeForm: z.string(),
  status: z.string(),
  photos: z.array(photoView),
  updatedAt: z.string(),
});
export type SpeciesCardView = z.infer<typeof speciesCardView>;

/** A card as a class link shows it: no ids of the workspace's objects. */
export const classCardView = speciesCardView.omit({ profileId: true });
export type ClassCardView = z.infer<typeof classCardView>;
