import { z } from 'zod';

/** A tube is dedicated to one dopant family, never mixed (common practice). */
export const TUBE_DEDICATIONS = ['p-type', 'n-type', 'undoped'] as const;
export type TubeDedication = (typeof TUBE_DEDICATIONS)[number];

export const AMBIENTS = ['inert', 'dry-o2', 'wet-o2'] as const;
export type Ambient = (typeof AMBIENTS)[number];

export const AMBIENT_LABELS: Record<Ambient, string> = {
  inert: 'Inert (N₂ / Ar)',
  'dry-o2': 'Dry O₂',
  'wet-o2': 'Wet O₂ (steam)',
};

export interface Tube {
  id: number;
  name: string;
  dedication: TubeDedication;
  minTempC: number;
  maxTempC: number;
  ambients: Ambient[];
  notes: string;
  createdAt: string;
  updatedAt: string;
}

const tubeFields = z.object({
  name: z.string().trim().min(1, 'Enter a name').max(60),
  dedication: z.enum(TUBE_DEDICATIONS),
  minTempC: z.number().min(200, 'At least 200 °C').max(1350, 'At most 1350 °C'),
  maxTempC: z.number().min(200, 'At least 200 °C').max(1350, 'At most 1350 °C'),
  ambients: z.array(z.enum(AMBIENTS)).min(1, 'Allow at least one ambient'),
  notes: z.string().max(2000, 'At most 2000 characters'),
});

const rangeOrdered = (v: { minTempC?: number; maxTempC?: number }) =>
  v.minTempC === undefined || v.maxTempC === undefined || v.minTempC < v.maxTempC;
const rangeIssue = { message: 'The lowest temperature must be below the highest', path: ['maxTempC'] };

export const createTubeSchema = tubeFields
  .extend({ notes: tubeFields.shape.notes.default('') })
  .refine(rangeOrdered, rangeIssue);
export type CreateTubeInput = z.infer<typeof createTubeSchema>;

export const patchTubeSchema = tubeFields
  .partial()
  .strict()
  .refine((v) => Object.keys(v).length > 0, { message: 'Change at least one field' })
  .refine(rangeOrdered, rangeIssue);
export type PatchTubeInput = z.infer<typeof patchTubeSchema>;
