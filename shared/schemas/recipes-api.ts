// API contracts of recipes and their versions (the recipe document itself is
// in recipe.ts). The server parses these at the top of each handler; the
// client validates its forms with the same schemas.
import { z } from 'zod';
import type { Dopant } from '../engine/dopants';
import { DOPANTS } from '../engine/dopants';
import type { EngineWarning, RecipeResult } from '../engine/types';
import { recipeDocumentSchema, type RecipeDocument } from './recipe';

export const VERSION_STATES = ['draft', 'in_review', 'released', 'retired'] as const;
export type VersionState = (typeof VERSION_STATES)[number];

export const VERSION_STATE_LABELS: Record<VersionState, string> = {
  draft: 'Draft',
  in_review: 'In review',
  released: 'Released',
  retired: 'Retired',
};

const recipeName = z.string().trim().min(1, 'Enter a name').max(120, 'At most 120 characters');
const description = z.string().trim().max(4000, 'At most 4000 characters');
const note = z.string().trim().max(2000, 'At most 2000 characters');

export const createRecipeSchema = z.object({
  name: recipeName,
  description: description.default(''),
  /** Omitted: an empty document (substrate defaults, no steps). Import sends a whole one. */
  document: recipeDocumentSchema.optional(),
});
export type CreateRecipeInput = z.input<typeof createRecipeSchema>;

export const patchRecipeSchema = z
  .object({ name: recipeName, description })
  .partial()
  .strict()
  .refine((v) => Object.keys(v).length > 0, { message: 'Change at least one field' });
export type PatchRecipeInput = z.infer<typeof patchRecipeSchema>;

/** Saving a draft names the revision it was read at; a stale one is refused (409). */
export const saveVersionSchema = z.object({
  revision: z.number({ error: 'revision must be the number read with the version' }).int().positive(),
  document: recipeDocumentSchema,
  note: note.default(''),
});
export type SaveVersionInput = z.input<typeof saveVersionSchema>;

export const copyVersionSchema = z.object({ note: note.default('') });

export const RECIPE_SORTS = ['name', 'updatedAt', 'owner', 'state'] as const;
export const listRecipesQuerySchema = z.object({
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(20),
  sort: z.enum(RECIPE_SORTS).default('updatedAt'),
  order: z.enum(['asc', 'desc']).default('desc'),
  name: z.string().trim().max(120).optional(),
  dopant: z.enum(DOPANTS as readonly [Dopant, ...Dopant[]]).optional(),
  state: z.enum(VERSION_STATES).optional(),
  ownerId: z.coerce.number().int().positive().optional(),
  tubeId: z.coerce.number().int().positive().optional(),
  /** Last change on or after / on or before these days (UTC). */
  changedFrom: z.iso.date({ error: 'Use a date (YYYY-MM-DD)' }).optional(),
  changedTo: z.iso.date({ error: 'Use a date (YYYY-MM-DD)' }).optional(),
});
export type ListRecipesQuery = z.input<typeof listRecipesQuerySchema>;

/** Headline numbers kept beside each stored result. */
export interface VersionSummary {
  junctionDepthsUm: number[];
  sheetResistanceOhmSq: number | null;
  surfaceNetCm3: number;
  surfaceType: 'n' | 'p';
  dopants: Dopant[];
  warnings: number;
}

export interface PersonRef {
  id: number;
  name: string;
}

export interface RecipeListRow {
  id: number;
  name: string;
  description: string;
  owner: PersonRef;
  dopants: Dopant[];
  tubeIds: number[];
  latestVersionNo: number;
  latestState: VersionState;
  releasedVersionNo: number | null;
  updatedAt: string;
}

export interface RecipeListPage {
  rows: RecipeListRow[];
  total: number;
  page: number;
  pageSize: number;
}

export interface VersionListItem {
  id: number;
  versionNo: number;
  state: VersionState;
  author: PersonRef;
  note: string;
  summary: VersionSummary | null;
  updatedAt: string;
  releasedAt: string | null;
}

export interface RecipeDetail extends RecipeListRow {
  versions: VersionListItem[];
}

/** One version in full: the document and the server's stored result. */
export interface RecipeVersion {
  id: number;
  recipeId: number;
  recipeName: string;
  versionNo: number;
  state: VersionState;
  revision: number;
  document: RecipeDocument;
  result: RecipeResult | null;
  summary: VersionSummary | null;
  engineVersion: string | null;
  parameterSetId: string | null;
  contentHash: string;
  note: string;
  author: PersonRef;
  basedOnVersionId: number | null;
  submittedAt: string | null;
  releasedAt: string | null;
  releasedBy: PersonRef | null;
  /** The stated meaning of the release signature (a SIGNATURE_MEANINGS key). */
  releaseMeaning: string | null;
  /** The lead's comment from the last return to Draft. */
  reviewComment: string | null;
  retiredAt: string | null;
  createdAt: string;
  updatedAt: string;
  /** Tube rule breaches of the document against the current tubes. */
  tubeIssues: TubeIssue[];
  warnings: EngineWarning[];
}

export interface TubeIssue {
  stepId: string;
  path: string;
  message: string;
}
