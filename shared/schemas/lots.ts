import { z } from 'zod';

export const LOT_STATUSES = ['open', 'in_progress', 'complete', 'scrapped'] as const;
export type LotStatus = (typeof LOT_STATUSES)[number];
export const LOT_STATUS_LABELS: Record<LotStatus, string> = {
  open: 'Open',
  in_progress: 'In progress',
  complete: 'Complete',
  scrapped: 'Scrapped',
};

/** The moves a lot's status may make: forward through the run, or scrapped before it ends. */
export const LOT_STATUS_MOVES: Record<LotStatus, readonly LotStatus[]> = {
  open: ['in_progress', 'scrapped'],
  in_progress: ['complete', 'scrapped'],
  complete: [],
  scrapped: [],
};

export const lotCodeSchema = z
  .string()
  .trim()
  .min(3, 'At least 3 characters')
  .max(40, 'At most 40 characters')
  .regex(/^[A-Za-z0-9][A-Za-z0-9._-]*$/, 'Letters, digits, dot, dash and underscore only');

export const createLotSchema = z.object({
  lotCode: lotCodeSchema,
  wafers: z.number({ error: 'Enter the wafer count' }).int('A whole number').min(1, 'At least 1').max(200, 'At most 200'),
  tubeId: z.number({ error: 'Choose a tube' }).int().positive(),
  versionId: z.number({ error: 'Choose a released recipe version' }).int().positive(),
  notes: z.string().trim().max(2000).default(''),
});
export type CreateLotInput = z.input<typeof createLotSchema>;

export const patchLotSchema = z
  .object({ status: z.enum(LOT_STATUSES), notes: z.string().trim().max(2000) })
  .partial()
  .strict()
  .refine((v) => Object.keys(v).length > 0, { message: 'Change at least one field' });

export const listLotsQuerySchema = z.object({
  status: z.enum(LOT_STATUSES).optional(),
  versionId: z.coerce.number().int().positive().optional(),
  recipeId: z.coerce.number().int().positive().optional(),
});

export const batchTravellersSchema = z.object({
  lotIds: z.array(z.number().int().positive()).min(1, 'Choose at least one lot').max(200, 'At most 200 lots at once'),
});

export interface Lot {
  id: number;
  lotCode: string;
  wafers: number;
  status: LotStatus;
  notes: string;
  tube: { id: number; name: string };
  recipe: { id: number; name: string };
  version: { id: number; versionNo: number; state: 'draft' | 'in_review' | 'released' | 'retired' };
  openedBy: { id: number; name: string };
  createdAt: string;
  updatedAt: string;
}
